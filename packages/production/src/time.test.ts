import { describe, expect, it } from 'vitest';
import { formatInstant, instantFormatter, readLocalTime } from './time.js';

describe('wall-clock times on daylight-saving nights (IANA tz database, America/Chicago)', () => {
  it('2027-03-14 02:30 does not exist: clocks go from 02:00 CST to 03:00 CDT', () => {
    expect(readLocalTime('2027-03-14T02:30', 'America/Chicago').reading).toBe('nonexistent');
    expect(readLocalTime('2027-03-14T01:59', 'America/Chicago').reading).toBe('exact');
    expect(readLocalTime('2027-03-14T03:00', 'America/Chicago').reading).toBe('exact');
  });

  it('2026-11-01 01:30 happens twice, CDT then CST an hour later; the earlier is taken', () => {
    const r = readLocalTime('2026-11-01T01:30', 'America/Chicago');
    expect(r.reading).toBe('ambiguous');
    expect(formatInstant(r.millis, 'America/Chicago')).toBe('2026-11-01T01:30:00-05:00');
    expect(formatInstant(r.alternativeMillis!, 'America/Chicago')).toBe('2026-11-01T01:30:00-06:00');
    expect(r.alternativeMillis! - r.millis).toBe(3_600_000);
    expect(readLocalTime('2026-11-01T02:30', 'America/Chicago').reading).toBe('exact');
    expect(readLocalTime('2026-11-01T01:30:00-06:00', 'America/Chicago').reading).toBe('offset-given');
  });

  it('the fast formatter prints what luxon prints, across both transitions', () => {
    const fmt = instantFormatter('America/Chicago');
    for (const start of [Date.parse('2027-03-14T06:00:00Z'), Date.parse('2026-11-01T05:00:00Z')]) {
      for (let m = 0; m < 6 * 60; m += 7) {
        const ms = start + m * 60_000;
        expect(fmt(ms)).toBe(formatInstant(ms, 'America/Chicago'));
        expect(fmt(ms + 13_000)).toBe(formatInstant(ms + 13_000, 'America/Chicago'));
      }
    }
  });
});
