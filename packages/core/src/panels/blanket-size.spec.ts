import { DomainError } from '../errors/domain-error';
import {
  BlanketGrid,
  BlanketRequest,
  blanketsFromStock,
  closestGrid,
  finishedSize,
  panelsForRequests,
  panelsPerBlanket,
  shortfall,
} from './blanket-size';

const ADULT_THROW: BlanketGrid = { columns: 7, rows: 7 };
const LAP: BlanketGrid = { columns: 5, rows: 5 };

describe('panelsPerBlanket', () => {
  it('multiplies columns by rows', () => {
    expect(panelsPerBlanket(ADULT_THROW)).toBe(49);
    expect(panelsPerBlanket({ columns: 6, rows: 7 })).toBe(42);
    expect(panelsPerBlanket({ columns: 1, rows: 1 })).toBe(1);
  });

  it('puts an adult throw at about fifty panels', () => {
    // common practice: about 5,000 panels make about 100 adult blankets, so ~50 panels each
    const panels = panelsPerBlanket(ADULT_THROW);
    expect(panels).toBeGreaterThanOrEqual(45);
    expect(panels).toBeLessThanOrEqual(55);
  });
});

describe('finishedSize', () => {
  it('gives a 7 × 7 grid as 49 × 63 in and 124.46 × 160.02 cm', () => {
    // common practice: panels are 7 × 9 in, so 7 across = 49 in and 7 down = 63 in
    // Source: NIST Handbook 44 Appendix C / NIST SP 811 (2008) Appendix B: 1 in = 2.54 cm exactly, so 49 in = 124.46 cm and 63 in = 160.02 cm
    const size = finishedSize(ADULT_THROW);
    expect(size.widthIn).toBe(49);
    expect(size.heightIn).toBe(63);
    expect(size.widthCm).toBeCloseTo(124.46, 10);
    expect(size.heightCm).toBeCloseTo(160.02, 10);
  });

  it('gives a single panel as 7 × 9 in and 17.78 × 22.86 cm', () => {
    // common practice: the standard panel is 7 × 9 in
    // Source: NIST Handbook 44 Appendix C / NIST SP 811 (2008) Appendix B: 1 in = 2.54 cm exactly
    const size = finishedSize({ columns: 1, rows: 1 });
    expect(size.widthIn).toBe(7);
    expect(size.heightIn).toBe(9);
    expect(size.widthCm).toBeCloseTo(17.78, 10);
    expect(size.heightCm).toBeCloseTo(22.86, 10);
  });

  it('keeps columns across and rows down (a 5 × 4 grid is 35 × 36 in)', () => {
    expect(finishedSize({ columns: 5, rows: 4 })).toMatchObject({ widthIn: 35, heightIn: 36 });
  });
});

describe('blanketsFromStock', () => {
  it('makes 102 adult throws with 2 panels left from 5,000 panels', () => {
    // common practice: ~5,000 panels → ~100 adult blankets; by hand: 102 × 49 = 4,998, 5,000 − 4,998 = 2
    expect(blanketsFromStock(5000, ADULT_THROW)).toEqual({ blankets: 102, panelsLeftOver: 2 });
  });

  it('rounds down and keeps the remainder', () => {
    expect(blanketsFromStock(48, ADULT_THROW)).toEqual({ blankets: 0, panelsLeftOver: 48 });
    expect(blanketsFromStock(49, ADULT_THROW)).toEqual({ blankets: 1, panelsLeftOver: 0 });
    expect(blanketsFromStock(0, LAP)).toEqual({ blankets: 0, panelsLeftOver: 0 });
    expect(blanketsFromStock(74, LAP)).toEqual({ blankets: 2, panelsLeftOver: 24 });
  });
});

describe('panelsForRequests and shortfall', () => {
  // 3 throws × 49 = 147 and 2 laps × 25 = 50: 197 panels, by hand.
  const requests: BlanketRequest[] = [
    { grid: ADULT_THROW, blankets: 3 },
    { grid: LAP, blankets: 2 },
  ];

  it('totals the panels every request needs', () => {
    expect(panelsForRequests(requests)).toBe(197);
    expect(panelsForRequests([])).toBe(0);
    expect(panelsForRequests([{ grid: LAP, blankets: 0 }])).toBe(0);
  });

  it('reports panels short when stock falls below the need', () => {
    expect(shortfall(150, requests)).toEqual({
      panelsNeeded: 197,
      panelsInStock: 150,
      panelsShort: 47,
      panelsSurplus: 0,
    });
  });

  it('reports surplus, never a negative shortfall, when stock covers the need', () => {
    expect(shortfall(250, requests)).toEqual({
      panelsNeeded: 197,
      panelsInStock: 250,
      panelsShort: 0,
      panelsSurplus: 53,
    });
    expect(shortfall(197, requests)).toMatchObject({ panelsShort: 0, panelsSurplus: 0 });
  });
});

describe('closestGrid', () => {
  // from memory: published size charts of bedding and yarn sellers put a lap blanket near
  // 36 × 48 in, a crib blanket near 45 × 60 in and a throw near 50 × 60 in. Grids worked by hand:
  //   lap   36 in ÷ 7 → 5 (35, off 1) beats 6 (42, off 6); 48 in ÷ 9 → 5 (45, off 3) beats 6 (54, off 6)
  //   crib  45 in ÷ 7 → 6 (42, off 3) beats 7 (49, off 4); 60 in ÷ 9 → 7 (63, off 3) beats 6 (54, off 6)
  //   throw 50 in ÷ 7 → 7 (49, off 1) beats 8 (56, off 6); 60 in ÷ 9 → 7 (63, off 3)
  const charts = [
    { name: 'lap', width: 36, height: 48, grid: { columns: 5, rows: 5 }, size: [35, 45] },
    { name: 'crib', width: 45, height: 60, grid: { columns: 6, rows: 7 }, size: [42, 63] },
    { name: 'throw', width: 50, height: 60, grid: { columns: 7, rows: 7 }, size: [49, 63] },
  ];

  it.each(charts)('picks $grid.columns × $grid.rows for a $name blanket', (chart) => {
    const grid = closestGrid(chart.width, chart.height);
    expect(grid).toEqual(chart.grid);

    const size = finishedSize(grid);
    expect([size.widthIn, size.heightIn]).toEqual(chart.size);
    expect(Math.abs(size.widthIn - chart.width)).toBeLessThanOrEqual(3);
    expect(Math.abs(size.heightIn - chart.height)).toBeLessThanOrEqual(3);
  });

  it('lands exactly on a target that is a whole number of panels', () => {
    expect(closestGrid(70, 90)).toEqual({ columns: 10, rows: 10 });
  });

  it('takes fewer panels when a target is exactly halfway', () => {
    // by hand: 38.5 in is 3.5 from both 35 and 42; 40.5 in is 4.5 from both 36 and 45
    expect(closestGrid(38.5, 40.5)).toEqual({ columns: 5, rows: 4 });
  });

  it('never goes below one panel each way', () => {
    expect(closestGrid(3, 4)).toEqual({ columns: 1, rows: 1 });
  });

  it('agrees with an exhaustive search over every grid up to 20 × 20', () => {
    // Independent check of the separable shortcut: score every grid with the stated rule.
    const exhaustive = (width: number, height: number): BlanketGrid => {
      let best = { columns: 1, rows: 1, score: Infinity, panels: Infinity };
      for (let columns = 1; columns <= 20; columns++) {
        for (let rows = 1; rows <= 20; rows++) {
          const score = Math.abs(columns * 7 - width) + Math.abs(rows * 9 - height);
          const panels = columns * rows;
          if (score < best.score || (score === best.score && panels < best.panels)) {
            best = { columns, rows, score, panels };
          }
        }
      }
      return { columns: best.columns, rows: best.rows };
    };
    for (const [width, height] of [
      [30, 36],
      [36, 48],
      [40, 50],
      [45, 60],
      [50, 60],
      [50, 70],
      [60, 80],
      [38.5, 40.5],
      [10.5, 13.5],
      [2, 100],
    ]) {
      expect(closestGrid(width, height)).toEqual(exhaustive(width, height));
    }
  });
});

describe('invalid input', () => {
  it('rejects a grid that is not whole positive panels, naming the field', () => {
    expect(() => panelsPerBlanket({ columns: 2.5, rows: 3 })).toThrow(
      'grid.columns must be a whole number of at least 1; got 2.5.',
    );
    expect(() => finishedSize({ columns: 3, rows: -1 })).toThrow(
      'grid.rows must be a whole number of at least 1; got -1.',
    );
    expect(() => blanketsFromStock(10, { columns: 0, rows: 4 })).toThrow(
      'grid.columns must be a whole number of at least 1; got 0.',
    );
    expect(() => panelsPerBlanket(null as unknown as BlanketGrid)).toThrow(
      'grid must be an object with columns and rows.',
    );
  });

  it('rejects a stock that is not a whole number of panels', () => {
    expect(() => blanketsFromStock(-1, LAP)).toThrow(DomainError);
    expect(() => blanketsFromStock(-1, LAP)).toThrow(
      'panelsInStock must be a whole number of at least 0; got -1.',
    );
    expect(() => shortfall(10.5, [])).toThrow(
      'panelsInStock must be a whole number of at least 0; got 10.5.',
    );
  });

  it('names the request that is wrong', () => {
    expect(() => panelsForRequests([{ grid: LAP, blankets: -2 }])).toThrow(
      'requests[0].blankets must be a whole number of at least 0; got -2.',
    );
    expect(() =>
      panelsForRequests([
        { grid: LAP, blankets: 1 },
        { grid: { columns: 5, rows: 1.5 }, blankets: 1 },
      ]),
    ).toThrow('requests[1].grid.rows must be a whole number of at least 1; got 1.5.');
    expect(() => panelsForRequests(undefined as unknown as BlanketRequest[])).toThrow(
      'requests must be a list of { grid, blankets }.',
    );
  });

  it('rejects a target size that is not a positive number', () => {
    expect(() => closestGrid(0, 60)).toThrow('targetWidthIn must be greater than 0; got 0.');
    expect(() => closestGrid(50, Number.NaN)).toThrow(
      'targetHeightIn must be a finite number; got NaN.',
    );
  });
});
