import { DataTypes, literal } from 'sequelize';
import { grantToApp, type Migration } from './context';

/**
 * Spreadsheet exports: each request is a row a background job fills in (progress, then the file
 * on local disk). The file is removed when the download link expires; the row stays as the record.
 */
export const createExports: Migration = {
  name: '20261202-0007-create-exports',
  async up(context) {
    const qi = context.queryInterface;
    await qi.createTable('exports', {
      // A random UUID: export ids appear in download links and must not be guessable.
      id: { type: DataTypes.CHAR(36), primaryKey: true },
      requested_by: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'users', key: 'id' },
        onDelete: 'RESTRICT',
      },
      kind: { type: DataTypes.ENUM('table', 'impact-pack'), allowNull: false },
      table_name: {
        type: DataTypes.ENUM('receipts', 'tallies', 'review-queue', 'snapshots'),
        allowNull: true,
      },
      format: { type: DataTypes.ENUM('xlsx', 'csv'), allowNull: false },
      // The request as validated: filters (table) or scope and period (impact pack), bom.
      params: { type: DataTypes.JSON, allowNull: false },
      description: { type: DataTypes.STRING(300), allowNull: false },
      file_name: { type: DataTypes.STRING(200), allowNull: false },
      state: {
        type: DataTypes.ENUM('queued', 'running', 'done', 'failed', 'expired'),
        allowNull: false,
        defaultValue: 'queued',
      },
      progress: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false, defaultValue: 0 },
      row_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      sheet_count: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: true },
      // Where the finished file is kept (FileStorage key); null before done and after expiry.
      file_key: { type: DataTypes.STRING(200), allowNull: true },
      size_bytes: { type: DataTypes.BIGINT.UNSIGNED, allowNull: true },
      error: { type: DataTypes.STRING(1000), allowNull: true },
      created_at: {
        type: DataTypes.DATE(3),
        allowNull: false,
        defaultValue: literal('CURRENT_TIMESTAMP(3)'),
      },
      finished_at: { type: DataTypes.DATE(3), allowNull: true },
      expires_at: { type: DataTypes.DATE(3), allowNull: true },
    });
    await qi.addIndex('exports', ['requested_by', 'created_at']);
    await qi.addIndex('exports', ['state', 'expires_at']);
    await grantToApp(context, 'exports');
  },
  async down(context) {
    await context.queryInterface.dropTable('exports');
  },
};
