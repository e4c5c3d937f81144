import type { Migration } from './context';

/**
 * Chapters' figures are read live from their approved tallies from now on; only regions and the
 * network keep stored snapshots (a full rebuild wrote one row per chapter and period, and those
 * writes were most of its time). The chapter rows left from before are removed: nothing reads
 * them, and a stale one must not be mistaken for current figures.
 */
export const liveChapterFigures: Migration = {
  name: '20261203-0012-live-chapter-figures',
  async up(context) {
    await context.sequelize.query("DELETE FROM report_snapshots WHERE scope = 'chapter'");
  },
  async down() {
    // The next full rebuild of the earlier code writes the chapter rows again.
  },
};
