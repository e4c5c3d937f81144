import {
  Body,
  Controller,
  Get,
  Header,
  HttpCode,
  HttpStatus,
  Param,
  Post,
  StreamableFile,
  UploadedFile,
  UseFilters,
  UseGuards,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiBody,
  ApiConflictResponse,
  ApiConsumes,
  ApiCreatedResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { Allow } from '../../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../../common/context/request-context';
import { ReceiptReferenceData } from '../receipt-reference-data';
import {
  CommitImportDto,
  ImportCommitDto,
  ImportPreviewDto,
  ImportUploadDto,
  PreviewImportDto,
  UploadImportDto,
} from './dto/receipt-import.dto';
import { ImportInScopeGuard } from './import-in-scope.guard';
import { templateColumns, templateCsv, templateXlsx } from './import-template';
import { ImportTooLargeFilter } from './import-too-large.filter';
import { ReceiptImportService } from './receipt-import.service';

const XLSX_TYPE = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

@ApiTags('receipts')
@ApiBearerAuth()
@Controller('receipts/imports')
export class ReceiptImportController {
  constructor(
    private readonly imports: ReceiptImportService,
    private readonly reference: ReceiptReferenceData,
  ) {}

  @Post()
  @Allow('receipts.write')
  @UseInterceptors(FileInterceptor('file'))
  @UseFilters(ImportTooLargeFilter)
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file', 'chapterId'],
      properties: {
        file: { type: 'string', format: 'binary', description: 'CSV (UTF-8) or XLSX' },
        chapterId: { type: 'integer' },
      },
    },
  })
  @ApiCreatedResponse({ type: ImportUploadDto, description: 'Read and held for 30 minutes' })
  @ApiConflictResponse({ description: 'This file (by content) was imported before' })
  upload(
    @Body() body: UploadImportDto,
    @UploadedFile() file: Express.Multer.File | undefined,
    @Ctx() context: SignedInContext,
  ): Promise<ImportUploadDto> {
    return this.imports.upload(context, body.chapterId, file);
  }

  @Get('template.csv')
  @Allow('receipts.write')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="parcel-receipts-template.csv"')
  @ApiOkResponse({ description: 'Headers and one invented example row' })
  async templateCsv(): Promise<StreamableFile> {
    return new StreamableFile(
      templateCsv(templateColumns(await this.reference.activeBlanketSizes())),
    );
  }

  @Get('template.xlsx')
  @Allow('receipts.write')
  @Header('Content-Type', XLSX_TYPE)
  @Header('Content-Disposition', 'attachment; filename="parcel-receipts-template.xlsx"')
  @ApiOkResponse({ description: 'Headers (frozen) and one invented example row' })
  async templateXlsx(): Promise<StreamableFile> {
    return new StreamableFile(
      await templateXlsx(templateColumns(await this.reference.activeBlanketSizes())),
    );
  }

  @Post(':importId/preview')
  @Allow('receipts.write')
  @UseGuards(ImportInScopeGuard)
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({
    type: ImportPreviewDto,
    description: 'A page of rows; counts and errors of all',
  })
  preview(
    @Param('importId') importId: string,
    @Body() body: PreviewImportDto,
    @Ctx() context: SignedInContext,
  ): Promise<ImportPreviewDto> {
    return this.imports.preview(context, importId, body);
  }

  @Post(':importId/commit')
  @Allow('receipts.write')
  @UseGuards(ImportInScopeGuard)
  @ApiCreatedResponse({ type: ImportCommitDto, description: 'Every row stored, in one batch' })
  @ApiBadRequestResponse({
    description: 'Some rows have errors (named rows.<n>.<field>); none stored',
  })
  @ApiConflictResponse({ description: 'This file (by content) was imported before' })
  commit(
    @Param('importId') importId: string,
    @Body() body: CommitImportDto,
    @Ctx() context: SignedInContext,
  ): Promise<ImportCommitDto> {
    return this.imports.commit(context, importId, body);
  }
}
