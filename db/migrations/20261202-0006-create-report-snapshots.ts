import { DataTypes, literal } from 'sequelize';
import { grantToApp, type Migration } from './context';

const asOf = () => ({
  type: DataTypes.DATE(3),
  allowNull: false,
  defaultValue: literal('CURRENT_TIMESTAMP(3)'),
});

/**
 * Report snapshots built by background jobs, campaign progress, and the log of tally reminders
 * sent (one per chapter-month and kind, so a retried or restarted job never sends twice).
 */
export const createReportSnapshots: Migration = {
  name: '20261202-0006-create-report-snapshots',
  async up(context) {
    const qi = context.queryInterface;
    await qi.createTable('report_snapshots', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      scope: { type: DataTypes.ENUM('chapter', 'region', 'network'), allowNull: false },
      // 0 for the network, which has no row of its own.
      scope_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
      period_kind: { type: DataTypes.ENUM('month', 'quarter', 'fiscal_year'), allowNull: false },
      // '2026-03', '2026-Q1' or 'FY2026' (the fiscal year ending in 2026).
      period_key: { type: DataTypes.STRING(10), allowNull: false },
      period_from: { type: DataTypes.DATEONLY, allowNull: false },
      period_to: { type: DataTypes.DATEONLY, allowNull: false },
      figures: { type: DataTypes.JSON, allowNull: false },
      compliance: { type: DataTypes.JSON, allowNull: false },
      pending_tallies: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
      // [[tallyId, revision], …]: the approved revisions the figures were built from.
      source_revisions: { type: DataTypes.JSON, allowNull: false },
      as_of: asOf(),
    });
    await qi.addIndex('report_snapshots', ['scope', 'scope_id', 'period_kind', 'period_key'], {
      unique: true,
      name: 'report_snapshots_scope_period',
    });
    await qi.addIndex('report_snapshots', ['period_kind', 'period_key']);

    await qi.createTable('campaign_snapshots', {
      campaign_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        primaryKey: true,
        references: { model: 'campaigns', key: 'id' },
        onDelete: 'CASCADE',
      },
      figures: { type: DataTypes.JSON, allowNull: false },
      source_revisions: { type: DataTypes.JSON, allowNull: false },
      as_of: asOf(),
    });

    await qi.createTable('tally_reminders', {
      chapter_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        primaryKey: true,
        references: { model: 'chapters', key: 'id' },
        onDelete: 'CASCADE',
      },
      month: { type: DataTypes.DATEONLY, primaryKey: true },
      kind: { type: DataTypes.ENUM('before_due', 'after_due'), primaryKey: true },
      sent_to: { type: DataTypes.STRING(1000), allowNull: false },
      sent_at: asOf(),
    });

    for (const table of ['report_snapshots', 'campaign_snapshots', 'tally_reminders']) {
      await grantToApp(context, table);
    }
  },
  async down(context) {
    for (const table of ['tally_reminders', 'campaign_snapshots', 'report_snapshots']) {
      await context.queryInterface.dropTable(table);
    }
  },
};
