import type { Policy, ExportTable } from '@tallyloom/core';
import { plainToInstance, type ClassConstructor } from 'class-transformer';
import { validate } from 'class-validator';
import { BadRequestException } from '@nestjs/common';
import { ListReceiptsQuery } from '../receipts/dto/list-receipts.query';
import { ListTalliesQuery } from '../tallies/dto/list-tallies.query';
import { toFieldProblems } from '../common/pipes/validation.pipe';
import { SnapshotExportFilters } from './dto/export-requests.dto';

/** Each table's own read policy, needed on top of 'exports.tables'. */
export const TABLE_READ_POLICY: Record<ExportTable, Policy> = {
  receipts: 'receipts.read',
  tallies: 'tallies.read',
  'review-queue': 'tallies.review',
  snapshots: 'reports.read',
};

const FILTER_CLASSES: Record<ExportTable, ClassConstructor<object>> = {
  receipts: ListReceiptsQuery,
  tallies: ListTalliesQuery,
  'review-queue': ListTalliesQuery,
  snapshots: SnapshotExportFilters,
};

/**
 * Checks a table's filters with that table's own list query class, so an export takes exactly
 * what its list takes. Paging is dropped: an export is every page. Problems are named
 * `filters.<field>`.
 */
export async function validFilters(
  table: ExportTable,
  filters: Record<string, unknown>,
): Promise<Record<string, unknown>> {
  const rest = { ...filters };
  delete rest.page;
  delete rest.pageSize;
  const instance = plainToInstance(FILTER_CLASSES[table], rest);
  const errors = await validate(instance, {
    whitelist: true,
    forbidNonWhitelisted: true,
    stopAtFirstError: true,
  });
  if (errors.length > 0) {
    const fields = toFieldProblems(errors, 'filters');
    throw new BadRequestException({
      message: `Invalid input: ${[...new Set(fields.map((f) => f.field))].join(', ')}`,
      fields,
    });
  }
  // Plain JSON again, with undefined fields gone: it is stored in the row's params.
  return JSON.parse(JSON.stringify(instance)) as Record<string, unknown>;
}

export const TABLE_LABELS: Record<ExportTable, string> = {
  receipts: 'Parcel receipts',
  tallies: 'Monthly tallies',
  'review-queue': 'Review queue',
  snapshots: 'Report snapshots',
};

/** e.g. 'tallyloom-receipts-2026-12-02.xlsx' */
export function exportFileName(subject: string, format: string, on: Date): string {
  return `tallyloom-${subject}-${on.toISOString().slice(0, 10)}.${format}`;
}
