import { DataTypes, literal } from 'sequelize';
import { grantToApp, type Migration } from './context';

/**
 * Audit samples (issue #8): a seeded draw from a population of receipts or tallies, and the
 * auditor's worksheet of what each drawn item showed. The seed, the generator and the plan are kept
 * so that anyone can re-draw the same items.
 */
export const createAuditSamples: Migration = {
  name: '20261202-0008-create-audit-samples',
  async up(context) {
    const qi = context.queryInterface;
    await qi.createTable('audit_samples', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      // The SamplePopulation (kind, scope, months) and the SamplePlanView as drawn.
      population: { type: DataTypes.JSON, allowNull: false },
      plan: { type: DataTypes.JSON, allowNull: false },
      seed: { type: DataTypes.STRING(100), allowNull: false },
      prng: { type: DataTypes.STRING(200), allowNull: false },
      population_size: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      drawn_by: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'users', key: 'id' },
        onDelete: 'RESTRICT',
      },
      drawn_at: {
        type: DataTypes.DATE(3),
        allowNull: false,
        defaultValue: literal('CURRENT_TIMESTAMP(3)'),
      },
    });
    await qi.addIndex('audit_samples', ['drawn_at', 'id']);
    await qi.createTable('audit_sample_items', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      sample_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'audit_samples', key: 'id' },
        onDelete: 'CASCADE',
      },
      // 1-based place in the draw order.
      position: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      // A parcel receipt id or a monthly tally id, by the sample's population kind.
      item_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      result: { type: DataTypes.ENUM('agrees', 'deviation'), allowNull: true },
      note: { type: DataTypes.TEXT, allowNull: true },
      // The attachment's bytes live in FileStorage; the rest is what serving it needs.
      attachment_key: { type: DataTypes.STRING(128), allowNull: true },
      attachment_name: { type: DataTypes.STRING(255), allowNull: true },
      attachment_media_type: { type: DataTypes.STRING(64), allowNull: true },
      attachment_size_bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      attachment_sha256: { type: DataTypes.CHAR(64), allowNull: true },
      recorded_by: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'RESTRICT',
      },
      recorded_at: { type: DataTypes.DATE(3), allowNull: true },
    });
    await qi.addIndex('audit_sample_items', ['sample_id', 'item_id'], {
      unique: true,
      name: 'audit_sample_items_sample_item',
    });
    await qi.addIndex('audit_sample_items', ['sample_id', 'position'], {
      unique: true,
      name: 'audit_sample_items_sample_position',
    });
    // A drawn sample is a record: the API may add samples and fill in the worksheet, never
    // delete or rewrite a draw.
    await grantToApp(context, 'audit_samples', ['SELECT', 'INSERT']);
    await grantToApp(context, 'audit_sample_items', ['SELECT', 'INSERT', 'UPDATE']);
  },
  async down(context) {
    await context.queryInterface.dropTable('audit_sample_items');
    await context.queryInterface.dropTable('audit_samples');
  },
};
