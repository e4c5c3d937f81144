import type {
  BlanketCountLine,
  TallyCheckContext,
  TallyProblem,
  TallyValues,
} from '../contract/tallies';
import { DomainError } from '../errors/domain-error';
import { requireWholeNumber } from '../errors/require';
import { formatNumber, isUsable, plural } from './format';
import { problem } from './problem';

type SizePanels = ReadonlyArray<{ id: number; panels: number }>;

/** Panels sewn into the blankets assembled: count × panels of each size. */
export function panelsInAssembledBlankets(
  assembled: readonly BlanketCountLine[],
  blanketSizes: SizePanels,
): number {
  const panelsBySize = new Map(blanketSizes.map((size) => [size.id, size.panels]));
  return assembled.reduce((total, line, index) => {
    const panels = panelsBySize.get(line.blanketSizeId);
    if (panels === undefined) {
      throw new DomainError(
        `assembled[${index}].blanketSizeId`,
        `assembled[${index}].blanketSizeId ${line.blanketSizeId} is not in the catalogue.`,
      );
    }
    return total + requireWholeNumber(`assembled[${index}].count`, line.count) * panels;
  }, 0);
}

export interface StockFlowResult {
  problems: TallyProblem[];
  /** Panels used beyond those in the blankets assembled: blankets still being sewn. */
  panelsInProgress: number;
}

function allUsable(...values: unknown[]): boolean {
  return values.every(isUsable);
}

/**
 * Panels: opening + accepted − used = closing. Blankets: opening + assembled + received − given =
 * closing. Blankets assembled cannot take more panels than were used.
 */
export function stockFlowProblems(
  values: TallyValues,
  context: Pick<TallyCheckContext, 'blanketSizes'>,
): StockFlowResult {
  const problems: TallyProblem[] = [];
  const { panels, blankets } = values;

  if (allUsable(panels.opening, panels.accepted, panels.usedInAssembly, panels.closing)) {
    const expected = panels.opening + panels.accepted - panels.usedInAssembly;
    if (expected !== panels.closing) {
      problems.push(
        problem(
          'error',
          'panel-flow',
          'panels.closing',
          `Panel closing stock should be ${formatNumber(expected)} (opening ${formatNumber(panels.opening)} + accepted ${formatNumber(panels.accepted)} − used ${formatNumber(panels.usedInAssembly)}); the tally says ${formatNumber(panels.closing)}.`,
        ),
      );
    }
  }

  const assembledLines = Array.isArray(blankets.assembled) ? blankets.assembled : [];
  const givenLines = Array.isArray(blankets.given) ? blankets.given : [];
  const assembled = assembledLines.reduce((total, line) => total + line.count, 0);
  const given = givenLines.reduce((total, line) => total + line.count, 0);
  if (allUsable(blankets.opening, assembled, blankets.received, given, blankets.closing)) {
    const expected = blankets.opening + assembled + blankets.received - given;
    if (expected !== blankets.closing) {
      problems.push(
        problem(
          'error',
          'blanket-flow',
          'blankets.closing',
          `Blanket closing stock should be ${formatNumber(expected)} (opening ${formatNumber(blankets.opening)} + assembled ${formatNumber(assembled)} + received ${formatNumber(blankets.received)} − given out ${formatNumber(given)}); the tally says ${formatNumber(blankets.closing)}.`,
        ),
      );
    }
  }

  // Lines with an unknown size or a bad count are reported by the value rules; leave them out.
  const panelsBySize = new Map(context.blanketSizes.map((size) => [size.id, size]));
  const countable = assembledLines.filter(
    (line) => panelsBySize.has(line.blanketSizeId) && isUsable(line.count) && line.count >= 0,
  );
  const inBlankets = panelsInAssembledBlankets(
    countable.map((line) => ({ blanketSizeId: line.blanketSizeId, count: Math.trunc(line.count) })),
    context.blanketSizes,
  );
  let panelsInProgress = 0;
  if (isUsable(panels.usedInAssembly)) {
    if (inBlankets > panels.usedInAssembly) {
      const breakdown = countable
        .filter((line) => line.count > 0)
        .map((line) => {
          const size = panelsBySize.get(line.blanketSizeId)!;
          return `${formatNumber(line.count)} × ${size.name} at ${formatNumber(size.panels)}`;
        })
        .join(', ');
      problems.push(
        problem(
          'error',
          'assembled-exceeds-used',
          'panels.usedInAssembly',
          `The blankets assembled take ${plural(inBlankets, 'panel', 'panels')} (${breakdown}), but only ${formatNumber(panels.usedInAssembly)} were used in assembly.`,
        ),
      );
    } else if (panels.usedInAssembly > inBlankets) {
      panelsInProgress = panels.usedInAssembly - inBlankets;
      problems.push(
        problem(
          'info',
          'panels-in-progress',
          'panels.usedInAssembly',
          `${plural(panelsInProgress, 'panel', 'panels')} used in assembly ${panelsInProgress === 1 ? 'is' : 'are'} not in a finished blanket yet (blankets in progress).`,
        ),
      );
    }
  }
  return { problems, panelsInProgress };
}
