import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsIn, IsInt, IsObject, IsOptional, Max, Min } from 'class-validator';
import type {
  ImportCell,
  ImportCommitRequest,
  ImportCommitResponse,
  ImportPreviewRequest,
  ImportPreviewResponse,
  ImportPreviewRow,
  ImportRowProblem,
  ImportUploadResponse,
  ReceiptImportField,
} from '@tallyloom/core';
import { IdField } from '../../dto/receipt-fields';

const MAPPING_DOC = {
  type: 'object',
  additionalProperties: { type: 'string', nullable: true },
  example: { Date: 'receivedOn', Panels: 'panelsAccepted', 'Finished: Lap': 'finished:3' },
  description:
    'Header → field (see RECEIPT_IMPORT_FIELDS, or finished:<blanketSizeId>), or null to ignore the column',
} as const;

/** The form fields of an upload; the file itself is the multipart field `file`. */
export class UploadImportDto {
  @Type(() => Number)
  @IdField({ description: 'The chapter every row is for' })
  chapterId: number;
}

export class CommitImportDto implements ImportCommitRequest {
  @ApiProperty(MAPPING_DOC)
  @IsObject({ message: '$property must be an object of header → field' })
  mapping: Record<string, ReceiptImportField | null>;
}

const ONLY = ['all', 'errors', 'warnings'] as const;

export class PreviewImportDto extends CommitImportDto implements ImportPreviewRequest {
  @ApiPropertyOptional({ default: 1 })
  @IsOptional()
  @Max(100000, { message: '$property must be a whole number from 1' })
  @Min(1, { message: '$property must be a whole number from 1' })
  @IsInt({ message: '$property must be a whole number from 1' })
  page?: number;

  @ApiPropertyOptional({ default: 100, maximum: 500 })
  @IsOptional()
  @Max(500, { message: '$property must be a whole number from 1 to 500' })
  @Min(1, { message: '$property must be a whole number from 1 to 500' })
  @IsInt({ message: '$property must be a whole number from 1 to 500' })
  pageSize?: number;

  @ApiPropertyOptional({ enum: ONLY, default: 'all' })
  @IsOptional()
  @IsIn(ONLY, { message: `$property must be one of: ${ONLY.join(', ')}` })
  only?: (typeof ONLY)[number];
}

export class ImportUploadDto implements ImportUploadResponse {
  @ApiProperty() importId: string;
  @ApiProperty() chapterId: number;
  @ApiProperty() fileName: string;
  @ApiProperty() sha256: string;
  @ApiProperty({ enum: ['csv', 'xlsx'] }) fileType: 'csv' | 'xlsx';
  @ApiProperty({ type: [String] }) headers: string[];
  @ApiProperty() rowCount: number;
  @ApiProperty(MAPPING_DOC) suggestedMapping: Record<string, ReceiptImportField | null>;
  @ApiProperty({ type: 'array', items: { type: 'object' } })
  sampleRows: Array<Record<string, ImportCell>>;
  @ApiProperty({ format: 'date-time' }) expiresAt: string;
}

class ImportRowProblemDto implements ImportRowProblem {
  @ApiProperty({ example: 'receivedOn' }) field: ReceiptImportField | 'row';
  @ApiProperty({ type: String, nullable: true }) column: string | null;
  @ApiProperty() message: string;
}

class ImportPreviewRowDto implements ImportPreviewRow {
  @ApiProperty() rowNumber: number;
  @ApiProperty({ type: 'object', additionalProperties: true })
  values: Partial<Record<ReceiptImportField, ImportCell>>;
  @ApiProperty({ type: [ImportRowProblemDto] }) errors: ImportRowProblem[];
  @ApiProperty({ type: [ImportRowProblemDto] }) warnings: ImportRowProblem[];
}

class ImportRowErrorsDto {
  @ApiProperty() rowNumber: number;
  @ApiProperty({ type: [ImportRowProblemDto] }) errors: ImportRowProblem[];
}

export class ImportPreviewDto implements ImportPreviewResponse {
  @ApiProperty() rowCount: number;
  @ApiProperty() validCount: number;
  @ApiProperty() errorCount: number;
  @ApiProperty() warningCount: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
  @ApiProperty() total: number;
  @ApiProperty({ type: [ImportPreviewRowDto] }) rows: ImportPreviewRow[];
  @ApiProperty({
    type: [ImportRowErrorsDto],
    description: 'Every row with errors, whatever the page',
  })
  rowErrors: Array<{ rowNumber: number; errors: ImportRowProblem[] }>;
}

export class ImportCommitDto implements ImportCommitResponse {
  @ApiProperty() batchId: number;
  @ApiProperty() created: number;
}
