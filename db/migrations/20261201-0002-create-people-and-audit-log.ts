import { DataTypes, literal } from 'sequelize';
import { timestampColumns } from './columns';
import { grantToApp, type Migration } from './context';

const ROLE_VALUES = [
  'network_admin',
  'national_staff',
  'regional_coordinator',
  'chapter_lead',
  'grant_writer',
  'auditor',
];

export const createPeopleAndAuditLog: Migration = {
  name: '20261201-0002-create-people-and-audit-log',
  async up(context) {
    const qi = context.queryInterface;
    await qi.createTable('users', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
      display_name: { type: DataTypes.STRING(120), allowNull: false },
      // Null until the invitation is accepted.
      password_hash: { type: DataTypes.STRING(100), allowNull: true },
      role: { type: DataTypes.ENUM(...ROLE_VALUES), allowNull: false },
      region_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'regions', key: 'id' },
        onDelete: 'RESTRICT',
      },
      chapter_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'chapters', key: 'id' },
        onDelete: 'RESTRICT',
      },
      active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
      failed_attempts: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 0 },
      locked_until: { type: DataTypes.DATE, allowNull: true },
      last_sign_in_at: { type: DataTypes.DATE, allowNull: true },
      invited_at: { type: DataTypes.DATE, allowNull: true },
      password_changed_at: { type: DataTypes.DATE, allowNull: true },
      ...timestampColumns(),
    });
    await qi.addIndex('users', ['role']);

    await qi.createTable('refresh_tokens', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      user_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'users', key: 'id' },
        onDelete: 'CASCADE',
      },
      // Every token issued from one sign-in shares a family; reuse of a rotated token revokes it.
      family_id: { type: DataTypes.CHAR(36), allowNull: false },
      token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      expires_at: { type: DataTypes.DATE, allowNull: false },
      revoked_at: { type: DataTypes.DATE, allowNull: true },
      revoked_reason: { type: DataTypes.STRING(32), allowNull: true },
      replaced_by_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      created_at: {
        type: DataTypes.DATE,
        allowNull: false,
        defaultValue: literal('CURRENT_TIMESTAMP'),
      },
    });
    await qi.addIndex('refresh_tokens', ['family_id']);

    await qi.createTable('one_time_links', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      user_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'users', key: 'id' },
        onDelete: 'CASCADE',
      },
      purpose: { type: DataTypes.ENUM('invitation', 'password_reset'), allowNull: false },
      token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      expires_at: { type: DataTypes.DATE, allowNull: false },
      used_at: { type: DataTypes.DATE, allowNull: true },
      created_at: {
        type: DataTypes.DATE,
        allowNull: false,
        defaultValue: literal('CURRENT_TIMESTAMP'),
      },
    });

    await qi.createTable('audit_entries', {
      id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
      occurred_at: {
        type: DataTypes.DATE(3),
        allowNull: false,
        defaultValue: literal('CURRENT_TIMESTAMP(3)'),
      },
      actor_user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      actor_email: { type: DataTypes.STRING(254), allowNull: true },
      action: { type: DataTypes.STRING(64), allowNull: false },
      entity_type: { type: DataTypes.STRING(64), allowNull: false },
      entity_id: { type: DataTypes.STRING(64), allowNull: true },
      before_json: { type: DataTypes.JSON, allowNull: true },
      after_json: { type: DataTypes.JSON, allowNull: true },
      request_id: { type: DataTypes.STRING(64), allowNull: true },
      ip: { type: DataTypes.STRING(45), allowNull: true },
    });
    await qi.addIndex('audit_entries', ['entity_type', 'entity_id']);
    await qi.addIndex('audit_entries', ['actor_user_id']);

    await grantToApp(context, 'users');
    await grantToApp(context, 'refresh_tokens');
    await grantToApp(context, 'one_time_links');
    // Append-only: the application may add entries and read them, never change or remove one.
    await grantToApp(context, 'audit_entries', ['SELECT', 'INSERT']);
  },
  async down(context) {
    for (const table of ['audit_entries', 'one_time_links', 'refresh_tokens', 'users']) {
      await context.queryInterface.dropTable(table);
    }
  },
};
