/**
 * Instants: parsed and printed in the bake day's IANA time zone with luxon,
 * computed in absolute time (milliseconds), so a schedule that crosses a
 * daylight-saving change keeps its real elapsed durations.
 */
import { DateTime, IANAZone } from 'luxon';
import { ProductionInputError } from './errors.js';

export function requireTimeZone(field: string, timeZone: string): string {
  // IANAZone.create caches the zone and its validity; isValidZone would build a formatter every call.
  if (typeof timeZone !== 'string' || timeZone === '' || !IANAZone.create(timeZone).isValid) {
    throw new ProductionInputError(field, `is not a known IANA time zone (got ${String(timeZone)})`);
  }
  return timeZone;
}

/** Milliseconds since the epoch for an ISO-8601 string; a string without an offset is read in `timeZone`. */
export function parseInstant(field: string, iso: string, timeZone: string): number {
  const dt = typeof iso === 'string' ? DateTime.fromISO(iso, { zone: timeZone }) : DateTime.invalid('not a string');
  if (!dt.isValid) throw new ProductionInputError(field, `is not an ISO-8601 date-time (got ${String(iso)})`);
  return dt.toMillis();
}

/** ISO-8601 with the zone's offset at that instant, e.g. 2026-10-31T10:00:00-04:00. */
export function formatInstant(millis: number, timeZone: string): string {
  const iso = DateTime.fromMillis(millis, { zone: timeZone }).toISO({ suppressMilliseconds: true });
  if (iso === null) throw new ProductionInputError('instant', `cannot be shown in ${timeZone}`);
  return iso;
}

const HOUR_MS = 3_600_000;

function offsetText(minutes: number): string {
  const sign = minutes < 0 ? '-' : '+';
  const abs = Math.abs(minutes);
  return `${sign}${String(Math.floor(abs / 60)).padStart(2, '0')}:${String(abs % 60).padStart(2, '0')}`;
}

/**
 * A formatter for many instants in one zone (the staged line prints thousands):
 * the zone's offset is looked up once per hour and reused when the offset is
 * the same at both ends of that hour (a zone changes its offset at most once
 * in an hour); otherwise the instant is formatted exactly. Whole seconds, as
 * formatInstant prints them.
 */
export function instantFormatter(timeZone: string): (millis: number) => string {
  const zone = IANAZone.create(requireTimeZone('timeZone', timeZone));
  const cache = new Map<number, number | null>();
  return (millis: number) => {
    const hour = Math.floor(millis / HOUR_MS);
    let offset = cache.get(hour);
    if (offset === undefined) {
      const a = zone.offset(hour * HOUR_MS);
      const b = zone.offset((hour + 1) * HOUR_MS - 1);
      offset = a === b ? a : null;
      cache.set(hour, offset);
    }
    if (offset === null || millis % 1000 !== 0) return formatInstant(millis, timeZone);
    return `${new Date(millis + offset * 60_000).toISOString().slice(0, 19)}${offsetText(offset)}`;
  };
}

export type LocalTimeReading = 'exact' | 'offset-given' | 'ambiguous' | 'nonexistent';

/**
 * How a wall-clock time without an offset reads in a zone: once, twice (the
 * hour repeated when clocks go back; luxon takes the first, earlier
 * instant) or never (the hour skipped when clocks go forward; luxon moves
 * it forward by the gap).
 */
export function readLocalTime(iso: string, timeZone: string): { reading: LocalTimeReading; millis: number; alternativeMillis?: number } {
  const millis = parseInstant('localTime', iso, timeZone);
  if (/([zZ]|[+-]\d{2}(:?\d{2})?)$/.test(iso.trim())) return { reading: 'offset-given', millis };
  const zone = IANAZone.create(timeZone);
  const wall = DateTime.fromISO(iso, { zone: 'UTC' }).toMillis(); // the wall-clock fields as if in UTC
  const offsets = new Set([zone.offset(wall - 3 * HOUR_MS), zone.offset(wall), zone.offset(wall + 3 * HOUR_MS)]);
  const fits = [...offsets].map((o) => wall - o * 60_000).filter((m) => zone.offset(m) === (wall - m) / 60_000).sort((a, b) => a - b);
  if (fits.length === 0) return { reading: 'nonexistent', millis };
  if (fits.length > 1) return { reading: 'ambiguous', millis, alternativeMillis: fits.find((m) => m !== millis) };
  return { reading: 'exact', millis };
}
