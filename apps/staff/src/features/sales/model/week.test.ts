import { describe, expect, it } from 'vitest';
import { changePercent, mondayOf, shiftWeek, todayHere } from './week';

describe('weeks of the sales page', () => {
  // calendar facts from memory, checked against any calendar: 2026-11-01 is a Sunday, 2026-11-02 a Monday
  it('finds the Monday of a week', () => {
    expect(mondayOf('2026-11-01')).toBe('2026-10-26');
    expect(mondayOf('2026-11-02')).toBe('2026-11-02');
    expect(mondayOf('2026-12-02')).toBe('2026-11-30');
    expect(mondayOf('2027-01-01')).toBe('2026-12-28');
  });
  it('steps weeks across the end of daylight saving time and a year end without slipping a day', () => {
    expect(shiftWeek('2026-10-26', 1)).toBe('2026-11-02');
    expect(shiftWeek('2026-11-02', -1)).toBe('2026-10-26');
    expect(shiftWeek('2026-12-28', 1)).toBe('2027-01-04');
  });
  it('writes today as a local date', () => {
    expect(todayHere(new Date(2026, 10, 1, 23, 30))).toBe('2026-11-01');
  });
  it('compares with the week before', () => {
    expect(changePercent(150, 100)).toBe(50);
    expect(changePercent(50, 200)).toBe(-75);
    expect(changePercent(10, 0)).toBeNull();
  });
});
