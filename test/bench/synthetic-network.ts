import type * as mariadb from 'mariadb';
import { connectTo } from './db-connection';

/** The size of a generated network: `npm run bench -- --regions 12 --chapters 600 …`. */
export interface NetworkSize {
  regions: number;
  /** Chapters in all, spread evenly over the regions. */
  chapters: number;
  /** Months of approved tallies, ending with last month. */
  months: number;
  /** Parcel receipts per chapter-month. */
  receiptsPerMonth: number;
}

export const DEFAULT_SIZE: NetworkSize = {
  regions: 12,
  chapters: 600,
  months: 120,
  // 600 chapters × 120 months × 42 ≈ 3 M receipts.
  receiptsPerMonth: 42,
};

/** Reads `--regions N --chapters N --months N --receipts-per-month N` from the command line. */
export function sizeFromArgs(args: readonly string[]): NetworkSize {
  const size = { ...DEFAULT_SIZE };
  const flags: Record<string, keyof NetworkSize> = {
    '--regions': 'regions',
    '--chapters': 'chapters',
    '--months': 'months',
    '--receipts-per-month': 'receiptsPerMonth',
  };
  for (let i = 0; i < args.length; i += 1) {
    const key = flags[args[i]];
    if (!key) continue;
    const value = Number(args[i + 1]);
    if (!Number.isInteger(value) || value < 1) {
      throw new Error(`${args[i]} needs a whole number of at least 1, got ${args[i + 1]}`);
    }
    size[key] = value;
    i += 1;
  }
  if (size.chapters < size.regions) throw new Error('--chapters must be at least --regions');
  return size;
}

/**
 * Writes a synthetic network straight into the tables with set-based INSERT … SELECT over
 * MariaDB's sequence engine (seq_1_to_N): regions, chapters, one approved tally per
 * chapter-month with its line rows, and the month's parcel receipts. Figures vary by a cheap
 * hash of the ids, so sums are not trivially uniform. Generated in slices of chapters, so the
 * benchmark can measure at 10 % and then add the rest.
 */
export class SyntheticNetwork {
  private regionIds: number[] = [];
  private generatedChapters = 0;

  constructor(
    private readonly connection: mariadb.Connection,
    readonly size: NetworkSize,
  ) {}

  static async connect(url: string, size: NetworkSize): Promise<SyntheticNetwork> {
    return new SyntheticNetwork(await connectTo(url), size);
  }

  async close(): Promise<void> {
    await this.connection.end();
  }

  get chaptersGenerated(): number {
    return this.generatedChapters;
  }

  /** Adds chapters (with all their months) until `chapters` of the size exist. */
  async growTo(chapters: number, onProgress: (done: number) => void = () => {}): Promise<void> {
    if (this.regionIds.length === 0) await this.createRegions();
    const sizes = await this.ids('SELECT id FROM blanket_sizes ORDER BY id LIMIT 2');
    const agencies = await this.ids('SELECT id FROM partner_agencies ORDER BY id LIMIT 2');
    if (sizes.length < 1 || agencies.length < 2) {
      throw new Error('the synthetic network needs the demo catalogue (blanket sizes, agencies)');
    }
    const batch = 20;
    while (this.generatedChapters < chapters) {
      const count = Math.min(batch, chapters - this.generatedChapters);
      await this.addChapters(this.generatedChapters, count, sizes[0], agencies);
      this.generatedChapters += count;
      onProgress(this.generatedChapters);
    }
  }

  private async createRegions(): Promise<void> {
    await this.connection.query(
      `INSERT INTO regions (name, code)
       SELECT CONCAT('Bench region ', LPAD(seq, 3, '0')), CONCAT('BR', LPAD(seq, 3, '0'))
         FROM seq_1_to_${this.size.regions}`,
    );
    this.regionIds = await this.ids(
      "SELECT id FROM regions WHERE name LIKE 'Bench region %' ORDER BY id",
    );
  }

  /** Chapters [first, first + count) of the size, with their tallies and receipts. */
  private async addChapters(
    first: number,
    count: number,
    blanketSizeId: number,
    agencies: number[],
  ): Promise<void> {
    const { months, receiptsPerMonth } = this.size;
    const regionIds = this.regionIds;
    const conn = this.connection;
    await conn.beginTransaction();
    try {
      // Chapter n goes to region n mod regions, so every slice spreads over every region.
      const regionCase = regionIds.map((id, index) => `WHEN ${index} THEN ${id}`).join(' ');
      await conn.query(
        `INSERT INTO chapters (region_id, name, reporting_due_day, active_from)
         SELECT CASE MOD(seq, ${regionIds.length}) ${regionCase} END,
                CONCAT('Bench chapter ', LPAD(seq, 6, '0')), 10,
                DATE_SUB(DATE_FORMAT(CURDATE(), '%Y-%m-01'), INTERVAL ${months} MONTH)
           FROM seq_${first}_to_${first + count - 1}`,
      );
      const chapterFilter = `c.name BETWEEN 'Bench chapter ${String(first).padStart(6, '0')}'
                                          AND 'Bench chapter ${String(first + count - 1).padStart(6, '0')}'`;
      await conn.query(
        `INSERT INTO monthly_tallies
           (chapter_id, month, state, current_revision, approved_revision, first_submitted_at)
         SELECT c.id, m.month, 'approved', 1, 1, DATE_ADD(m.month, INTERVAL 1 MONTH) + INTERVAL 3 DAY
           FROM chapters c
           JOIN (SELECT DATE_SUB(DATE_FORMAT(CURDATE(), '%Y-%m-01'), INTERVAL seq MONTH) AS month
                   FROM seq_1_to_${months}) m
          WHERE ${chapterFilter}`,
      );
      // h is a cheap deterministic hash of the tally id: figures vary without a random source.
      await conn.query(
        `INSERT INTO tally_revisions
           (tally_id, revision, state, panels_opening, panels_accepted, set_aside_off_size,
            set_aside_hard_care, set_aside_soiled, set_aside_other, panels_used, panels_closing,
            blankets_opening, blankets_received, blankets_closing, volunteer_hours, yarn_value,
            yarn_unit, yarn_kg, submitted_at, approved_at)
         SELECT t.id, 1, 'approved', 50, 300 + h MOD 200, h MOD 5, h MOD 3, h MOD 2, 0,
                280 + h MOD 150, 70 + h MOD 60, 5, h MOD 4, 6 + h MOD 5,
                40 + (h MOD 800) / 10, 2 + h MOD 7, 'kg', 2 + h MOD 7,
                t.first_submitted_at, t.first_submitted_at + INTERVAL 2 DAY
           FROM (SELECT t.*, (t.id * 2654435761) MOD 1000003 AS h
                   FROM monthly_tallies t JOIN chapters c ON c.id = t.chapter_id
                  WHERE ${chapterFilter}) t`,
      );
      const revisions = `SELECT r.id, (r.tally_id * 40503) MOD 65521 AS h
                           FROM tally_revisions r
                           JOIN monthly_tallies t ON t.id = r.tally_id
                           JOIN chapters c ON c.id = t.chapter_id
                          WHERE ${chapterFilter}`;
      await conn.query(
        `INSERT INTO tally_blankets_assembled (revision_id, blanket_size_id, count)
         SELECT r.id, ${blanketSizeId}, 4 + r.h MOD 6 FROM (${revisions}) r`,
      );
      await conn.query(
        `INSERT INTO tally_blankets_given (revision_id, blanket_size_id, partner_agency_id, count)
         SELECT r.id, ${blanketSizeId}, a.agency, 2 + (r.h + a.agency) MOD 4
           FROM (${revisions}) r
           JOIN (SELECT ${agencies[0]} AS agency UNION ALL SELECT ${agencies[1]}) a`,
      );
      await conn.query(
        `INSERT INTO tally_people_served (revision_id, partner_agency_id, people_group, count)
         SELECT r.id, ${agencies[0]}, g.grp, 3 + (r.h + g.n) MOD 9
           FROM (${revisions}) r
           JOIN (SELECT 'children' AS grp, 1 AS n UNION ALL SELECT 'adults', 2) g`,
      );
      await conn.query(
        `INSERT INTO parcel_receipts
           (chapter_id, received_on, panels_accepted, set_aside_off_size, set_aside_hard_care,
            set_aside_soiled, set_aside_other, other_items)
         SELECT t.chapter_id, t.month + INTERVAL MOD(s.seq, 28) DAY,
                1 + MOD(t.id * 31 + s.seq * 17, 20), MOD(s.seq, 3), 0, 0, 0, MOD(s.seq, 2)
           FROM monthly_tallies t
           JOIN chapters c ON c.id = t.chapter_id
           JOIN seq_1_to_${receiptsPerMonth} s
          WHERE ${chapterFilter}`,
      );
      await conn.commit();
    } catch (error) {
      await conn.rollback();
      throw error;
    }
  }

  private async ids(sql: string): Promise<number[]> {
    const rows = await this.connection.query<Array<{ id: number }>>(sql);
    return rows.map((row) => Number(row.id));
  }
}
