import { DataTypes, literal } from 'sequelize';
import { grantToApp, type Migration, type MigrationContext } from './context';

const SEAL_COLUMNS = ['chain_seq', 'prev_hash', 'entry_hash'];

/**
 * The audit log's hash chain (issue #8). Entries are written unsealed (the three columns null) and
 * a sealer job puts them on the chain afterwards, so writers never wait on one chain head. Rows
 * already there are sealed by that job, not here.
 */
export const chainAuditLog: Migration = {
  name: '20261203-0009-chain-audit-log',
  async up(context) {
    const qi = context.queryInterface;
    await qi.addColumn('audit_entries', 'chain_seq', {
      type: DataTypes.BIGINT.UNSIGNED,
      allowNull: true,
    });
    await qi.addColumn('audit_entries', 'prev_hash', { type: DataTypes.CHAR(64), allowNull: true });
    await qi.addColumn('audit_entries', 'entry_hash', {
      type: DataTypes.CHAR(64),
      allowNull: true,
    });
    // Unique: two sealers can never give one place twice. Also the keyset of the verification.
    await qi.addIndex('audit_entries', ['chain_seq'], {
      unique: true,
      name: 'audit_entries_chain_seq',
    });
    // The viewer's filters, newest first.
    await qi.addIndex('audit_entries', ['occurred_at', 'id'], { name: 'audit_entries_occurred' });
    await qi.addIndex('audit_entries', ['action'], { name: 'audit_entries_action' });
    await qi.addIndex('audit_entries', ['actor_email'], { name: 'audit_entries_actor_email' });

    await qi.createTable('audit_verifications', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      // Null for the nightly job.
      verified_by: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'RESTRICT',
      },
      source: { type: DataTypes.ENUM('request', 'nightly'), allowNull: false },
      verified_at: {
        type: DataTypes.DATE(3),
        allowNull: false,
        defaultValue: literal('CURRENT_TIMESTAMP(3)'),
      },
      ok: { type: DataTypes.BOOLEAN, allowNull: false },
      entries_checked: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false },
      // The last place that held and its hash: a later run must reach at least this far.
      head_chain_seq: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false },
      head_hash: { type: DataTypes.CHAR(64), allowNull: false },
      broken_chain_seq: { type: DataTypes.BIGINT.UNSIGNED, allowNull: true },
      broken_entry_id: { type: DataTypes.BIGINT.UNSIGNED, allowNull: true },
      broken_reason: { type: DataTypes.STRING(32), allowNull: true },
      broken_message: { type: DataTypes.STRING(500), allowNull: true },
    });
    await qi.addIndex('audit_verifications', ['ok', 'head_chain_seq']);

    // Still no UPDATE on the recorded content: only the three seal columns may be written, once
    // (the sealer's UPDATE also requires them to be null). A record of a run is never changed.
    await grantSealColumns(context);
    await grantToApp(context, 'audit_verifications', ['SELECT', 'INSERT']);
  },
  async down(context) {
    await revokeSealColumns(context);
    await context.queryInterface.dropTable('audit_verifications');
    await context.queryInterface.removeIndex('audit_entries', 'audit_entries_actor_email');
    await context.queryInterface.removeIndex('audit_entries', 'audit_entries_action');
    await context.queryInterface.removeIndex('audit_entries', 'audit_entries_occurred');
    await context.queryInterface.removeIndex('audit_entries', 'audit_entries_chain_seq');
    for (const column of [...SEAL_COLUMNS].reverse()) {
      await context.queryInterface.removeColumn('audit_entries', column);
    }
  },
};

/** Column privileges: grantToApp only knows whole tables. */
async function sealColumnsStatement(
  context: MigrationContext,
  verb: 'GRANT' | 'REVOKE',
): Promise<void> {
  if (!context.appAccount) return;
  const database = context.sequelize.getDatabaseName();
  for (const host of context.appAccount.hosts) {
    const account = `${context.sequelize.escape(context.appAccount.user)}@${context.sequelize.escape(host)}`;
    await context.sequelize.query(
      `${verb} UPDATE (${SEAL_COLUMNS.join(', ')}) ON \`${database}\`.\`audit_entries\` ${verb === 'GRANT' ? 'TO' : 'FROM'} ${account}`,
    );
  }
}

const grantSealColumns = (context: MigrationContext) => sealColumnsStatement(context, 'GRANT');
const revokeSealColumns = (context: MigrationContext) => sealColumnsStatement(context, 'REVOKE');
