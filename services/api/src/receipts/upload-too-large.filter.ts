import { Catch, PayloadTooLargeException, type ArgumentsHost } from '@nestjs/common';
import { AllExceptionsFilter } from '../common/filters/all-exceptions.filter';
import { AppConfig } from '../config/app-config';

/** multer says only "File too large"; say what the limit is. */
@Catch(PayloadTooLargeException)
export class UploadTooLargeFilter extends AllExceptionsFilter {
  constructor(private readonly config: AppConfig) {
    super();
  }

  override catch(_exception: PayloadTooLargeException, host: ArgumentsHost): void {
    super.catch(
      new PayloadTooLargeException(
        `The file is larger than the ${formatBytes(this.config.uploadMaxBytes)} limit; scan at a lower resolution or attach the pages one by one.`,
      ),
      host,
    );
  }
}

export function formatBytes(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${Number((bytes / (1024 * 1024)).toFixed(1))} MB`;
  if (bytes >= 1024) return `${Number((bytes / 1024).toFixed(1))} KB`;
  return `${bytes} bytes`;
}
