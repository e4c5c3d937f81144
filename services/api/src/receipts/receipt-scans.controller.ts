import {
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Post,
  StreamableFile,
  UploadedFile,
  UseFilters,
  UseGuards,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import {
  ApiBearerAuth,
  ApiBody,
  ApiConsumes,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { IdParam } from '../common/pipes/id-param';
import { ScanDto } from './dto/receipt-view.dto';
import { ReceiptInScopeGuard } from './receipt-in-scope.guard';
import { ReceiptScansService } from './receipt-scans.service';
import { inlineDisposition } from './scan-files';
import { UploadTooLargeFilter } from './upload-too-large.filter';

@ApiTags('receipts')
@ApiBearerAuth()
@Controller('receipts/:id/scans')
export class ReceiptScansController {
  constructor(private readonly scans: ReceiptScansService) {}

  @Post()
  @Allow('receipts.write')
  // The guard runs before the interceptor, so an out-of-scope upload is never read into memory.
  @UseGuards(ReceiptInScopeGuard)
  @UseInterceptors(FileInterceptor('file'))
  @UseFilters(UploadTooLargeFilter)
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' } } },
  })
  @ApiCreatedResponse({ type: ScanDto, description: 'JPEG, PNG, WebP or PDF, up to the limit' })
  add(
    @IdParam() id: number,
    @UploadedFile() file: Express.Multer.File | undefined,
    @Ctx() context: SignedInContext,
  ): Promise<ScanDto> {
    return this.scans.add(context, id, file);
  }

  @Get(':scanId/file')
  @Allow('receipts.read')
  @ApiOkResponse({ description: 'The file, inline, with its media type' })
  async file(
    @IdParam() id: number,
    @IdParam('scanId') scanId: number,
    @Ctx() context: SignedInContext,
  ): Promise<StreamableFile> {
    const file = await this.scans.open(context.actor, id, scanId);
    return new StreamableFile(file.stream, {
      type: file.mediaType,
      length: file.sizeBytes,
      disposition: inlineDisposition(file.fileName),
    });
  }

  @Delete(':scanId')
  @Allow('receipts.write')
  @UseGuards(ReceiptInScopeGuard)
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse({ description: 'Removed; the file goes once the removal is saved' })
  remove(
    @IdParam() id: number,
    @IdParam('scanId') scanId: number,
    @Ctx() context: SignedInContext,
  ): Promise<void> {
    return this.scans.remove(context, id, scanId);
  }
}
