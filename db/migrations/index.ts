import type { Migration } from './context';
import { createRegionsAndChapters } from './20261201-0001-create-regions-and-chapters';
import { createPeopleAndAuditLog } from './20261201-0002-create-people-and-audit-log';
import { createNetworkSetup } from './20261201-0003-create-network-setup';
import { createParcelReceipts } from './20261201-0004-create-parcel-receipts';
import { createMonthlyTallies } from './20261202-0005-create-monthly-tallies';
import { createReportSnapshots } from './20261202-0006-create-report-snapshots';
import { createExports } from './20261202-0007-create-exports';
import { createAuditSamples } from './20261202-0008-create-audit-samples';
import { chainAuditLog } from './20261203-0009-chain-audit-log';
import { createFindings } from './20261203-0010-create-findings';
import { liveChapterFigures } from './20261203-0012-live-chapter-figures';
import { snapshotSourcesByReference } from './20261204-0013-snapshot-sources-by-reference';
import { approvedMonthIndex } from './20261205-0014-approved-month-index';

/** Every migration, oldest first. Listed by hand so source and compiled builds share one order. */
export const MIGRATIONS: Migration[] = [
  createRegionsAndChapters,
  createPeopleAndAuditLog,
  createNetworkSetup,
  createParcelReceipts,
  createMonthlyTallies,
  createReportSnapshots,
  createExports,
  createAuditSamples,
  chainAuditLog,
  createFindings,
  liveChapterFigures,
  snapshotSourcesByReference,
  approvedMonthIndex,
];
