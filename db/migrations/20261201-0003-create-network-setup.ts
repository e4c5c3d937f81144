import { DataTypes, literal } from 'sequelize';
import { timestampColumns } from './columns';
import { grantToApp, type Migration } from './context';

export const AGENCY_KIND_VALUES = [
  'family_shelter',
  'neonatal_or_childrens_ward',
  'care_home',
  'outreach',
  'disaster_relief',
  'other',
];

/** Partner agencies, campaigns, the blanket size catalogue and the network's settings. */
export const createNetworkSetup: Migration = {
  name: '20261201-0003-create-network-setup',
  async up(context) {
    const qi = context.queryInterface;
    await qi.createTable('partner_agencies', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      name: { type: DataTypes.STRING(160), allowNull: false, unique: true },
      kind: { type: DataTypes.ENUM(...AGENCY_KIND_VALUES), allowNull: false },
      active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
      ...timestampColumns(),
    });
    // An agency is served by one or more chapters.
    await qi.createTable('agency_chapters', {
      agency_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        primaryKey: true,
        references: { model: 'partner_agencies', key: 'id' },
        onDelete: 'CASCADE',
      },
      chapter_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        primaryKey: true,
        references: { model: 'chapters', key: 'id' },
        onDelete: 'CASCADE',
      },
    });
    await qi.createTable('campaigns', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      // The code people write on the parcel label, e.g. "DWD-2026"; stored upper-case.
      code: { type: DataTypes.STRING(24), allowNull: false, unique: true },
      name: { type: DataTypes.STRING(120), allowNull: false },
      goal_panels: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      starts_on: { type: DataTypes.DATEONLY, allowNull: false },
      ends_on: { type: DataTypes.DATEONLY, allowNull: false },
      region_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'regions', key: 'id' },
        onDelete: 'RESTRICT',
      },
      ...timestampColumns(),
    });
    await qi.createTable('blanket_sizes', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      name: { type: DataTypes.STRING(60), allowNull: false, unique: true },
      // Panels across × panels down; the finished size follows from the 7 × 9 in panel.
      grid_columns: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false },
      grid_rows: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false },
      sort_order: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 0 },
      active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
      // Where the target size came from, e.g. a published size chart.
      source_note: { type: DataTypes.STRING(255), allowNull: true },
      ...timestampColumns(),
    });
    await qi.createTable('settings', {
      key: { type: DataTypes.STRING(64), primaryKey: true },
      value: { type: DataTypes.JSON, allowNull: false },
      updated_at: {
        type: DataTypes.DATE,
        allowNull: false,
        defaultValue: literal('CURRENT_TIMESTAMP'),
      },
      updated_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    });
    // The estimated value of an hour of volunteer time, per data year, with its published source.
    await qi.createTable('volunteer_hour_values', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      data_year: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false, unique: true },
      hourly_value: { type: DataTypes.DECIMAL(8, 2), allowNull: false },
      currency: { type: DataTypes.CHAR(3), allowNull: false, defaultValue: 'USD' },
      source: { type: DataTypes.STRING(255), allowNull: false },
      ...timestampColumns(),
    });
    for (const table of [
      'partner_agencies',
      'agency_chapters',
      'campaigns',
      'blanket_sizes',
      'settings',
      'volunteer_hour_values',
    ]) {
      await grantToApp(context, table);
    }
  },
  async down(context) {
    for (const table of [
      'volunteer_hour_values',
      'settings',
      'blanket_sizes',
      'campaigns',
      'agency_chapters',
      'partner_agencies',
    ]) {
      await context.queryInterface.dropTable(table);
    }
  },
};
