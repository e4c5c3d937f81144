import { can, type ExportTable, type Policy, type Role } from '@tallyloom/core';

/** Each table's own read policy: exporting it needs that as well as 'exports.tables'. */
export const TABLE_READ_POLICY: Record<ExportTable, Policy> = {
  receipts: 'receipts.read',
  tallies: 'tallies.read',
  'review-queue': 'tallies.review',
  snapshots: 'reports.read',
};

/** Shown only to those the server would let export the table (it checks again). */
export function mayExportTable(role: Role | null | undefined, table: ExportTable): boolean {
  return can(role, 'exports.tables') && can(role, TABLE_READ_POLICY[table]);
}
