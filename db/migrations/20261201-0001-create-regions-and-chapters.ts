import { DataTypes } from 'sequelize';
import { timestampColumns } from './columns';
import { grantToApp, type Migration } from './context';

export const createRegionsAndChapters: Migration = {
  name: '20261201-0001-create-regions-and-chapters',
  async up(context) {
    const qi = context.queryInterface;
    await qi.createTable('regions', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      name: { type: DataTypes.STRING(80), allowNull: false, unique: true },
      code: { type: DataTypes.STRING(8), allowNull: false, unique: true },
      ...timestampColumns(),
    });
    await qi.createTable('chapters', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      region_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'regions', key: 'id' },
        onDelete: 'RESTRICT',
        onUpdate: 'CASCADE',
      },
      name: { type: DataTypes.STRING(80), allowNull: false, unique: true },
      // Day of the following month by which the monthly tally is due; 1–28 so every month has it.
      reporting_due_day: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false, defaultValue: 10 },
      active_from: { type: DataTypes.DATEONLY, allowNull: false },
      active_to: { type: DataTypes.DATEONLY, allowNull: true },
      ...timestampColumns(),
    });
    await qi.addIndex('chapters', ['region_id']);
    await grantToApp(context, 'regions');
    await grantToApp(context, 'chapters');
  },
  async down(context) {
    await context.queryInterface.dropTable('chapters');
    await context.queryInterface.dropTable('regions');
  },
};
