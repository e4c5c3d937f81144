import { bucketByWeek, weekStartsBetween } from './weekly-buckets';

describe('weekStartsBetween', () => {
  it('steps 7 days from the start, the last week may be partial', () => {
    expect(weekStartsBetween('2026-01-05', '2026-01-25')).toEqual([
      '2026-01-05',
      '2026-01-12',
      '2026-01-19',
    ]);
    expect(weekStartsBetween('2026-01-05', '2026-01-26')).toEqual([
      '2026-01-05',
      '2026-01-12',
      '2026-01-19',
      '2026-01-26',
    ]);
    expect(weekStartsBetween('2026-02-23', '2026-02-23')).toEqual(['2026-02-23']);
  });

  it('gives 12 weeks for a 12-week drive', () => {
    expect(weekStartsBetween('2026-01-05', '2026-03-29')).toHaveLength(12);
  });

  it('refuses an end before the start', () => {
    expect(() => weekStartsBetween('2026-01-05', '2026-01-04')).toThrow(
      /endsOn \(2026-01-04\) must not be earlier than startsOn/,
    );
  });
});

describe('bucketByWeek', () => {
  const receipts = [
    { receivedOn: '2026-01-05', panels: 10 },
    { receivedOn: '2026-01-11', panels: 5 },
    { receivedOn: '2026-01-12', panels: 7 },
    // week 3 has nothing
    { receivedOn: '2026-01-27T23:30:00-02:00', panels: 3 }, // 28 Jan in UTC, still week 4
  ];

  it('sums panels per 7-day block with a running total, empty weeks included', () => {
    expect(bucketByWeek('2026-01-05', receipts)).toEqual([
      { weekStart: '2026-01-05', panels: 15, cumulative: 15 },
      { weekStart: '2026-01-12', panels: 7, cumulative: 22 },
      { weekStart: '2026-01-19', panels: 0, cumulative: 22 },
      { weekStart: '2026-01-26', panels: 3, cumulative: 25 },
    ]);
  });

  it('runs on to `through` with empty weeks', () => {
    const weekly = bucketByWeek('2026-01-05', receipts, '2026-02-09');
    expect(weekly.map((w) => w.weekStart).slice(-2)).toEqual(['2026-02-02', '2026-02-09']);
    expect(weekly[weekly.length - 1]).toEqual({
      weekStart: '2026-02-09',
      panels: 0,
      cumulative: 25,
    });
  });

  it('counts early parcels in the first week and never drops a late one', () => {
    const weekly = bucketByWeek(
      '2026-01-05',
      [
        { receivedOn: '2025-12-30', panels: 4 },
        { receivedOn: '2026-01-20', panels: 6 },
      ],
      '2026-01-06',
    );
    expect(weekly).toEqual([
      { weekStart: '2026-01-05', panels: 4, cumulative: 4 },
      { weekStart: '2026-01-12', panels: 0, cumulative: 4 },
      { weekStart: '2026-01-19', panels: 6, cumulative: 10 },
    ]);
  });

  it('gives no weeks for no receipts and no `through`', () => {
    expect(bucketByWeek('2026-01-05', [])).toEqual([]);
  });

  it('names the bad receipt', () => {
    expect(() => bucketByWeek('2026-01-05', [{ receivedOn: 'soon', panels: 1 }])).toThrow(
      /receipts\[0\]\.receivedOn must be an ISO date/,
    );
    expect(() =>
      bucketByWeek('2026-01-05', [
        { receivedOn: '2026-01-05', panels: 1 },
        { receivedOn: '2026-01-05', panels: 2.5 },
      ]),
    ).toThrow(/receipts\[1\]\.panels must be a whole number/);
  });
});
