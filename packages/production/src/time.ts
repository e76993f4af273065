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

const DAY_MS = 24 * HOUR_MS;
const DAY_MINUTES = 24 * 60;
const TWO_DIGITS = Array.from({ length: 60 }, (_, i) => (i < 10 ? `0${i}` : String(i)));

interface ZoneCache {
  zone: IANAZone;
  /** Offset for a whole UTC day, or null when it changes that day. */
  days: Map<number, number | null>;
  /** Offset for an hour of a changing day, or null when it changes within that hour. */
  hours: Map<number, number | null>;
  /** "YYYY-MM-DDTHH:" by local hour. */
  prefixes: Map<number, string>;
  offsetTexts: Map<number, string>;
  /** Whole-minute instants already printed: one array of a day's minutes per UTC day. */
  minuteTexts: Map<number, Array<string | undefined>>;
}

const zoneCaches = new Map<string, ZoneCache>();

function zoneCache(timeZone: string): ZoneCache {
  let cache = zoneCaches.get(timeZone);
  if (!cache || cache.prefixes.size > 200_000 || cache.minuteTexts.size > 400) {
    cache = { zone: IANAZone.create(timeZone), days: new Map(), hours: new Map(), prefixes: new Map(), offsetTexts: new Map(), minuteTexts: new Map() };
    zoneCaches.set(timeZone, cache);
  }
  return cache;
}

/** The zone's offset over the span of length `span` that holds `millis`, or null when it changes in that span (cached). */
function steadyOffset(c: ZoneCache, cache: Map<number, number | null>, span: number, millis: number): number | null {
  const index = Math.floor(millis / span);
  let o = cache.get(index);
  if (o === undefined) {
    const a = c.zone.offset(index * span);
    o = a === c.zone.offset((index + 1) * span - 1) ? a : null;
    cache.set(index, o);
  }
  return o;
}

/** The zone's offset at `millis` in minutes, or null inside the hour when it changes. */
function cachedOffset(c: ZoneCache, millis: number): number | null {
  return steadyOffset(c, c.days, DAY_MS, millis) ?? steadyOffset(c, c.hours, HOUR_MS, millis);
}

/**
 * A formatter for many instants in one zone (the staged line prints
 * thousands): the zone's offset is looked up once per day, or once per hour
 * on a day when it changes (a zone changes its offset at most once in a day),
 * and kept between calls; the hour when it changes is formatted exactly.
 * Whole seconds, printed as formatInstant prints them; whole minutes are
 * remembered, since a bake day's sheet repeats them, in one plain array per
 * UTC day shared by the zone's formatters (a map keyed by the minute cost more
 * than the rest of the formatting put together: a big bake's line spans weeks
 * and the map grew to hundreds of thousands of entries). Each formatter holds
 * on to the day it printed last, as the sheet prints its instants in order.
 */
export function instantFormatter(timeZone: string): (millis: number) => string {
  const c = zoneCache(requireTimeZone('timeZone', timeZone));
  let lastDay = Number.NaN;
  let lastTexts: Array<string | undefined> = [];
  const print = (millis: number): string => {
    const offset = cachedOffset(c, millis);
    if (offset === null || millis % 1000 !== 0) return formatInstant(millis, timeZone);
    const local = millis + offset * 60_000;
    const localHour = Math.floor(local / HOUR_MS);
    let prefix = c.prefixes.get(localHour);
    if (prefix === undefined) {
      prefix = new Date(localHour * HOUR_MS).toISOString().slice(0, 14);
      c.prefixes.set(localHour, prefix);
    }
    let suffix = c.offsetTexts.get(offset);
    if (suffix === undefined) {
      suffix = offsetText(offset);
      c.offsetTexts.set(offset, suffix);
    }
    const inHour = local - localHour * HOUR_MS;
    return prefix + TWO_DIGITS[Math.floor(inHour / 60_000)]! + ':' + TWO_DIGITS[Math.floor((inHour % 60_000) / 1000)]! + suffix;
  };
  return (millis: number) => {
    const minute = millis / 60_000;
    if (!Number.isInteger(minute)) return print(millis);
    const day = Math.floor(minute / DAY_MINUTES);
    if (day !== lastDay) {
      let texts = c.minuteTexts.get(day);
      if (texts === undefined) {
        texts = new Array<string | undefined>(DAY_MINUTES); // sized up front, so it keeps fast elements
        c.minuteTexts.set(day, texts);
      }
      lastDay = day;
      lastTexts = texts;
    }
    const k = minute - day * DAY_MINUTES;
    const hit = lastTexts[k];
    if (hit !== undefined) return hit;
    const text = print(millis);
    lastTexts[k] = text;
    return text;
  };
}

export type LocalTimeReading = 'exact' | 'offset-given' | 'ambiguous' | 'nonexistent';

/**
 * How a wall-clock time without an offset reads in a zone: once, twice (the
 * hour repeated when clocks go back: we take the first, earlier instant, so
 * the bake is ready in time either way) or never (the hour skipped when
 * clocks go forward: luxon moves it forward by the gap).
 */
export function readLocalTime(iso: string, timeZone: string): { reading: LocalTimeReading; millis: number; alternativeMillis?: number } {
  const millis = parseInstant('localTime', iso, timeZone);
  if (/([zZ]|[+-]\d{2}(:?\d{2})?)$/.test(iso.trim())) return { reading: 'offset-given', millis };
  const zone = IANAZone.create(timeZone);
  const wall = DateTime.fromISO(iso, { zone: 'UTC' }).toMillis(); // the wall-clock fields as if in UTC
  const offsets = new Set([zone.offset(wall - 24 * HOUR_MS), zone.offset(wall), zone.offset(wall + 24 * HOUR_MS)]);
  const fits = [...offsets].map((o) => wall - o * 60_000).filter((m) => zone.offset(m) === (wall - m) / 60_000).sort((a, b) => a - b);
  if (fits.length === 0) return { reading: 'nonexistent', millis };
  if (fits.length > 1) return { reading: 'ambiguous', millis: fits[0]!, alternativeMillis: fits[fits.length - 1]! };
  return { reading: 'exact', millis };
}

const FIVE_MINUTES_MS = 5 * 60_000;

/**
 * The last five-minute mark at or before an instant: where a baker starts a
 * step. Every UTC offset in use today is a whole number of quarter hours
 * (IANA tz database: +05:45, +12:45, −03:30 and the like), so a mark counted
 * in UTC is a mark on the local clock too, and the hour that happens twice on
 * a clocks-back night needs no special case: the instant only moves earlier.
 */
export function fiveMinuteMarkAtOrBefore(millis: number): number {
  return Math.floor(millis / FIVE_MINUTES_MS) * FIVE_MINUTES_MS;
}
