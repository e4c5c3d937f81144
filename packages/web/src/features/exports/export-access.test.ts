import { EXPORT_TABLES, ROLES, type ExportTable, type Role } from '@tallyloom/core';
import { describe, expect, it } from 'vitest';
import { mayExportTable } from './export-access';

// Who reads which table (BRIEF §2): grant writers see aggregates only; reviewing is for
// admins, national staff and coordinators.
const EXPECTED: Record<Role, ExportTable[]> = {
  network_admin: ['receipts', 'tallies', 'review-queue', 'snapshots'],
  national_staff: ['receipts', 'tallies', 'review-queue', 'snapshots'],
  regional_coordinator: ['receipts', 'tallies', 'review-queue', 'snapshots'],
  chapter_lead: ['receipts', 'tallies', 'snapshots'],
  grant_writer: ['snapshots'],
  auditor: ['receipts', 'tallies', 'snapshots'],
};

describe('who sees Export on which table', () => {
  it.each(ROLES)('%s', (role) => {
    expect(EXPORT_TABLES.filter((table) => mayExportTable(role, table))).toEqual(EXPECTED[role]);
  });

  it('shows nothing without a session', () => {
    expect(EXPORT_TABLES.filter((table) => mayExportTable(null, table))).toEqual([]);
  });
});
