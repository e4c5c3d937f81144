import { emptySnapshotFigures, type SnapshotFigures } from '@tallyloom/core';
import { pickMeasures, recomputeFigures, sameFigures, type FigureLine } from './trace-math';

const month = (values: Partial<SnapshotFigures>): SnapshotFigures => ({
  ...emptySnapshotFigures(),
  approvedTallies: 1,
  ...values,
});

describe('recomputeFigures', () => {
  // Given out of order on purpose: the stock is the latest month's, not the last line's.
  const lines: FigureLine[] = [
    { chapterId: 1, month: '2026-03', figures: month({ panelsAccepted: 30, panelsInStock: 80 }) },
    { chapterId: 2, month: '2026-02', figures: month({ panelsAccepted: 5, panelsInStock: 50 }) },
    { chapterId: 1, month: '2026-01', figures: month({ panelsAccepted: 10, panelsInStock: 100 }) },
  ];

  it('sums flows over every line and counts the tallies', () => {
    const figures = recomputeFigures(lines);
    expect(figures.panelsAccepted).toBe(45);
    expect(figures.approvedTallies).toBe(3);
  });

  it("takes each chapter's stock from its latest month and adds the chapters", () => {
    expect(recomputeFigures(lines).panelsInStock).toBe(130);
  });

  it('adds hours kept to two decimals without floating-point noise', () => {
    const hours = [0.1, 0.2].map((volunteerHours, index) => ({
      chapterId: index + 1,
      month: '2026-01',
      figures: month({ volunteerHours }),
    }));
    expect(recomputeFigures(hours).volunteerHours).toBe(0.3);
  });

  it('gives empty figures for no lines', () => {
    expect(recomputeFigures([])).toEqual(emptySnapshotFigures());
  });
});

describe('pickMeasures and sameFigures', () => {
  const figures = month({ panelsAccepted: 12, blanketsGiven: 3 });

  it('keeps only the measures asked for', () => {
    expect(pickMeasures(figures, ['blanketsGiven'])).toEqual({ blanketsGiven: 3 });
  });

  it('compares only those measures', () => {
    const other = month({ panelsAccepted: 13, blanketsGiven: 3 });
    expect(sameFigures(figures, other, ['blanketsGiven'])).toBe(true);
    expect(sameFigures(figures, other, ['panelsAccepted', 'blanketsGiven'])).toBe(false);
  });
});
