import { Catch, PayloadTooLargeException, type ArgumentsHost } from '@nestjs/common';
import { AllExceptionsFilter } from '../../common/filters/all-exceptions.filter';
import { AppConfig } from '../../config/app-config';
import { formatBytes } from '../upload-too-large.filter';

/** multer says only "File too large"; say what the limit is and what to do. */
@Catch(PayloadTooLargeException)
export class ImportTooLargeFilter extends AllExceptionsFilter {
  constructor(private readonly config: AppConfig) {
    super();
  }

  override catch(_exception: PayloadTooLargeException, host: ArgumentsHost): void {
    super.catch(
      new PayloadTooLargeException(
        `The file is larger than the ${formatBytes(this.config.uploadMaxBytes)} limit; split it into several files.`,
      ),
      host,
    );
  }
}
