import { describe, expect, it } from 'vitest';
import { DateTime } from 'luxon';
import { costOfPiecesSold, mondayOf, previousMonday, weekRange } from './sales.js';

describe('weekRange', () => {
  it('runs Monday 00:00 to the next Monday 00:00 in the time zone', () => {
    expect(weekRange('2026-11-30', 'America/Denver')).toEqual({
      start: '2026-11-30',
      end: '2026-12-06',
      from: '2026-11-30T00:00:00.000-07:00',
      to: '2026-12-07T00:00:00.000-07:00',
    });
  });

  // US daylight saving time ends Sunday 2026-11-01 at 02:00 local (Energy Policy Act of 2005: first Sunday in November)
  it('a week with the end of daylight saving time lasts 169 hours (America/Chicago, week of 2026-10-26)', () => {
    const week = weekRange('2026-10-26', 'America/Chicago');
    expect(week.from).toBe('2026-10-26T00:00:00.000-05:00');
    expect(week.to).toBe('2026-11-02T00:00:00.000-06:00');
    expect((Date.parse(week.to) - Date.parse(week.from)) / 3_600_000).toBe(169);
  });

  // …and begins Sunday 2026-03-08 at 02:00 local (second Sunday in March)
  it('a week with the start of daylight saving time lasts 167 hours (America/Chicago, week of 2026-03-02)', () => {
    const week = weekRange('2026-03-02', 'America/Chicago');
    expect((Date.parse(week.to) - Date.parse(week.from)) / 3_600_000).toBe(167);
  });

  it('consecutive weeks meet exactly: every instant belongs to one week', () => {
    let monday = '2026-10-19';
    for (let i = 0; i < 4; i += 1) {
      const week = weekRange(monday, 'America/Chicago');
      const next = DateTime.fromISO(monday).plus({ weeks: 1 }).toISODate()!;
      expect(Date.parse(weekRange(next, 'America/Chicago').from)).toBe(Date.parse(week.to));
      monday = next;
    }
  });

  it('refuses a day that is not a Monday, and a bad zone', () => {
    expect(() => weekRange('2026-11-01', 'America/Chicago')).toThrow(/Monday.*Sunday/);
    expect(() => weekRange('2026-11-02', 'Mars/Olympus')).toThrow(/time zone/);
    expect(() => weekRange('2026-13-02', 'UTC')).toThrow(/not a date/);
  });

  // calendar facts: 2026-11-01 is a Sunday, 2026-11-04 a Wednesday, 2027-01-01 a Friday (from memory, checked against any calendar)
  it('finds the Monday of the week a date falls in', () => {
    expect(mondayOf('2026-11-01')).toBe('2026-10-26');
    expect(mondayOf('2026-11-02')).toBe('2026-11-02');
    expect(mondayOf('2026-11-04')).toBe('2026-11-02');
    expect(mondayOf('2027-01-01')).toBe('2026-12-28');
    expect(() => mondayOf('soon')).toThrow(/not a date/);
  });

  it('steps back one week', () => {
    expect(previousMonday('2026-11-02')).toBe('2026-10-26');
    expect(previousMonday('2026-03-02')).toBe('2026-02-23');
  });
});

describe('costOfPiecesSold', () => {
  const perPiece = [
    { glazeId: null, ringCents: 21, holeCents: 5 },
    { glazeId: 'maple', ringCents: 34, holeCents: 9 },
  ];
  it('prices each piece at its glaze’s per-piece cost (hand-worked: 6 × 34 + 6 × 21 + 12 × 5 = 390)', () => {
    expect(
      costOfPiecesSold(perPiece, [
        { kind: 'ring', glazeId: 'maple', quantity: 6 },
        { kind: 'ring', glazeId: null, quantity: 6 },
        { kind: 'hole', glazeId: null, quantity: 12 },
      ]),
    ).toBe(390);
  });
  it('a glaze the costing does not know is costed as plain', () => {
    expect(costOfPiecesSold(perPiece, [{ kind: 'ring', glazeId: 'gone', quantity: 2 }])).toBe(42);
  });
});
