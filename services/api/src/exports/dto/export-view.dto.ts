import { ApiProperty } from '@nestjs/swagger';
import {
  EXPORT_FORMATS,
  EXPORT_STATES,
  EXPORT_TABLES,
  type ExportFormat,
  type ExportState,
  type ExportTable,
  type ExportView,
  type Page,
} from '@tallyloom/core';

export class ExportViewDto implements ExportView {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ enum: ['table', 'impact-pack'] }) kind!: 'table' | 'impact-pack';
  @ApiProperty({ enum: EXPORT_TABLES, nullable: true }) table!: ExportTable | null;
  @ApiProperty({ enum: EXPORT_FORMATS }) format!: ExportFormat;
  @ApiProperty({ enum: EXPORT_STATES }) state!: ExportState;
  @ApiProperty({ minimum: 0, maximum: 100 }) progress!: number;
  @ApiProperty({ type: 'integer', nullable: true }) rows!: number | null;
  @ApiProperty({ type: 'integer', nullable: true }) sheets!: number | null;
  @ApiProperty({ example: 'tallyloom-receipts-2026-12-02.xlsx' }) fileName!: string;
  @ApiProperty() description!: string;
  @ApiProperty() createdAt!: string;
  @ApiProperty({ nullable: true, type: String }) finishedAt!: string | null;
  @ApiProperty({ nullable: true, type: String }) expiresAt!: string | null;
  @ApiProperty({ nullable: true, type: String, description: 'Signed; works without sign-in' })
  downloadUrl!: string | null;
  @ApiProperty({ nullable: true, type: String }) error!: string | null;
}

export class ExportPageDto implements Page<ExportView> {
  @ApiProperty({ type: [ExportViewDto] }) items!: ExportViewDto[];
  @ApiProperty() total!: number;
  @ApiProperty() page!: number;
  @ApiProperty() pageSize!: number;
}
