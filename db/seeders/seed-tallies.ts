import { QueryTypes, type Sequelize } from 'sequelize';
// From core's source, not its build: the seed runs before `npm test` builds core.
import type { AgencyKind } from '../../packages/core/src/contract/network-setup';
import type {
  MonthKey,
  TallyCheckContext,
  TallyRevisionState,
  TallyValues,
} from '../../packages/core/src/contract/tallies';
import { checkTally } from '../../packages/core/src/tallies/check-tally';
import { headlineCountsOf } from '../../packages/core/src/tallies/headline';
import {
  addMonths,
  monthOf,
  monthsBetween,
  monthStart,
} from '../../packages/core/src/tallies/months';
import { tallyDueOn } from '../../packages/core/src/tallies/reporting';
import { KG_PER_POUND } from '../../packages/core/src/units/mass';
import { inBatches } from './bulk-insert';
import { between, chance, mulberry32, pick, sample, type Random } from './demo-random';
import { DEMO_REGIONS } from './demo-scenario';
import {
  ACKNOWLEDGEMENT_NOTES,
  AMENDED_TALLIES,
  AMENDMENT_REASONS,
  APPROVAL_COMMENTS,
  LATE_SHARE,
  RETURN_COMMENTS,
  RETURNED_THEN_APPROVED,
  TALLY_ENDINGS,
  type ChapterEnding,
  type LatestTallyState,
} from './demo-tally-scenario';
import {
  chapterProfile,
  monthFigures,
  openingStock,
  type AgencyInfo,
  type ChapterStock,
  type ReceiptSums,
  type SizeInfo,
} from './tally-figures';
import { monthTimeline, recentTimeline, type TimelineEvent } from './tally-timeline';

/** The network's default, when the setting is not stored: warn above 3 people per blanket. */
const DEFAULT_WARN_FACTOR = 3;
const MAX_HISTORY_MONTHS = 12;
const DEFAULT_ENDING: ChapterEnding = { monthsBack: 1, state: 'approved' };

interface ChapterRow {
  id: number;
  name: string;
  region_id: number;
  reporting_due_day: number;
  from_month: string;
  to_month: string | null;
}

/** Who files a chapter's tallies and who reviews them: never the same person. */
interface Filers {
  filer: number;
  reviewer: number;
}

interface RevisionPlan {
  revision: number;
  state: TallyRevisionState;
  values: TallyValues;
  amendmentReason: string | null;
  acknowledged: { codes: string[]; note: string | null } | null;
}

interface Loaded {
  chapters: ChapterRow[];
  sizes: SizeInfo[];
  agencies: Map<number, AgencyInfo[]>;
  receipts: Map<string, ReceiptSums>;
  firstReceiptMonth: Map<number, MonthKey>;
  filers: (chapter: ChapterRow) => Filers;
  warnFactor: number;
}

const key = (chapterId: number, month: MonthKey) => `${chapterId}|${month}`;

/**
 * Monthly tallies for every demo chapter, from its first month of receipts to last month, with
 * figures that follow the receipts and carry each month's closing stock into the next. Last month
 * is still open for most chapters; a few tallies were late, returned or amended (see
 * demo-tally-scenario.ts). `now` decides which month is last month.
 */
export async function seedTallies(sequelize: Sequelize, now = new Date()): Promise<void> {
  const loaded = await load(sequelize);
  const thisMonth = monthOf(now.toISOString());
  const rows = new TallyRows(
    await nextId(sequelize, 'monthly_tallies'),
    await nextId(sequelize, 'tally_revisions'),
  );
  for (const chapter of loaded.chapters) {
    planChapter(chapter, loaded, thisMonth, now, rows);
  }
  await sequelize.transaction(async (transaction) => {
    await inBatches(sequelize, 'monthly_tallies', rows.tallies, transaction);
    await inBatches(sequelize, 'tally_revisions', rows.revisions, transaction);
    await inBatches(sequelize, 'tally_blankets_assembled', rows.assembled, transaction);
    await inBatches(sequelize, 'tally_blankets_given', rows.given, transaction);
    await inBatches(sequelize, 'tally_people_served', rows.served, transaction);
    await inBatches(sequelize, 'tally_events', rows.events, transaction);
  });
}

/** The months a chapter has tallies for, and the state of the latest (see TALLY_ENDINGS). */
function spanOf(
  chapter: ChapterRow,
  firstReceipts: MonthKey,
  thisMonth: MonthKey,
): { months: MonthKey[]; latestState: LatestTallyState } {
  const lastMonth = addMonths(thisMonth, -1);
  const chapterLast =
    chapter.to_month !== null && chapter.to_month < lastMonth ? chapter.to_month : lastMonth;
  const ending = TALLY_ENDINGS[chapter.name] ?? DEFAULT_ENDING;
  const endingMonth = addMonths(thisMonth, -ending.monthsBack);
  const latest = endingMonth < chapterLast ? endingMonth : chapterLast;
  const first = chapter.from_month > firstReceipts ? chapter.from_month : firstReceipts;
  return {
    months: monthsBetween(first, latest),
    // A chapter that closed earlier ended with an approved tally.
    latestState: latest === endingMonth ? ending.state : 'approved',
  };
}

function planChapter(
  chapter: ChapterRow,
  loaded: Loaded,
  thisMonth: MonthKey,
  now: Date,
  rows: TallyRows,
): void {
  const firstReceipts = loaded.firstReceiptMonth.get(chapter.id);
  if (firstReceipts === undefined) return;
  const random = mulberry32(chapter.id * 104_729 + 17);
  const lastMonth = addMonths(thisMonth, -1);
  const { months, latestState } = spanOf(chapter, firstReceipts, thisMonth);
  const amended = monthsOf(AMENDED_TALLIES, chapter.name, thisMonth);
  const returnedOnce = monthsOf(RETURNED_THEN_APPROVED, chapter.name, thisMonth);
  const late = new Set(
    sample(
      random,
      months.filter((month) => month !== lastMonth && !returnedOnce.has(month)),
      Math.round(months.length * LATE_SHARE),
    ),
  );

  const profile = chapterProfile(random, loaded.sizes, loaded.agencies.get(chapter.id) ?? []);
  const filers = loaded.filers(chapter);
  let stock: ChapterStock = openingStock(random, profile);
  let previous: MonthKey | null = null;
  let cursor = new Date(0);
  const history: TallyCheckContext['history'] = [];

  for (const month of months) {
    const state = month === months.at(-1) ? latestState : 'approved';
    const receipts = loaded.receipts.get(key(chapter.id, month)) ?? noReceipts();
    const figures = monthFigures(random, profile, stock, receipts);
    const context: TallyCheckContext = {
      month,
      receipts: {
        count: receipts.count,
        panelsAccepted: receipts.panelsAccepted,
        setAside: receipts.setAside,
        finishedBlankets: figures.values.blankets.received,
      },
      blanketSizes: loaded.sizes,
      expectedOpening:
        previous === null
          ? null
          : {
              panels: stock.panels,
              blankets: sum(...stock.blankets.values()),
              fromMonth: previous,
              approved: true,
            },
      history: history.slice(-MAX_HISTORY_MONTHS),
      servedPerBlanketWarnFactor: loaded.warnFactor,
    };
    const isAmended = state === 'approved' && amended.has(month) && figures.closing.panels > 0;
    const dueOn = tallyDueOn(month, chapter.reporting_due_day);
    const events =
      month === lastMonth
        ? recentTimeline(
            random,
            state,
            new Date(Math.max(Date.parse(`${monthStart(thisMonth)}T00:00:00Z`), cursor.getTime())),
            new Date(Math.min(now.getTime() - 60_000, Date.parse(`${dueOn}T18:00:00Z`))),
          )
        : monthTimeline(
            random,
            {
              state,
              late: late.has(month),
              returnedOnce: state === 'approved' && returnedOnce.has(month),
              amended: isAmended,
            },
            monthStart(addMonths(month, 1)),
            dueOn,
            cursor,
          );
    // Too early in the month for last month's tally to have been started.
    if (events === null) break;

    const revisions = isAmended
      ? amendedRevisions(random, figures.values, context)
      : [
          {
            revision: 1,
            state,
            values: figures.values,
            amendmentReason: null,
            acknowledged: state === 'draft' ? null : acknowledge(random, figures.values, context),
          },
        ];
    rows.add(random, chapter.id, month, previous === null, revisions, events, filers);

    cursor = events.at(-1)!.at;
    history.push({ month, ...headlineCountsOf(figures.values) });
    previous = month;
    stock = figures.closing;
  }
}

/**
 * An approved tally amended after a recount: revision 1 had too many panels used (so too small
 * a closing stock), revision 2 has the figures the next month carries on from.
 */
function amendedRevisions(
  random: Random,
  values: TallyValues,
  context: TallyCheckContext,
): RevisionPlan[] {
  const found = between(random, 1, Math.min(40, values.panels.closing));
  const miscounted = structuredClone(values);
  miscounted.panels.usedInAssembly += found;
  miscounted.panels.closing -= found;
  return [
    {
      revision: 1,
      state: 'superseded',
      values: miscounted,
      amendmentReason: null,
      acknowledged: acknowledge(random, miscounted, context),
    },
    {
      revision: 2,
      state: 'approved',
      values,
      amendmentReason: pick(random, AMENDMENT_REASONS).replace('{n}', String(found)),
      acknowledged: acknowledge(random, values, context),
    },
  ];
}

/** The warnings a filer acknowledged on submitting, with a note; throws on an error. */
function acknowledge(
  random: Random,
  values: TallyValues,
  context: TallyCheckContext,
): RevisionPlan['acknowledged'] {
  const result = checkTally(values, context);
  if (result.errors.length > 0) {
    throw new Error(
      `demo seed: a tally for ${context.month} fails its checks: ${result.errors[0].message}`,
    );
  }
  if (result.warnings.length === 0) return { codes: [], note: null };
  return {
    codes: [...new Set(result.warnings.map((warning) => warning.code))],
    note: pick(random, ACKNOWLEDGEMENT_NOTES),
  };
}

function monthsOf(
  list: Array<{ chapter: string; monthsBack: number }>,
  chapter: string,
  thisMonth: MonthKey,
): Set<MonthKey> {
  return new Set(
    list
      .filter((entry) => entry.chapter === chapter)
      .map((e) => addMonths(thisMonth, -e.monthsBack)),
  );
}

function noReceipts(): ReceiptSums {
  return {
    count: 0,
    panelsAccepted: 0,
    setAside: { offSize: 0, hardCareYarn: 0, soiledOrDamaged: 0, other: 0 },
    finishedBySize: new Map(),
  };
}

function sum(...values: number[]): number {
  return values.reduce((total, value) => total + value, 0);
}

/** A yarn weight in kilograms, converted in whole numbers and rounded half up to the column's 6 decimals. */
export function yarnKg(value: number, unit: 'kg' | 'lb'): string {
  const thousandths = BigInt(Math.round(value * 1000));
  if (unit === 'kg') return (Number(thousandths) / 1000).toFixed(6);
  const [, fraction] = String(KG_PER_POUND).split('.');
  // value × factor at 3 + fraction.length decimals, then rounded to 6 decimals.
  const exact = thousandths * BigInt(fraction);
  const drop = 10n ** BigInt(3 + fraction.length - 6);
  const micro = (exact + drop / 2n) / drop;
  const text = micro.toString().padStart(7, '0');
  return `${text.slice(0, -6)}.${text.slice(-6)}`;
}

/** The rows to insert, with ids given here so that child rows can point at them. */
class TallyRows {
  tallies: object[] = [];
  revisions: object[] = [];
  assembled: object[] = [];
  given: object[] = [];
  served: object[] = [];
  events: object[] = [];

  constructor(
    private nextTally: number,
    private nextRevision: number,
  ) {}

  add(
    random: Random,
    chapterId: number,
    month: MonthKey,
    openingByHand: boolean,
    revisions: RevisionPlan[],
    events: TimelineEvent[],
    filers: Filers,
  ): void {
    const tallyId = this.nextTally++;
    const actor = (event: TimelineEvent) => filers[event.actor];
    const latest = revisions.at(-1)!;
    const submissions = events.filter((event) => event.kind === 'submitted');
    const state = latest.state === 'superseded' ? 'approved' : latest.state;
    this.tallies.push({
      id: tallyId,
      chapter_id: chapterId,
      month: monthStart(month),
      state,
      current_revision: latest.revision,
      approved_revision: state === 'approved' ? latest.revision : null,
      opening_entered_by_hand: openingByHand,
      first_submitted_at: submissions[0]?.at ?? null,
      // One for the new row, one per autosave, one per transition.
      version: 1 + between(random, submissions.length > 0 ? 1 : 0, 5) + events.length - 1,
      created_by: filers.filer,
      created_at: events[0].at,
      updated_at: events.at(-1)!.at,
    });

    for (const plan of revisions) {
      const own = events.filter((event) => event.revision === plan.revision);
      const submitted = own.filter((event) => event.kind === 'submitted').at(-1);
      const approved = own.find((event) => event.kind === 'approved');
      const revisionId = this.nextRevision++;
      this.revisions.push({
        id: revisionId,
        tally_id: tallyId,
        ...revisionColumns(plan),
        created_by: actor(own[0]),
        submitted_at: submitted?.at ?? null,
        submitted_by: submitted ? actor(submitted) : null,
        approved_at: approved?.at ?? null,
        approved_by: approved ? actor(approved) : null,
        created_at: own[0].at,
        // A superseded revision last changed when the amendment replaced it.
        updated_at: (plan.state === 'superseded' ? events : own).at(-1)!.at,
      });
      const { blankets, peopleServed } = plan.values;
      for (const line of blankets.assembled) {
        this.assembled.push({
          revision_id: revisionId,
          blanket_size_id: line.blanketSizeId,
          count: line.count,
        });
      }
      for (const line of blankets.given) {
        this.given.push({
          revision_id: revisionId,
          blanket_size_id: line.blanketSizeId,
          partner_agency_id: line.partnerAgencyId,
          count: line.count,
        });
      }
      for (const line of peopleServed) {
        this.served.push({
          revision_id: revisionId,
          partner_agency_id: line.partnerAgencyId,
          people_group: line.group,
          count: line.count,
        });
      }
    }

    for (const event of events) {
      this.events.push({
        tally_id: tallyId,
        revision: event.revision,
        kind: event.kind,
        comment: eventComment(random, event, revisions),
        actor_id: actor(event),
        created_at: event.at,
      });
    }
  }
}

function eventComment(
  random: Random,
  event: TimelineEvent,
  revisions: RevisionPlan[],
): string | null {
  switch (event.kind) {
    case 'returned':
      return pick(random, RETURN_COMMENTS);
    case 'approved':
      return chance(random, 0.25) ? pick(random, APPROVAL_COMMENTS) : null;
    case 'amendment_started':
      return revisions.find((plan) => plan.revision === event.revision)?.amendmentReason ?? null;
    default:
      return null;
  }
}

function revisionColumns(plan: RevisionPlan) {
  const { panels, blankets, yarnDonated } = plan.values;
  return {
    revision: plan.revision,
    state: plan.state,
    amendment_reason: plan.amendmentReason,
    panels_opening: panels.opening,
    panels_accepted: panels.accepted,
    set_aside_off_size: panels.setAside.offSize,
    set_aside_hard_care: panels.setAside.hardCareYarn,
    set_aside_soiled: panels.setAside.soiledOrDamaged,
    set_aside_other: panels.setAside.other,
    panels_used: panels.usedInAssembly,
    panels_closing: panels.closing,
    receipts_difference_reason: plan.values.receiptsDifferenceReason,
    blankets_opening: blankets.opening,
    blankets_received: blankets.received,
    blankets_closing: blankets.closing,
    volunteer_hours: plan.values.volunteerHours.toFixed(2),
    yarn_value: yarnDonated ? yarnDonated.value.toFixed(3) : null,
    yarn_unit: yarnDonated?.unit ?? null,
    yarn_kg: yarnDonated ? yarnKg(yarnDonated.value, yarnDonated.unit) : null,
    notes: plan.values.notes,
    acknowledged_warnings: plan.acknowledged ? JSON.stringify(plan.acknowledged.codes) : null,
    acknowledgement_note: plan.acknowledged?.note ?? null,
  };
}

async function nextId(sequelize: Sequelize, table: string): Promise<number> {
  const [{ next }] = await sequelize.query<{ next: number }>(
    `SELECT COALESCE(MAX(id), 0) + 1 AS next FROM \`${table}\``,
    { type: QueryTypes.SELECT },
  );
  return Number(next);
}

async function load(sequelize: Sequelize): Promise<Loaded> {
  const select = <T extends object>(sql: string) =>
    sequelize.query<T>(sql, { type: QueryTypes.SELECT });
  const demoNames = new Set(DEMO_REGIONS.flatMap((region) => region.chapters.map((c) => c.name)));
  const chapters = (
    await select<ChapterRow>(
      `SELECT id, name, region_id, reporting_due_day,
              DATE_FORMAT(active_from, '%Y-%m') AS from_month,
              DATE_FORMAT(active_to, '%Y-%m') AS to_month
       FROM chapters ORDER BY id`,
    )
  ).filter((chapter) => demoNames.has(chapter.name));
  const sizes = (
    await select<{ id: number; name: string; panels: number }>(
      `SELECT id, name, grid_columns * grid_rows AS panels
       FROM blanket_sizes WHERE active = 1 ORDER BY sort_order, id`,
    )
  ).map((size) => ({ id: size.id, name: size.name, panels: Number(size.panels) }));

  const agencies = new Map<number, AgencyInfo[]>();
  for (const row of await select<{ chapter_id: number; id: number; kind: AgencyKind }>(
    `SELECT ac.chapter_id, a.id, a.kind FROM agency_chapters ac
     JOIN partner_agencies a ON a.id = ac.agency_id WHERE a.active = 1 ORDER BY a.id`,
  )) {
    agencies.set(row.chapter_id, [
      ...(agencies.get(row.chapter_id) ?? []),
      { id: row.id, kind: row.kind },
    ]);
  }

  const receipts = new Map<string, ReceiptSums>();
  const firstReceiptMonth = new Map<number, MonthKey>();
  for (const row of await select<Record<string, string | number>>(
    `SELECT chapter_id, DATE_FORMAT(received_on, '%Y-%m') AS month, COUNT(*) AS count,
            SUM(panels_accepted) AS accepted, SUM(set_aside_off_size) AS off_size,
            SUM(set_aside_hard_care) AS hard_care, SUM(set_aside_soiled) AS soiled,
            SUM(set_aside_other) AS other
     FROM parcel_receipts GROUP BY chapter_id, month ORDER BY chapter_id, month`,
  )) {
    const chapterId = Number(row.chapter_id);
    const month = String(row.month);
    if (!firstReceiptMonth.has(chapterId)) firstReceiptMonth.set(chapterId, month);
    receipts.set(key(chapterId, month), {
      count: Number(row.count),
      panelsAccepted: Number(row.accepted),
      setAside: {
        offSize: Number(row.off_size),
        hardCareYarn: Number(row.hard_care),
        soiledOrDamaged: Number(row.soiled),
        other: Number(row.other),
      },
      finishedBySize: new Map(),
    });
  }
  for (const row of await select<Record<string, string | number>>(
    `SELECT r.chapter_id, DATE_FORMAT(r.received_on, '%Y-%m') AS month, f.blanket_size_id,
            SUM(f.count) AS count
     FROM receipt_finished_blankets f JOIN parcel_receipts r ON r.id = f.receipt_id
     GROUP BY r.chapter_id, month, f.blanket_size_id`,
  )) {
    receipts
      .get(key(Number(row.chapter_id), String(row.month)))
      ?.finishedBySize.set(Number(row.blanket_size_id), Number(row.count));
  }

  const users = await select<{
    id: number;
    role: string;
    region_id: number | null;
    chapter_id: number | null;
  }>('SELECT id, role, region_id, chapter_id FROM users WHERE active = 1 ORDER BY id');
  const first = (role: string, scope: (user: (typeof users)[number]) => boolean = () => true) =>
    users.find((user) => user.role === role && scope(user))?.id;
  const admin = first('network_admin');
  const staff = first('national_staff');
  const filers = (chapter: ChapterRow): Filers => {
    // A chapter without a lead of its own has its tallies filed by the network admin.
    const filer = first('chapter_lead', (user) => user.chapter_id === chapter.id) ?? admin;
    const reviewer =
      first('regional_coordinator', (user) => user.region_id === chapter.region_id) ?? staff;
    if (filer === undefined || reviewer === undefined || filer === reviewer) {
      throw new Error(`demo seed: no one to file and review the tallies of ${chapter.name}`);
    }
    return { filer, reviewer };
  };

  const [setting] = await select<{ value: unknown }>(
    "SELECT value FROM settings WHERE `key` = 'servedPerBlanketWarnFactor'",
  );
  const stored = Number(
    typeof setting?.value === 'string' ? JSON.parse(setting.value) : setting?.value,
  );
  const warnFactor = Number.isFinite(stored) && stored > 0 ? stored : DEFAULT_WARN_FACTOR;

  return { chapters, sizes, agencies, receipts, firstReceiptMonth, filers, warnFactor };
}
