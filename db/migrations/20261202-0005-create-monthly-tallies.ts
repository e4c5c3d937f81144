import { DataTypes, literal } from 'sequelize';
import { timestampColumns } from './columns';
import { grantToApp, type Migration } from './context';

const count = () => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 });
const userRef = () => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull: true });
const revisionRef = () => ({
  type: DataTypes.INTEGER.UNSIGNED,
  primaryKey: true,
  references: { model: 'tally_revisions', key: 'id' },
  onDelete: 'CASCADE',
});
const blanketSizeRef = (primaryKey: boolean) => ({
  type: DataTypes.INTEGER.UNSIGNED,
  primaryKey,
  allowNull: false,
  references: { model: 'blanket_sizes', key: 'id' },
  onDelete: 'RESTRICT',
});
const agencyRef = () => ({
  type: DataTypes.INTEGER.UNSIGNED,
  primaryKey: true,
  allowNull: false,
  references: { model: 'partner_agencies', key: 'id' },
  onDelete: 'RESTRICT',
});

const TABLES = [
  'monthly_tallies',
  'tally_revisions',
  'tally_blankets_assembled',
  'tally_blankets_given',
  'tally_people_served',
  'tally_events',
];

/**
 * Monthly tallies. The tally row is the chapter-month and its state; its figures live in
 * revisions (an amendment is a new revision, the old one kept). Reports read the revision named
 * by `approved_revision`; the one being worked on is `current_revision`.
 */
export const createMonthlyTallies: Migration = {
  name: '20261202-0005-create-monthly-tallies',
  async up(context) {
    const qi = context.queryInterface;
    await qi.createTable('monthly_tallies', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      chapter_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'chapters', key: 'id' },
        onDelete: 'RESTRICT',
      },
      // The first day of the calendar month.
      month: { type: DataTypes.DATEONLY, allowNull: false },
      state: {
        type: DataTypes.ENUM('draft', 'submitted', 'returned', 'approved'),
        allowNull: false,
        defaultValue: 'draft',
      },
      current_revision: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 1 },
      approved_revision: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: true },
      // A chapter's first tally has no earlier closing stock to carry, so its opening is typed in.
      opening_entered_by_hand: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      // On time or late is judged by the first submission, whatever happened after.
      first_submitted_at: { type: DataTypes.DATE, allowNull: true },
      version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
      created_by: userRef(),
      ...timestampColumns(),
    });
    await qi.addIndex('monthly_tallies', ['chapter_id', 'month'], {
      unique: true,
      name: 'monthly_tallies_chapter_month',
    });
    await qi.addIndex('monthly_tallies', ['month']);
    await qi.addIndex('monthly_tallies', ['state', 'month']);

    await qi.createTable('tally_revisions', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      tally_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'monthly_tallies', key: 'id' },
        onDelete: 'CASCADE',
      },
      revision: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
      state: {
        type: DataTypes.ENUM('draft', 'submitted', 'returned', 'approved', 'superseded'),
        allowNull: false,
        defaultValue: 'draft',
      },
      amendment_reason: { type: DataTypes.TEXT, allowNull: true },
      panels_opening: count(),
      panels_accepted: count(),
      set_aside_off_size: count(),
      set_aside_hard_care: count(),
      set_aside_soiled: count(),
      set_aside_other: count(),
      panels_used: count(),
      panels_closing: count(),
      receipts_difference_reason: { type: DataTypes.TEXT, allowNull: true },
      blankets_opening: count(),
      blankets_received: count(),
      blankets_closing: count(),
      volunteer_hours: { type: DataTypes.DECIMAL(9, 2), allowNull: false, defaultValue: 0 },
      yarn_value: { type: DataTypes.DECIMAL(10, 3), allowNull: true },
      yarn_unit: { type: DataTypes.ENUM('kg', 'lb'), allowNull: true },
      // The same weight in kilograms (1 lb = 0.45359237 kg exactly), so sums need no conversion.
      yarn_kg: { type: DataTypes.DECIMAL(14, 6), allowNull: true },
      notes: { type: DataTypes.TEXT, allowNull: true },
      acknowledged_warnings: { type: DataTypes.JSON, allowNull: true },
      acknowledgement_note: { type: DataTypes.TEXT, allowNull: true },
      // The Idempotency-Key of the submission, so a repeated submit is recognised.
      submission_key: { type: DataTypes.STRING(128), allowNull: true },
      created_by: userRef(),
      submitted_at: { type: DataTypes.DATE, allowNull: true },
      submitted_by: userRef(),
      approved_at: { type: DataTypes.DATE, allowNull: true },
      approved_by: userRef(),
      ...timestampColumns(),
    });
    await qi.addIndex('tally_revisions', ['tally_id', 'revision'], {
      unique: true,
      name: 'tally_revisions_tally_revision',
    });

    await qi.createTable('tally_blankets_assembled', {
      revision_id: revisionRef(),
      blanket_size_id: blanketSizeRef(true),
      count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    });
    await qi.createTable('tally_blankets_given', {
      revision_id: revisionRef(),
      blanket_size_id: blanketSizeRef(true),
      partner_agency_id: agencyRef(),
      count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    });
    await qi.createTable('tally_people_served', {
      revision_id: revisionRef(),
      partner_agency_id: agencyRef(),
      people_group: {
        type: DataTypes.ENUM('infants', 'children', 'adults', 'olderAdults', 'disasterAffected'),
        primaryKey: true,
        allowNull: false,
      },
      count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    });

    // The review trail: each transition with its comment or reason.
    await qi.createTable('tally_events', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      tally_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'monthly_tallies', key: 'id' },
        onDelete: 'CASCADE',
      },
      revision: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
      kind: {
        type: DataTypes.ENUM('created', 'submitted', 'returned', 'approved', 'amendment_started'),
        allowNull: false,
      },
      comment: { type: DataTypes.TEXT, allowNull: true },
      actor_id: userRef(),
      created_at: {
        type: DataTypes.DATE(3),
        allowNull: false,
        defaultValue: literal('CURRENT_TIMESTAMP(3)'),
      },
    });
    await qi.addIndex('tally_events', ['tally_id', 'id']);

    for (const table of TABLES) await grantToApp(context, table);
  },
  async down(context) {
    for (const table of [...TABLES].reverse()) await context.queryInterface.dropTable(table);
  },
};
