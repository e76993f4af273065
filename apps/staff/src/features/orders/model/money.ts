/**
 * Dollars as a person types them, and back. Money stays in whole cents
 * everywhere else; only the text in an input box is in dollars.
 */

/** "12", "12.5", "$1,234.56", ".75": optional $, thousands commas, at most two decimals. */
const DOLLARS = /^\$?\s*(\d{1,3}(?:,\d{3})+|\d+)?(?:\.(\d{0,2}))?$/;

/**
 * The cents in a typed dollar amount, or null when the text is not one
 * (negative, more than two decimals, letters, empty). Works on the digits,
 * never on a float, so "19.99" is exactly 1999.
 */
export function parseDollars(text: string): number | null {
  const match = DOLLARS.exec(text.trim());
  if (!match) return null;
  const [, whole, fraction] = match;
  if (whole === undefined && !fraction) return null;
  const cents = Number((whole ?? '0').replace(/,/g, '')) * 100 + Number((fraction ?? '').padEnd(2, '0'));
  return Number.isSafeInteger(cents) ? cents : null;
}

/** Cents as the text of a dollar input: 1250 → "12.50", 7 → "0.07" (no sign, no commas). */
export function dollarsText(cents: number): string {
  const whole = Math.floor(cents / 100);
  return `${whole}.${String(cents - whole * 100).padStart(2, '0')}`;
}
