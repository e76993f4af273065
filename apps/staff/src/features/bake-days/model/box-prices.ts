/**
 * Box prices as the owner types them (dollars) and as the API takes them
 * (whole cents). The arithmetic works on the digits as typed, never on a
 * float, so "16.50" is exactly 1650.
 */
import type { BoxSize } from '@fryline/schemas';

/** Doughnuts in each box: a dozen is 12 and a half dozen 6; a bag of holes starts at 12. */
export const standardPieces: Record<BoxSize, number> = { dozen: 12, 'half-dozen': 6, holes: 12 };

/** "30", "16.5", "$8.00", ".75": dollars, with or without the sign, no thousands commas. */
const DOLLARS = /^\$?\s*(\d*)(?:\.(\d*))?$/;

/**
 * Typed dollars as whole cents, rounded half up to the cent ("2.345" → 235,
 * "2.3449" → 234), or null when the text is not an amount.
 */
export function dollarsToCents(text: string): number | null {
  const match = DOLLARS.exec(text.trim());
  if (!match) return null;
  const [, whole = '', decimals = ''] = match;
  if (whole === '' && decimals === '') return null;
  // Halves up: only the first digit dropped decides (…5 and above rounds up, whatever follows).
  const roundUp = Number(decimals.charAt(2) || '0') >= 5 ? 1 : 0;
  const cents = Number(whole || '0') * 100 + Number(decimals.slice(0, 2).padEnd(2, '0')) + roundUp;
  return Number.isSafeInteger(cents) ? cents : null;
}

/** Cents as the text of a price input: 1650 → "16.50", 800 → "8.00". */
export function centsToDollars(cents: number): string {
  const whole = Math.floor(cents / 100);
  return `${whole}.${String(cents % 100).padStart(2, '0')}`;
}
