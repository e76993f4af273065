/**
 * Dates, clock times and counts as Fryline shows them. Every time is shown
 * in the bake day's own time zone, never the browser's.
 */

const LOCALE = 'en-US';
const formatters = new Map<string, Intl.DateTimeFormat>();

function formatter(timeZone: string, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const key = `${timeZone}|${JSON.stringify(options)}`;
  let f = formatters.get(key);
  if (!f) {
    f = new Intl.DateTimeFormat(LOCALE, { ...options, timeZone });
    formatters.set(key, f);
  }
  return f;
}

const PLAIN_DATE = /^\d{4}-\d{2}-\d{2}$/;

/** A calendar date ("2025-06-14") or an instant, as "Saturday, June 14" (or "Sat, Jun 14" when short). */
export function formatDate(date: string, timeZone: string, style: 'long' | 'short' = 'long'): string {
  const options: Intl.DateTimeFormatOptions =
    style === 'long' ? { weekday: 'long', month: 'long', day: 'numeric' } : { weekday: 'short', month: 'short', day: 'numeric' };
  if (PLAIN_DATE.test(date)) return formatter('UTC', options).format(new Date(`${date}T12:00:00Z`));
  return formatter(timeZone, options).format(new Date(date));
}

interface ClockParts {
  text: string;
  period: string;
}

function clockParts(iso: string, timeZone: string): ClockParts {
  const parts = formatter(timeZone, { hour: 'numeric', minute: '2-digit', hour12: true }).formatToParts(new Date(iso));
  const pick = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? '';
  const minute = pick('minute');
  return { text: minute === '00' ? pick('hour') : `${pick('hour')}:${minute}`, period: pick('dayPeriod').toLowerCase() };
}

/** "6 pm", "9:30 am". */
export function formatClock(iso: string, timeZone: string): string {
  const { text, period } = clockParts(iso, timeZone);
  return `${text} ${period}`;
}

/** "9–10 am", "11:30 am–12:30 pm". */
export function formatClockRange(startIso: string, endIso: string, timeZone: string): string {
  const start = clockParts(startIso, timeZone);
  const end = clockParts(endIso, timeZone);
  if (start.period === end.period) return `${start.text}–${end.text} ${end.period}`;
  return `${start.text} ${start.period}–${end.text} ${end.period}`;
}

/** "Thu 6 pm": a moment within the coming week or so. */
export function formatMoment(iso: string, timeZone: string): string {
  const weekday = formatter(timeZone, { weekday: 'short' }).format(new Date(iso));
  return `${weekday} ${formatClock(iso, timeZone)}`;
}

/** "Thu, Jun 12, 6 pm". */
export function formatDateTime(iso: string, timeZone: string): string {
  return `${formatDate(iso, timeZone, 'short')}, ${formatClock(iso, timeZone)}`;
}

/** "1 ring", "38 rings". */
export function plural(count: number, one: string, many = `${one}s`): string {
  return `${count} ${count === 1 ? one : many}`;
}

/** "wheat, milk and eggs"; "a dozen, a half dozen or a bag of holes" with `last = 'or'`. */
export function listWords(words: readonly string[], last: 'and' | 'or' = 'and'): string {
  if (words.length <= 1) return words.join('');
  return `${words.slice(0, -1).join(', ')} ${last} ${words[words.length - 1]}`;
}

/** "12 rings and 20 holes", "6 rings": leaves out a kind with none. */
export function formatPieces(rings: number, holes: number): string {
  const parts = [rings > 0 ? plural(rings, 'ring') : '', holes > 0 ? plural(holes, 'hole') : ''].filter(Boolean);
  return parts.length > 0 ? listWords(parts) : 'no doughnuts';
}
