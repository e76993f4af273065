// The Monday of a date's week comes from the same function the API uses (mondayOf in @fryline/production).
export { mondayOf } from '@fryline/production';

/**
 * Weeks as the sales page steps through them: each starts on a Monday,
 * written YYYY-MM-DD. Calendar arithmetic on the date alone (at noon UTC),
 * so no time zone or daylight-saving change can move a day.
 */
const DAY = 86_400_000;
const parse = (date: string) => Date.parse(`${date}T12:00:00Z`);
const iso = (ms: number) => new Date(ms).toISOString().slice(0, 10);

/** The Monday `weeks` weeks later (earlier when negative). */
export function shiftWeek(monday: string, weeks: number): string {
  return iso(parse(monday) + weeks * 7 * DAY);
}

/** Today's date where the page is open, YYYY-MM-DD. */
export function todayHere(now: Date = new Date()): string {
  return `${now.getFullYear()}-${String(now.getMonth() + 1).padStart(2, '0')}-${String(now.getDate()).padStart(2, '0')}`;
}

/** A change as a signed percentage of the week before, or null when there is nothing to compare with. */
export function changePercent(now: number, before: number): number | null {
  if (before === 0) return null;
  return Math.round(((now - before) / Math.abs(before)) * 1000) / 10;
}
