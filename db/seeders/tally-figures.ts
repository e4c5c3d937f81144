// From core's source, not its build: the seed runs before `npm test` builds core.
import type { AgencyKind } from '../../packages/core/src/contract/network-setup';
import type { SetAsideReason } from '../../packages/core/src/contract/receipts';
import type {
  BlanketCountLine,
  BlanketsGivenLine,
  PeopleGroup,
  PeopleServedLine,
  TallyValues,
} from '../../packages/core/src/contract/tallies';
import { between, chance, pick, pickWeighted, uniform, type Random } from './demo-random';
import { MONTH_NOTES } from './demo-tally-scenario';

/** A blanket size of the catalogue and the panels it takes. */
export interface SizeInfo {
  id: number;
  name: string;
  panels: number;
}

export interface AgencyInfo {
  id: number;
  kind: AgencyKind;
}

/** Sums of one chapter-month's parcel receipts. */
export interface ReceiptSums {
  count: number;
  panelsAccepted: number;
  setAside: Record<SetAsideReason, number>;
  /** Finished blankets that came in parcels, by blanket size id. */
  finishedBySize: Map<number, number>;
}

/** What a chapter holds at the end of a month: loose panels and finished blankets by size. */
export interface ChapterStock {
  panels: number;
  blankets: Map<number, number>;
}

/**
 * How well each blanket size suits each kind of partner agency (by catalogue name). Baby blankets
 * go mostly to neonatal and children's wards and family shelters, lap blankets to care homes.
 */
const SIZE_SUITS: Record<AgencyKind, Record<string, number>> = {
  neonatal_or_childrens_ward: { Baby: 1, Child: 0.5 },
  family_shelter: { Baby: 0.6, Child: 0.6, Lap: 0.2, 'Adult throw': 0.4 },
  care_home: { Lap: 1, 'Adult throw': 0.6 },
  outreach: { 'Adult throw': 1, Lap: 0.5, Child: 0.1 },
  disaster_relief: { Baby: 0.3, Child: 0.5, Lap: 0.2, 'Adult throw': 0.8 },
  other: { Baby: 0.3, Child: 0.3, Lap: 0.3, 'Adult throw': 0.3 },
};

/** Who an agency's blankets reach, as shares of the people it served. */
const GROUP_SHARES: Record<AgencyKind, (random: Random) => Array<[PeopleGroup, number]>> = {
  neonatal_or_childrens_ward: (random) => {
    const infants = uniform(random, 0.7, 0.9);
    return [
      ['infants', infants],
      ['children', 1 - infants],
    ];
  },
  family_shelter: (random) => {
    const infants = uniform(random, 0.15, 0.3);
    const children = uniform(random, 0.3, 0.45);
    return [
      ['infants', infants],
      ['children', children],
      ['adults', 1 - infants - children],
    ];
  },
  care_home: (random) => {
    const older = uniform(random, 0.85, 1);
    return [
      ['olderAdults', older],
      ['adults', 1 - older],
    ];
  },
  outreach: (random) => {
    const adults = uniform(random, 0.7, 0.85);
    const older = uniform(random, 0.1, 0.2);
    return [
      ['adults', adults],
      ['olderAdults', older],
      ['children', 1 - adults - older],
    ];
  },
  disaster_relief: () => [['disasterAffected', 1]],
  other: () => [['adults', 1]],
};

/** People served per blanket given, by agency kind; always well under the warn factor of 3. */
const PEOPLE_PER_BLANKET: Record<AgencyKind, [number, number]> = {
  neonatal_or_childrens_ward: [0.9, 1],
  family_shelter: [0.9, 1.6],
  care_home: [0.9, 1],
  outreach: [0.8, 1.1],
  disaster_relief: [1, 2],
  other: [0.8, 1.2],
};

export interface ChapterProfile {
  sizes: SizeInfo[];
  agencies: AgencyInfo[];
  /** How much of each size the chapter sews, from the agencies it serves. */
  sizeWeights: Map<number, number>;
  /** Share of the month's accepted panels the chapter sews up, and of the stock it draws down. */
  paceOfAccepted: [number, number];
  paceOfStock: [number, number];
  hoursPerPanel: number;
}

function suits(kind: AgencyKind, size: SizeInfo): number {
  return SIZE_SUITS[kind][size.name] ?? 0;
}

export function chapterProfile(
  random: Random,
  sizes: SizeInfo[],
  agencies: AgencyInfo[],
): ChapterProfile {
  const sizeWeights = new Map(
    sizes.map((size) => [
      size.id,
      agencies.reduce((total, agency) => total + suits(agency.kind, size), 0),
    ]),
  );
  const pace = uniform(random, 0.8, 1);
  return {
    sizes,
    agencies,
    sizeWeights,
    paceOfAccepted: [pace - 0.1, pace + 0.15],
    paceOfStock: [0.05, 0.2],
    hoursPerPanel: uniform(random, 0.07, 0.12),
  };
}

/** A plausible stock to start from, typed in by hand on the chapter's first tally. */
export function openingStock(random: Random, profile: ChapterProfile): ChapterStock {
  return {
    panels: between(random, 60, 420),
    blankets: new Map(
      profile.sizes.map((size) => [
        size.id,
        (profile.sizeWeights.get(size.id) ?? 0) > 0 ? between(random, 0, 5) : 0,
      ]),
    ),
  };
}

function sumOf(values: Iterable<number>): number {
  let total = 0;
  for (const value of values) total += value;
  return total;
}

/** Whole blankets sewn from `panels`, of the sizes the chapter makes; the rest stays in progress. */
function assemble(random: Random, profile: ChapterProfile, panels: number): Map<number, number> {
  const made = new Map<number, number>();
  let left = panels;
  for (;;) {
    const size = pickWeighted(
      random,
      profile.sizes
        .filter((s) => s.panels <= left)
        .map((s) => [s, profile.sizeWeights.get(s.id) ?? 0] as const),
    );
    if (size === null) return made;
    made.set(size.id, (made.get(size.id) ?? 0) + 1);
    left -= size.panels;
  }
}

/** Blankets handed out this month: most of the stock of each size, to agencies it suits. */
function giveOut(
  random: Random,
  profile: ChapterProfile,
  stock: Map<number, number>,
): BlanketsGivenLine[] {
  const lines: BlanketsGivenLine[] = [];
  for (const size of profile.sizes) {
    const suited = profile.agencies.map((agency) => [agency, suits(agency.kind, size)] as const);
    const count = Math.round((stock.get(size.id) ?? 0) * uniform(random, 0.55, 0.95));
    const byAgency = new Map<number, number>();
    for (let n = 0; n < count; n++) {
      const agency = pickWeighted(random, suited);
      if (agency === null) break; // no agency of the chapter wants this size: it stays in stock
      byAgency.set(agency.id, (byAgency.get(agency.id) ?? 0) + 1);
    }
    for (const [partnerAgencyId, given] of byAgency) {
      lines.push({ blanketSizeId: size.id, partnerAgencyId, count: given });
    }
  }
  return lines;
}

function peopleServed(
  random: Random,
  profile: ChapterProfile,
  given: BlanketsGivenLine[],
): PeopleServedLine[] {
  const lines: PeopleServedLine[] = [];
  for (const agency of profile.agencies) {
    const blankets = sumOf(
      given.filter((line) => line.partnerAgencyId === agency.id).map((line) => line.count),
    );
    if (blankets === 0) continue;
    const [low, high] = PEOPLE_PER_BLANKET[agency.kind];
    const people = Math.min(
      3 * blankets,
      Math.max(1, Math.round(blankets * uniform(random, low, high))),
    );
    const shares = GROUP_SHARES[agency.kind](random);
    let left = people;
    shares.forEach(([group, share], index) => {
      const count = index === shares.length - 1 ? left : Math.min(left, Math.round(people * share));
      left -= count;
      if (count > 0) lines.push({ partnerAgencyId: agency.id, group, count });
    });
  }
  return lines;
}

/** Yarn weights as people write them: kilograms to one decimal, pounds to the half. */
function yarnDonated(random: Random): TallyValues['yarnDonated'] {
  if (!chance(random, 0.3)) return null;
  return chance(random, 0.5)
    ? { value: between(random, 5, 120) / 10, unit: 'kg' }
    : { value: between(random, 2, 50) / 2, unit: 'lb' };
}

export interface MonthFigures {
  values: TallyValues;
  closing: ChapterStock;
}

/**
 * One month's figures, consistent by construction: panels and blankets flow from `opening`,
 * the blankets assembled fit in the panels used, and what is given out comes from stock.
 */
export function monthFigures(
  random: Random,
  profile: ChapterProfile,
  opening: ChapterStock,
  receipts: ReceiptSums,
): MonthFigures {
  const accepted = receipts.panelsAccepted;
  const wanted = Math.round(
    accepted * uniform(random, ...profile.paceOfAccepted) +
      opening.panels * uniform(random, ...profile.paceOfStock),
  );
  const used = Math.max(0, Math.min(opening.panels + accepted, wanted));
  const assembled = assemble(random, profile, used);

  const blankets = new Map(opening.blankets);
  for (const [sizeId, count] of [...assembled, ...receipts.finishedBySize]) {
    blankets.set(sizeId, (blankets.get(sizeId) ?? 0) + count);
  }
  const given = giveOut(random, profile, blankets);
  for (const line of given) {
    blankets.set(line.blanketSizeId, blankets.get(line.blanketSizeId)! - line.count);
  }
  const served = peopleServed(random, profile, given);
  const hours =
    Math.round(4 * (12 + used * profile.hoursPerPanel + sumOf(given.map((l) => l.count)) * 0.1)) /
    4;

  const assembledLines: BlanketCountLine[] = profile.sizes
    .filter((size) => (assembled.get(size.id) ?? 0) > 0)
    .map((size) => ({ blanketSizeId: size.id, count: assembled.get(size.id)! }));
  const closing: ChapterStock = { panels: opening.panels + accepted - used, blankets };
  return {
    values: {
      panels: {
        opening: opening.panels,
        accepted,
        setAside: { ...receipts.setAside },
        usedInAssembly: used,
        closing: closing.panels,
      },
      receiptsDifferenceReason: null,
      blankets: {
        opening: sumOf(opening.blankets.values()),
        assembled: assembledLines,
        received: sumOf(receipts.finishedBySize.values()),
        given,
        closing: sumOf(blankets.values()),
      },
      peopleServed: served,
      volunteerHours: Math.min(200, Math.max(20, hours)),
      yarnDonated: yarnDonated(random),
      notes: chance(random, 0.15) ? pick(random, MONTH_NOTES) : null,
    },
    closing,
  };
}
