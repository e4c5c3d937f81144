import {
  Body,
  Controller,
  Get,
  Put,
  StreamableFile,
  UploadedFile,
  UseFilters,
  UseGuards,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { WORKSHEET_RESULTS } from '@tallyloom/core';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { IdParam } from '../common/pipes/id-param';
import { inlineDisposition } from '../receipts/scan-files';
import { UploadTooLargeFilter } from '../receipts/upload-too-large.filter';
import { AuditSampleDto } from './dto/audit-sample-view.dto';
import { WorksheetEntryDto } from './dto/worksheet-entry.dto';
import { SampleItemInScopeGuard } from './sample-item-in-scope.guard';
import { SampleWorksheetService } from './sample-worksheet.service';

@ApiTags('audit samples')
@ApiBearerAuth()
@Controller('samples/:id/items')
export class SampleWorksheetController {
  constructor(private readonly worksheet: SampleWorksheetService) {}

  @Put(':itemId')
  @Allow('audit.sample')
  // The guard runs before the interceptor, so an upload for an unknown item is never read.
  @UseGuards(SampleItemInScopeGuard)
  @UseInterceptors(FileInterceptor('attachment'))
  @UseFilters(UploadTooLargeFilter)
  @ApiConsumes('application/json', 'multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['result'],
      properties: {
        result: { type: 'string', enum: [...WORKSHEET_RESULTS] },
        note: { type: 'string', description: 'Required for a deviation' },
        attachment: { type: 'string', format: 'binary', description: 'JPEG, PNG, WebP or PDF' },
      },
    },
  })
  @ApiOkResponse({ type: AuditSampleDto, description: 'The sample with its worksheet totals' })
  record(
    @IdParam() id: number,
    @IdParam('itemId') itemId: number,
    @Body() body: WorksheetEntryDto,
    @UploadedFile() file: Express.Multer.File | undefined,
    @Ctx() context: SignedInContext,
  ): Promise<AuditSampleDto> {
    return this.worksheet.record(context, id, itemId, body, file);
  }

  @Get(':itemId/attachment')
  @Allow('audit.read')
  @ApiOkResponse({ description: 'The file, inline, with its media type' })
  async attachment(
    @IdParam() id: number,
    @IdParam('itemId') itemId: number,
    @Ctx() context: SignedInContext,
  ): Promise<StreamableFile> {
    const file = await this.worksheet.openAttachment(context.actor, id, itemId);
    return new StreamableFile(file.stream, {
      type: file.mediaType,
      length: file.sizeBytes,
      disposition: inlineDisposition(file.fileName),
    });
  }
}
