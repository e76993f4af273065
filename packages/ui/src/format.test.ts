import { describe, expect, it } from 'vitest';
import { formatClock, formatClockRange, formatDate, formatMoment, formatPieces, listWords, plural } from './format';

// Expected local times come from the IANA time zone database, read with
// Python's zoneinfo (a reference implementation), not from this code.
describe('times are shown in the bake day’s own time zone', () => {
  it('June in Chicago is Central Daylight Time, UTC−5 (IANA tz database): 14:00Z → 9 am', () => {
    expect(formatClock('2031-06-14T14:00:00Z', 'America/Chicago')).toBe('9 am');
  });

  it('January in Chicago is Central Standard Time, UTC−6 (IANA tz database): 15:30Z → 9:30 am', () => {
    expect(formatClock('2031-01-11T15:30:00Z', 'America/Chicago')).toBe('9:30 am');
  });

  it('the clocks go forward on 9 March 2031 in Chicago (IANA tz database, US rule: second Sunday of March)', () => {
    expect(formatClock('2031-03-09T07:30:00Z', 'America/Chicago')).toBe('1:30 am');
    expect(formatClock('2031-03-09T08:30:00Z', 'America/Chicago')).toBe('3:30 am');
  });

  it('June in Berlin is Central European Summer Time, UTC+2 (IANA tz database): 08:00Z → 10 am', () => {
    expect(formatClock('2031-06-14T08:00:00Z', 'Europe/Berlin')).toBe('10 am');
  });

  it('an evening instant keeps its local date: 03:00Z on 15 June is still Saturday 14 June in Los Angeles (IANA tz database)', () => {
    expect(formatDate('2031-06-15T03:00:00Z', 'America/Los_Angeles')).toBe('Saturday, June 14');
  });

  it('a calendar date is never shifted by the zone: 14 June 2031 is a Saturday (Gregorian calendar, Python calendar module)', () => {
    expect(formatDate('2031-06-14', 'Pacific/Kiritimati')).toBe('Saturday, June 14');
    expect(formatDate('2031-06-14', 'Pacific/Pago_Pago', 'short')).toBe('Sat, Jun 14');
  });

  it('a window across noon names both halves of the day (11:30 to 12:30 CDT, IANA tz database)', () => {
    expect(formatClockRange('2031-06-14T16:30:00Z', '2031-06-14T17:30:00Z', 'America/Chicago')).toBe('11:30 am–12:30 pm');
    expect(formatClockRange('2031-06-14T14:00:00Z', '2031-06-14T15:00:00Z', 'America/Chicago')).toBe('9–10 am');
  });

  it('the opening moment reads as weekday and time: 23:00Z on 12 June is Thursday 6 pm in Chicago (IANA tz database)', () => {
    expect(formatMoment('2031-06-12T23:00:00Z', 'America/Chicago')).toBe('Thu 6 pm');
  });
});

describe('words', () => {
  it('uses the singular only for one (English grammar, common usage)', () => {
    expect(plural(1, 'ring')).toBe('1 ring');
    expect(plural(38, 'ring')).toBe('38 rings');
    expect(plural(2, 'box', 'boxes')).toBe('2 boxes');
  });

  it('joins a list with commas and a final “and” (English usage, no serial comma)', () => {
    expect(listWords(['wheat'])).toBe('wheat');
    expect(listWords(['wheat', 'milk', 'eggs'])).toBe('wheat, milk and eggs');
  });

  it('offers a choice with a final “or” (English usage, no serial comma)', () => {
    expect(listWords(['a dozen', 'a half dozen', 'a bag of holes'], 'or')).toBe('a dozen, a half dozen or a bag of holes');
  });
});

describe('piece counts', () => {
  it('names only the kinds asked for (English usage)', () => {
    expect(formatPieces(12, 20)).toBe('12 rings and 20 holes');
    expect(formatPieces(1, 0)).toBe('1 ring');
    expect(formatPieces(0, 20)).toBe('20 holes');
  });
});
