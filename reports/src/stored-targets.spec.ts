import { addMonths } from '@tallyloom/core';
import { storedTargetsOf } from './stored-targets';
import {
  expectedChapterMonths,
  STORED_SCOPES,
  targetsOfMonths,
  type ChapterInfo,
  type SnapshotTarget,
} from './tally-snapshot-rollup';

const keysOf = (targets: SnapshotTarget[]) =>
  targets.map((t) => `${t.scope}:${t.scopeId}:${t.period.kind}:${t.period.key}`).sort();

/** The definition it must equal: the tallies and every expected chapter-month, one by one. */
const byChapterMonth = (
  chapters: ChapterInfo[],
  tallied: Array<{ chapterId: number; month: string }>,
  range: { from: string; to: string },
  fiscalYearStartMonth: number,
) =>
  targetsOfMonths(
    chapters,
    [...tallied, ...expectedChapterMonths(chapters, range.from, range.to)],
    fiscalYearStartMonth,
    STORED_SCOPES,
  );

describe('storedTargetsOf', () => {
  it('adds expected months as runs: gaps between chapters stay gaps, and tallies outside count', () => {
    // Invented: region 1 has a chapter that closed in February 2025 and one that opened in
    // April 2025 (March expected of nobody); region 2's only chapter opens in 2030, yet a tally
    // of May 2025 was filed for it.
    const chapters: ChapterInfo[] = [
      { chapterId: 1, regionId: 1, dueDay: 10, activeFrom: '2024-11-01', activeTo: '2025-02-14' },
      { chapterId: 2, regionId: 1, dueDay: 10, activeFrom: '2025-04-01', activeTo: null },
      { chapterId: 3, regionId: 2, dueDay: 10, activeFrom: '2030-01-01', activeTo: null },
    ];
    const tallied = [{ chapterId: 3, month: '2025-05' }];
    const range = { from: '2025-01', to: '2025-06' };
    const targets = storedTargetsOf(chapters, tallied, range, 1);
    expect(keysOf(targets)).toEqual(keysOf(byChapterMonth(chapters, tallied, range, 1)));
    const monthsOf = (regionId: number) =>
      targets
        .filter((t) => t.scope === 'region' && t.scopeId === regionId && t.period.kind === 'month')
        .map((t) => t.period.key)
        .sort();
    expect(monthsOf(1)).toEqual(['2025-01', '2025-02', '2025-04', '2025-05', '2025-06']);
    expect(monthsOf(2)).toEqual(['2025-05']);
  });

  it('equals the chapter-month definition on random networks', () => {
    // A seeded generator (mulberry32), so a failing network can be built again.
    let state = 20261204;
    const random = () => {
      state = (state + 0x6d2b79f5) >>> 0;
      let t = state;
      t = Math.imul(t ^ (t >>> 15), t | 1);
      t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
      return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
    };
    const pick = (n: number) => Math.floor(random() * n);
    for (let round = 0; round < 40; round += 1) {
      const chapters: ChapterInfo[] = Array.from({ length: 1 + pick(12) }, (_, index) => {
        const from = addMonths('2023-01', pick(36));
        const closes = random() < 0.3;
        return {
          chapterId: index + 1,
          regionId: 1 + pick(3),
          dueDay: 10,
          activeFrom: `${from}-${String(1 + pick(28)).padStart(2, '0')}`,
          activeTo: closes ? `${addMonths(from, pick(20))}-15` : null,
        };
      });
      const tallied = Array.from({ length: pick(30) }, () => ({
        chapterId: 1 + pick(chapters.length + 1), // now and then a chapter nobody knows
        month: addMonths('2022-06', pick(48)),
      }));
      const range = { from: addMonths('2022-06', pick(24)), to: addMonths('2024-06', pick(24)) };
      const fiscalYearStartMonth = 1 + pick(12);
      expect(keysOf(storedTargetsOf(chapters, tallied, range, fiscalYearStartMonth))).toEqual(
        keysOf(byChapterMonth(chapters, tallied, range, fiscalYearStartMonth)),
      );
    }
  });
});
