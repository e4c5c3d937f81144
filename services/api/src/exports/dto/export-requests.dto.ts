import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  EXPORT_FORMATS,
  EXPORT_TABLES,
  IMPACT_PACK_SCOPES,
  type ExportFormat,
  type ExportTable,
  type ImpactPackScope,
  type SnapshotScope,
} from '@tallyloom/core';
import { Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsObject, IsOptional, IsString, Max, Min } from 'class-validator';
import { DashboardQuery } from '../../dashboards/dto/dashboard.query';

/** POST /api/exports. The filters are checked against the table's own list query afterwards. */
export class TableExportDto {
  @ApiProperty({ enum: EXPORT_TABLES })
  @IsIn(EXPORT_TABLES, { message: `table must be one of: ${EXPORT_TABLES.join(', ')}` })
  table!: ExportTable;

  @ApiProperty({ enum: EXPORT_FORMATS })
  @IsIn(EXPORT_FORMATS, { message: `format must be one of: ${EXPORT_FORMATS.join(', ')}` })
  format!: ExportFormat;

  @ApiPropertyOptional({ description: 'CSV only: begin with a UTF-8 byte-order mark' })
  @IsOptional()
  @IsBoolean({ message: 'bom must be true or false' })
  bom?: boolean;

  @ApiProperty({
    type: 'object',
    additionalProperties: true,
    description: "The table's list filters (page and pageSize ignored)",
  })
  @IsObject({ message: 'filters must be an object' })
  filters!: Record<string, unknown>;
}

const SNAPSHOT_SCOPES = ['network', 'region', 'chapter'] as const;

/** The filters of a snapshots export: a dashboard's scope and period. */
export class SnapshotExportFilters extends DashboardQuery {
  @ApiProperty({ enum: SNAPSHOT_SCOPES })
  @IsIn(SNAPSHOT_SCOPES, { message: `scope must be one of: ${SNAPSHOT_SCOPES.join(', ')}` })
  scope!: SnapshotScope;

  @ApiPropertyOptional({ type: 'integer', description: 'Region or chapter id' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'scopeId must be a whole number' })
  @Min(1, { message: 'scopeId must be a whole number' })
  @Max(4294967295, { message: 'scopeId must be a whole number' })
  scopeId?: number;
}

/** POST /api/exports/impact-pack */
export class ImpactPackDto extends DashboardQuery {
  @ApiProperty({ enum: IMPACT_PACK_SCOPES })
  @IsIn(IMPACT_PACK_SCOPES, { message: `scope must be one of: ${IMPACT_PACK_SCOPES.join(', ')}` })
  scope!: ImpactPackScope;

  @ApiPropertyOptional({ type: 'integer', description: 'Region or campaign id' })
  @IsOptional()
  @IsInt({ message: 'scopeId must be a whole number' })
  @Min(1, { message: 'scopeId must be a whole number' })
  @Max(4294967295, { message: 'scopeId must be a whole number' })
  scopeId?: number;
}

export class ListExportsQuery {
  @ApiPropertyOptional({ default: 1 })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'page must be a whole number' })
  @Min(1, { message: 'page must be 1 or more' })
  @Max(100_000, { message: 'page must be at most 100000' })
  page?: number;

  @ApiPropertyOptional({ default: 25, maximum: 100 })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'pageSize must be a whole number' })
  @Min(1, { message: 'pageSize must be 1 or more' })
  @Max(100, { message: 'pageSize must be at most 100' })
  pageSize?: number;
}

/** The signed link's query; a missing or wrong signature is a 404, like an unknown export. */
export class FileLinkQuery {
  @ApiPropertyOptional({ description: 'Seconds since the epoch, as signed' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'expires must be a whole number' })
  expires?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'signature must be text' })
  signature?: string;
}
