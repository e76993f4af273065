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
