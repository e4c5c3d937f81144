import { SET_ASIDE_REASONS } from '../contract/receipts';
import {
  PEOPLE_GROUPS,
  type TallyCheckContext,
  type TallyProblem,
  type TallyValues,
} from '../contract/tallies';
import { formatNumber } from './format';
import { TALLY_FIELD_LABELS, blanketSizeName, setAsideField, type TallyNames } from './labels';
import { problem } from './problem';

// What each figure may be, field by field. Every other check skips a figure that fails here,
// so one bad entry gives one clear message instead of a cascade.

function shown(value: unknown): string {
  return typeof value === 'number' ? formatNumber(value) : (JSON.stringify(value) ?? String(value));
}

function isWholeCount(value: unknown): boolean {
  return typeof value === 'number' && Number.isInteger(value) && value >= 0;
}

function countProblem(field: string, label: string, value: unknown): TallyProblem[] {
  return isWholeCount(value)
    ? []
    : [
        problem(
          'error',
          'invalid-count',
          field,
          `${label} must be a whole number, 0 or more; got ${shown(value)}.`,
        ),
      ];
}

function hasAtMostTwoDecimals(value: number): boolean {
  const cents = value * 100;
  // Binary fractions make 1.15 × 100 = 114.99999999999999; allow that rounding, not a third decimal.
  return Math.abs(cents - Math.round(cents)) < 1e-6;
}

function sizeNames(context: Pick<TallyCheckContext, 'blanketSizes'>): TallyNames {
  return { blanketSizes: Object.fromEntries(context.blanketSizes.map((s) => [s.id, s.name])) };
}

function lineProblems<Line extends { count: number }>(
  lines: Line[],
  path: string,
  describe: (line: Line, index: number) => string,
  keyOf: (line: Line) => string,
  checkLine: (line: Line, field: string, title: string) => TallyProblem[],
): TallyProblem[] {
  if (!Array.isArray(lines)) {
    return [problem('error', 'invalid-lines', path, `${TALLY_FIELD_LABELS[path]} must be a list.`)];
  }
  const problems: TallyProblem[] = [];
  const seen = new Map<string, number>();
  lines.forEach((line, index) => {
    const field = `${path}[${index}]`;
    const title = describe(line, index);
    problems.push(...checkLine(line, field, title));
    problems.push(...countProblem(`${field}.count`, `${title}: count`, line.count));
    const key = keyOf(line);
    const first = seen.get(key);
    if (first === undefined) {
      seen.set(key, index);
    } else {
      problems.push(
        problem(
          'error',
          'duplicate-line',
          field,
          `${title} repeats line ${first + 1}; put both counts on one line.`,
        ),
      );
    }
  });
  return problems;
}

/** Whole counts ≥ 0, hours with at most 2 decimals, a real yarn weight, lines that make sense. */
export function valueRuleProblems(
  values: TallyValues,
  context: Pick<TallyCheckContext, 'blanketSizes'>,
): TallyProblem[] {
  const names = sizeNames(context);
  const knownSizes = new Set(context.blanketSizes.map((size) => size.id));
  const problems: TallyProblem[] = [];
  const count = (field: string, value: unknown) =>
    problems.push(...countProblem(field, TALLY_FIELD_LABELS[field], value));

  count('panels.opening', values.panels.opening);
  count('panels.accepted', values.panels.accepted);
  for (const reason of SET_ASIDE_REASONS) {
    count(setAsideField(reason), values.panels.setAside?.[reason]);
  }
  count('panels.usedInAssembly', values.panels.usedInAssembly);
  count('panels.closing', values.panels.closing);
  count('blankets.opening', values.blankets.opening);

  const sizeProblem = (sizeId: number, field: string, title: string): TallyProblem[] =>
    knownSizes.has(sizeId)
      ? []
      : [
          problem(
            'error',
            'unknown-blanket-size',
            `${field}.blanketSizeId`,
            `${title}: blanket size ${shown(sizeId)} is not in the catalogue.`,
          ),
        ];
  const agencyProblem = (agencyId: number, field: string, title: string): TallyProblem[] =>
    isWholeCount(agencyId) && agencyId > 0
      ? []
      : [
          problem(
            'error',
            'invalid-agency',
            `${field}.partnerAgencyId`,
            `${title}: choose a partner agency.`,
          ),
        ];

  problems.push(
    ...lineProblems(
      values.blankets.assembled,
      'blankets.assembled',
      (line, index) =>
        `Assembled line ${index + 1} (${blanketSizeName(line.blanketSizeId, names)})`,
      (line) => String(line.blanketSizeId),
      (line, field, title) => sizeProblem(line.blanketSizeId, field, title),
    ),
  );
  count('blankets.received', values.blankets.received);
  problems.push(
    ...lineProblems(
      values.blankets.given,
      'blankets.given',
      (line, index) =>
        `Given-out line ${index + 1} (${blanketSizeName(line.blanketSizeId, names)})`,
      (line) => `${line.blanketSizeId}/${line.partnerAgencyId}`,
      (line, field, title) => [
        ...sizeProblem(line.blanketSizeId, field, title),
        ...agencyProblem(line.partnerAgencyId, field, title),
      ],
    ),
  );
  count('blankets.closing', values.blankets.closing);
  problems.push(
    ...lineProblems(
      values.peopleServed,
      'peopleServed',
      (_line, index) => `People-served line ${index + 1}`,
      (line) => `${line.partnerAgencyId}/${line.group}`,
      (line, field, title) => [
        ...(PEOPLE_GROUPS.includes(line.group)
          ? []
          : [
              problem(
                'error',
                'invalid-group',
                `${field}.group`,
                `${title}: ${shown(line.group)} is not a group of people; choose one of the list.`,
              ),
            ]),
        ...agencyProblem(line.partnerAgencyId, field, title),
      ],
    ),
  );

  const hours: unknown = values.volunteerHours;
  if (
    typeof hours !== 'number' ||
    !Number.isFinite(hours) ||
    hours < 0 ||
    !hasAtMostTwoDecimals(hours)
  ) {
    problems.push(
      problem(
        'error',
        'invalid-hours',
        'volunteerHours',
        `Volunteer hours must be 0 or more with at most 2 decimals; got ${shown(hours)}.`,
      ),
    );
  }

  const yarn = values.yarnDonated;
  if (yarn !== null && yarn !== undefined) {
    if (typeof yarn.value !== 'number' || !Number.isFinite(yarn.value) || yarn.value <= 0) {
      problems.push(
        problem(
          'error',
          'invalid-yarn',
          'yarnDonated.value',
          `Yarn donated must be a weight greater than 0; got ${shown(yarn.value)}. Leave it empty when no yarn came in.`,
        ),
      );
    }
    if (yarn.unit !== 'kg' && yarn.unit !== 'lb') {
      problems.push(
        problem(
          'error',
          'invalid-yarn',
          'yarnDonated.unit',
          `Yarn donated must be weighed in kg or lb; got ${shown(yarn.unit)}.`,
        ),
      );
    }
  }
  return problems;
}
