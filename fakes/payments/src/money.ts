/**
 * Card processing fee: 2.9 % of the amount plus 30 minor units, rounded to
 * the nearest unit (halves up). Integer arithmetic keeps it exact.
 */
export const FEE_PERCENT_TENTHS = 29; // 2.9 %
export const FEE_FIXED = 30;

export function processingFee(amount: number): number {
  return Math.floor((amount * FEE_PERCENT_TENTHS + 500) / 1000) + FEE_FIXED;
}

/** Funds from a charge become available two days after it (standard rolling payout delay). */
export const AVAILABLE_AFTER_SECONDS = 2 * 86_400;

const knownCurrencies = new Set(Intl.supportedValuesOf('currency').map((c) => c.toLowerCase()));

export function isKnownCurrency(code: string): boolean {
  return knownCurrencies.has(code.toLowerCase());
}

/** How many decimal places a currency's minor unit has (2 for usd, 0 for jpy). */
export function minorUnitDigits(currency: string): number {
  return (
    new Intl.NumberFormat('en-US', { style: 'currency', currency: currency.toUpperCase() }).resolvedOptions()
      .maximumFractionDigits ?? 2
  );
}

/** `1200, 'usd'` → `$12.00`. */
export function formatAmount(amount: number, currency: string): string {
  const digits = minorUnitDigits(currency);
  return new Intl.NumberFormat('en-US', {
    style: 'currency',
    currency: currency.toUpperCase(),
    minimumFractionDigits: digits,
    maximumFractionDigits: digits,
  }).format(amount / 10 ** digits);
}
