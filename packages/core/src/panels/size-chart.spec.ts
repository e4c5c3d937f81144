import { closestGrid, finishedSize, panelsPerBlanket } from './blanket-size';
import { BLANKET_SIZE_CHART_TARGETS, SIZE_CHART_SOURCE } from './size-chart';

function target(name: string) {
  const found = BLANKET_SIZE_CHART_TARGETS.find((entry) => entry.name === name);
  if (!found) throw new Error(`no chart target for ${name}`);
  return found;
}

describe('the blanket size catalogue chosen from the size chart', () => {
  it('names its source and marks it as recalled', () => {
    expect(SIZE_CHART_SOURCE).toBe(
      'Craft Yarn Council, Standard Blanket Sizes chart (from memory)',
    );
    expect(BLANKET_SIZE_CHART_TARGETS.map((entry) => entry.name)).toEqual([
      'Baby',
      'Child',
      'Lap',
      'Adult throw',
    ]);
  });

  // Grids worked by hand from 7 in across and 9 in down, nearest on each side:
  //   baby   36 ÷ 7 → 5 (35, off 1);  36 ÷ 9 → 4 (36, off 0)  → 5 × 4 = 20 panels, 35 × 36 in
  //   child  45 ÷ 7 → 6 (42, off 3);  60 ÷ 9 → 7 (63, off 3)  → 6 × 7 = 42 panels, 42 × 63 in
  //   lap    36 ÷ 7 → 5 (35, off 1);  48 ÷ 9 → 5 (45, off 3)  → 5 × 5 = 25 panels, 35 × 45 in
  //   throw  50 ÷ 7 → 7 (49, off 1);  60 ÷ 9 → 7 (63, off 3)  → 7 × 7 = 49 panels, 49 × 63 in
  it.each([
    ['Baby', { columns: 5, rows: 4 }, 20, [35, 36]],
    ['Child', { columns: 6, rows: 7 }, 42, [42, 63]],
    ['Lap', { columns: 5, rows: 5 }, 25, [35, 45]],
    ['Adult throw', { columns: 7, rows: 7 }, 49, [49, 63]],
  ])('chooses the expected grid for %s', (name, grid, panels, size) => {
    const chart = target(name);
    const chosen = closestGrid(chart.widthIn, chart.heightIn);
    expect(chosen).toEqual(grid);
    expect(panelsPerBlanket(chosen)).toBe(panels);
    const finished = finishedSize(chosen);
    expect([finished.widthIn, finished.heightIn]).toEqual(size);
  });

  it('gives an adult throw of about fifty panels', () => {
    // common practice: about 5,000 panels make about 100 adult blankets, so 45–55 panels each
    const chart = target('Adult throw');
    const panels = panelsPerBlanket(closestGrid(chart.widthIn, chart.heightIn));
    expect(panels).toBeGreaterThanOrEqual(45);
    expect(panels).toBeLessThanOrEqual(55);
  });

  it.each([
    // from memory: size chart lap ≈ 36 × 48 in, crib ≈ 45 × 60 in, throw ≈ 50 × 60 in
    ['Lap', 36, 48],
    ['Child', 45, 60],
    ['Adult throw', 50, 60],
  ])('finishes a %s within 3 in of the chart size (%i × %i in)', (name, widthIn, heightIn) => {
    const chart = target(name);
    const finished = finishedSize(closestGrid(chart.widthIn, chart.heightIn));
    expect(Math.abs(finished.widthIn - widthIn)).toBeLessThanOrEqual(3);
    expect(Math.abs(finished.heightIn - heightIn)).toBeLessThanOrEqual(3);
  });
});
