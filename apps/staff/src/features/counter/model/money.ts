// Money as the counter person types it.

/** Dollars as typed ("3.50", "$7", "12,00") to whole cents, or null when it is not an amount. */
export function parseDollars(text: string): number | null {
  const t = text.trim().replace(/^\$/, '').replace(',', '.');
  if (!/^\d{1,5}(\.\d{0,2})?$/.test(t)) return null;
  return Math.round(Number(t) * 100);
}
