import { looksLikeFormula, mapRow, suggestMapping, type ColumnPlan } from './import-mapping';

describe('suggestMapping', () => {
  it('matches labels, keys and common words, whatever the case or punctuation', () => {
    expect(
      suggestMapping(
        ['Received on', 'PANELS', 'e-mail', 'Finished: Lap', 'Colour', 'Date'],
        [{ id: 3, name: 'Lap' }],
      ),
    ).toEqual({
      'Received on': 'receivedOn',
      PANELS: 'panelsAccepted',
      'e-mail': 'senderEmail',
      'Finished: Lap': 'finished:3',
      Colour: null,
      // receivedOn is taken already: one field is filled from one column.
      Date: null,
    });
  });
});

describe('looksLikeFormula', () => {
  it.each(['=1+1', '+1', '-2', '@SUM(A1)', '\tx', '\rx'])('flags %j', (value) => {
    expect(looksLikeFormula(value)).toBe(true);
  });
  it.each(['Rowan', ' =1', '', null, 5])('leaves %j alone', (value) => {
    expect(looksLikeFormula(value)).toBe(false);
  });
});

describe('mapRow', () => {
  const plan: ColumnPlan[] = [
    { index: 0, header: 'Date', field: 'receivedOn' },
    { index: 1, header: 'Panels', field: 'panelsAccepted' },
    { index: 2, header: 'Lap', field: 'finished:3' },
  ];

  it('reads spreadsheet day numbers and ISO timestamps as dates', () => {
    // 45658 is 2025-01-01 in the 1900 date system (from memory).
    expect(mapRow([45658, 1, null], plan, 7).input.receivedOn).toBe('2025-01-01');
    expect(mapRow(['2025-03-04T00:00:00Z', 1, null], plan, 7).input.receivedOn).toBe('2025-03-04');
  });

  it('turns plain number text into numbers and leaves anything else for the form to refuse', () => {
    const input = (cell: string | null) => mapRow(['2025-01-01', cell, '2'], plan, 7).input;
    expect(input('1,200').panelsAccepted).toBe(1200);
    expect(input(null).panelsAccepted).toBe(0);
    expect(input('-3').panelsAccepted).toBe(-3);
    expect(input('a dozen').panelsAccepted).toBe('a dozen');
    expect(input('4').finishedBlankets).toEqual([{ blanketSizeId: 3, count: 2 }]);
  });
});
