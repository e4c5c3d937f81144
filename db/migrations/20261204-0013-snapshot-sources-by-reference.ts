import { DataTypes } from 'sequelize';
import type { Migration } from './context';

/**
 * Only a region's month snapshot lists its source revisions from now on; a region's quarter or
 * fiscal year and the network's rows add up region months and name their revisions through them
 * (NULL here). Each revision was stored six times before, which was most of what a full rebuild
 * wrote. The lists of the other rows are cleared at once: they repeat the months' lists.
 */
export const snapshotSourcesByReference: Migration = {
  name: '20261204-0013-snapshot-sources-by-reference',
  async up(context) {
    await context.queryInterface.changeColumn('report_snapshots', 'source_revisions', {
      type: DataTypes.JSON,
      allowNull: true,
    });
    await context.sequelize.query(
      `UPDATE report_snapshots SET source_revisions = NULL
        WHERE NOT (scope = 'region' AND period_kind = 'month')`,
    );
  },
  async down(context) {
    // The earlier code lists every row's own revisions; its next full rebuild writes them again.
    await context.sequelize.query(
      'UPDATE report_snapshots SET source_revisions = JSON_ARRAY() WHERE source_revisions IS NULL',
    );
    await context.queryInterface.changeColumn('report_snapshots', 'source_revisions', {
      type: DataTypes.JSON,
      allowNull: false,
    });
  },
};
