import { DataTypes, literal } from 'sequelize';
import { timestampColumns } from './columns';
import { grantToApp, type Migration } from './context';

/**
 * Audit findings (issue #8): what an auditor found, the traces and samples it points at, and the
 * network's responses. Nothing here is deleted: a finding's edits keep their history in the audit
 * log; links and responses are append-only.
 */
export const createFindings: Migration = {
  name: '20261203-0010-create-findings',
  async up(context) {
    const qi = context.queryInterface;
    await qi.createTable('audit_findings', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      title: { type: DataTypes.STRING(200), allowNull: false },
      body: { type: DataTypes.TEXT, allowNull: false },
      severity: { type: DataTypes.ENUM('low', 'medium', 'high'), allowNull: false },
      status: {
        type: DataTypes.ENUM('open', 'responded', 'closed'),
        allowNull: false,
        defaultValue: 'open',
      },
      created_by: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'users', key: 'id' },
        onDelete: 'RESTRICT',
      },
      closed_by: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'RESTRICT',
      },
      closed_at: { type: DataTypes.DATE(3), allowNull: true },
      version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
      ...timestampColumns(),
    });
    await qi.addIndex('audit_findings', ['status', 'created_at', 'id']);
    await qi.addIndex('audit_findings', ['severity', 'created_at', 'id']);
    await qi.createTable('audit_finding_links', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      finding_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'audit_findings', key: 'id' },
        onDelete: 'RESTRICT',
      },
      kind: {
        type: DataTypes.ENUM('trace', 'sample', 'sample_item', 'tally', 'receipt'),
        allowNull: false,
      },
      reference: { type: DataTypes.STRING(100), allowNull: false },
    });
    await qi.addIndex('audit_finding_links', ['finding_id', 'kind', 'reference'], {
      unique: true,
      name: 'audit_finding_links_finding_target',
    });
    // "Which findings point at this trace or sample": the other screens ask it.
    await qi.addIndex('audit_finding_links', ['kind', 'reference']);
    await qi.createTable('audit_finding_responses', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      finding_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'audit_findings', key: 'id' },
        onDelete: 'RESTRICT',
      },
      body: { type: DataTypes.TEXT, allowNull: false },
      responded_by: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'users', key: 'id' },
        onDelete: 'RESTRICT',
      },
      responded_at: {
        type: DataTypes.DATE(3),
        allowNull: false,
        defaultValue: literal('CURRENT_TIMESTAMP(3)'),
      },
    });
    await qi.addIndex('audit_finding_responses', ['finding_id', 'id']);
    // Findings are edited in place (history in the audit log) and never deleted; links and
    // responses are only ever added.
    await grantToApp(context, 'audit_findings', ['SELECT', 'INSERT', 'UPDATE']);
    await grantToApp(context, 'audit_finding_links', ['SELECT', 'INSERT']);
    await grantToApp(context, 'audit_finding_responses', ['SELECT', 'INSERT']);
  },
  async down(context) {
    await context.queryInterface.dropTable('audit_finding_responses');
    await context.queryInterface.dropTable('audit_finding_links');
    await context.queryInterface.dropTable('audit_findings');
  },
};
