import type { Migration } from './context';

const INDEX = 'monthly_tallies_chapter_month_approved';

/**
 * Each chapter's months with the revision approved in them, in one index: an incremental rebuild
 * asks for every chapter's last approved month of a quarter and a fiscal year (`periodStockSql`),
 * and this index answers it without reading the tallies' rows.
 */
export const approvedMonthIndex: Migration = {
  name: '20261205-0014-approved-month-index',
  async up(context) {
    await context.queryInterface.addIndex(
      'monthly_tallies',
      ['chapter_id', 'month', 'approved_revision'],
      {
        name: INDEX,
      },
    );
  },
  async down(context) {
    await context.queryInterface.removeIndex('monthly_tallies', INDEX);
  },
};
