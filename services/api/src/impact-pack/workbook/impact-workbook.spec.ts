import { emptySnapshotFigures, fiscalYearPeriod, type SnapshotFigures } from '@tallyloom/core';
import { dataDictionary, impactPackSheets, SHEET_NAMES } from '@tallyloom/reports';
import { Workbook, type CellFormulaValue, type Worksheet } from 'exceljs';
import type { ImpactPackData } from '../impact-pack-data';
import { buildImpactWorkbook } from './impact-workbook';

// Layout inputs only: the figures are arbitrary, the checks are about how they are laid out.
const figures = (over: Partial<SnapshotFigures>): SnapshotFigures => ({
  ...emptySnapshotFigures(),
  ...over,
});

function aPack(): ImpactPackData {
  const period = fiscalYearPeriod('FY2023', 7);
  const months = ['2022-07', '2022-12', '2023-01'];
  return {
    scope: 'network',
    scopeName: 'Whole network',
    area: { scope: 'network', scopeId: null },
    childScope: 'region',
    period,
    fiscalYearStartMonth: 7,
    asOf: '2023-07-02T03:00:00.000Z',
    requester: { name: 'Grant Writer', role: 'grant_writer', roleLabel: 'Grant writer' },
    exportedAt: new Date('2023-07-03T10:00:00Z'),
    headline: figures({ blanketsGiven: 30, volunteerHours: 60.5 }),
    compliance: { expected: 12, onTime: 9, late: 1, missing: 2, open: 0 },
    pendingTallies: 3,
    byChild: [
      {
        label: 'North',
        figures: figures({ blanketsGiven: 10, panelsInStock: 5 }),
        pendingTallies: 1,
        traceReference: 'region:1:FY2023',
        traceUrl: 'https://app.example/trace/region%3A1%3AFY2023',
      },
      {
        label: 'South',
        figures: figures({ blanketsGiven: 20, panelsInStock: 7 }),
        pendingTallies: 2,
        traceReference: 'region:2:FY2023',
        traceUrl: 'https://app.example/trace/region%3A2%3AFY2023',
      },
    ],
    byMonth: months.map((month, index) => ({
      label: month,
      figures: figures({ blanketsGiven: 10, volunteerHours: [20, 10.25, 30.25][index] }),
      pendingTallies: 1,
      traceReference: `network:${month}`,
      traceUrl: `https://app.example/trace/network%3A${month}`,
    })),
    byAgencyKind: [],
    campaigns: [],
    hourValues: [
      {
        dataYear: 2022,
        hourlyValue: 31.8,
        currency: 'USD',
        source: 'Independent Sector (2022 data)',
      },
    ],
    chaptersWithoutApprovedTally: ['Quiet Hollow'],
  };
}

async function roundTrip(data: ImpactPackData): Promise<Workbook> {
  const { workbook } = await buildImpactWorkbook(data, []);
  const read = new Workbook();
  await read.xlsx.load(await workbook.xlsx.writeBuffer());
  return read;
}

function headerRowOf(sheet: Worksheet): number {
  const view = sheet.views[0] as { state: string; ySplit?: number };
  return view.state === 'frozen' ? (view.ySplit ?? 0) : 0;
}

describe('impact pack workbook', () => {
  it('has a data dictionary row for every column header of every sheet, and a frozen header', async () => {
    const read = await roundTrip(aPack());
    const dictionary = new Set(
      dataDictionary(impactPackSheets('region')).map((r) => `${r.sheet}|${r.column}`),
    );
    const undocumented: string[] = [];
    for (const sheet of read.worksheets) {
      const headerRow = headerRowOf(sheet);
      expect([sheet.name, headerRow > 0]).toEqual([sheet.name, true]);
      sheet.getRow(headerRow).eachCell((cell) => {
        if (!dictionary.has(`${sheet.name}|${cell.text}`))
          undocumented.push(`${sheet.name}|${cell.text}`);
      });
    }
    expect(undocumented).toEqual([]);
    expect(read.worksheets.map((sheet) => sheet.name)).toEqual(
      impactPackSheets('region').map((s) => s.name),
    );
  });

  it('totals by-scope columns with SUM formulas whose cached results are the sums of the rows', async () => {
    const sheet = (await roundTrip(aPack())).getWorksheet(SHEET_NAMES.byRegion)!;
    const headers = (sheet.getRow(1).values as unknown[]).map(String);
    const given = headers.indexOf('Blankets given');
    const stock = headers.indexOf('Panels in stock');
    const total = sheet.getRow(4);
    expect(total.getCell(1).value).toBe('Total');
    const cell = total.getCell(given).value as CellFormulaValue;
    const letter = sheet.getColumn(given).letter;
    expect(cell).toEqual({ formula: `SUM(${letter}2:${letter}3)`, result: 30 });
    // Stocks are not summed in a totals row.
    expect(total.getCell(stock).value).toBeNull();
    // The reference stays readable text and links to the same trace in the app.
    const trace = sheet.getRow(2).getCell(headers.indexOf('Trace reference'));
    expect(trace.text).toBe('region:1:FY2023');
    expect(trace.hyperlink).toBe('https://app.example/trace/region%3A1%3AFY2023');
  });

  it('values volunteer hours per data year as a formula, and says so for a year without a value', async () => {
    const sheet = (await roundTrip(aPack())).getWorksheet(SHEET_NAMES.volunteerValue)!;
    // 2022: Jul 20 + Dec 10.25 hours; 2023: Jan 30.25 hours with no value set.
    expect(sheet.getRow(2).getCell(2).value).toBe(30.25);
    expect(sheet.getRow(2).getCell(5).value).toEqual({ formula: 'B2*C2', result: 961.95 });
    expect(sheet.getRow(2).getCell(5).numFmt).toBe('"$"#,##0.00');
    expect(sheet.getRow(3).getCell(5).value).toBe('no value set for 2023');
    expect(sheet.getRow(4).getCell(5).value).toEqual({ formula: 'SUM(E2:E3)', result: 961.95 });
  });

  it('sets document properties, defined names, date cells and the cover lines', async () => {
    const read = await roundTrip(aPack());
    expect(read.creator).toBe('Tallyloom');
    expect(read.subject).toBe('Impact figures for Whole network, FY 2022–23');
    expect(read.definedNames.model.map((name) => name.name)).toEqual(
      expect.arrayContaining([
        'HeadlineFigures',
        'ByRegion',
        'ByMonth',
        'VolunteerValue',
        'DataDictionary',
      ]),
    );
    const byMonth = read.getWorksheet(SHEET_NAMES.byMonth)!;
    expect(byMonth.getCell('A2').value).toEqual(new Date('2022-07-01T00:00:00Z'));
    expect(byMonth.getCell('A2').numFmt).toBe('mmm yyyy');
    const cover = read.getWorksheet(SHEET_NAMES.cover)!;
    const lines = new Map<string, unknown>();
    cover.eachRow((row) => lines.set(row.getCell(1).text, row.getCell(2).value));
    expect(cover.getCell('A1').value).toBe('Impact pack');
    expect(lines.get('Exported by')).toBe('Grant Writer (Grant writer)');
    expect(lines.get('As of')).toEqual(new Date('2023-07-02T03:00:00.000Z'));
    expect(String(lines.get('Caution'))).toMatch(
      /^Figures for funders are estimates built from volunteer reports/,
    );
    expect(String(lines.get('Pending tallies'))).toMatch(/^3 filed but not approved yet/);
    const methodology = read.getWorksheet(SHEET_NAMES.methodology)!;
    const texts: string[] = [];
    methodology.eachRow((row) => texts.push(row.getCell(2).text));
    expect(texts.join('\n')).toMatch(/Quiet Hollow/);
    expect(texts.join('\n')).toMatch(/No value of an hour is set for 2023/);
  });
});
