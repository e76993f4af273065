import { z } from 'zod';

/**
 * Money: integer cents everywhere; text only where a person types or reads it.
 * One rule for reading typed amounts, one formatter, one half-up rounding.
 */

/** The shop's locale and its default currency (ISO 4217); the shop setting may name another two-decimal currency. */
export const SHOP_LOCALE = 'en-US';
export const SHOP_CURRENCY = 'USD';

/** The one half-up rounding lives with the maths (packages/production); money uses it from here. */
export { roundHalfUp } from '@fryline/production';

/**
 * What an amount may look like when typed: an optional currency sign (as
 * formatCents writes it, "$", "€", "£", "CA$", or the ISO code, "EUR 12"),
 * whole units either plain ("1234") or with correct thousands commas
 * ("1,234"), then at most two decimals ("1,234.56", "12.5", ".75", "12.").
 * Nothing else: no minus sign, no third decimal, no misplaced comma, no letters.
 */
const TYPED_AMOUNT = /^(?:([A-Za-z]{0,3}\$|[€£]|[A-Za-z]{3}(?=\s|\d))\s*)?(\d{1,3}(?:,\d{3})+|\d+)?(?:\.(\d{0,2}))?$/;

/** Currencies the shop can take payment in (ISO 4217, lower case as the payment provider writes them). */
export const shopCurrencies = ['usd', 'cad', 'eur', 'gbp', 'aud', 'nzd'] as const;

/** The message for anything that is not an amount. */
export const MONEY_FORMAT_MESSAGE = 'Enter an amount like 12.50 or $1,234.56 (at most two decimals)';

export type MoneyParseResult = { ok: true; cents: number } | { ok: false; message: string };

/** Whether `sign` (as typed) is `currency`'s: its symbol or its code, either case; a bare "$" for any dollar. */
function signOf(sign: string, currency: string): boolean {
  const typed = sign.toUpperCase();
  const symbol = currencySymbol(currency).toUpperCase();
  return typed === currency.toUpperCase() || typed === symbol || (typed === '$' && symbol.endsWith('$'));
}

/**
 * Reads a typed amount into integer cents, working on the digits (never a
 * float), so "19.99" is exactly 1999. Refuses rather than guesses: a refusal
 * carries a message a person can act on, and the result is never NaN. With
 * `currency` (the shop's, or the order's), a sign must be that currency's:
 * "€12" in a shop that charges dollars is refused, not read as $12; without
 * it, the sign of any currency a shop may take is accepted.
 */
export function parseMoney(text: string, currency?: string): MoneyParseResult {
  const match = TYPED_AMOUNT.exec(text.trim());
  const sign = match?.[1];
  const whole = match?.[2];
  const fraction = match?.[3] ?? '';
  if (!match || (whole === undefined && fraction === '')) {
    if (/\.\d{3,}\s*$/.test(text)) return { ok: false, message: 'At most two decimals (whole cents)' };
    if (/^\s*[-−]/.test(text)) return { ok: false, message: 'The amount can’t be negative' };
    return { ok: false, message: currency ? `Enter an amount like 12.50 or ${formatCents(123456, currency)} (at most two decimals)` : MONEY_FORMAT_MESSAGE };
  }
  if (sign !== undefined && !(currency ? signOf(sign, currency) : shopCurrencies.some((c) => signOf(sign, c)))) {
    return { ok: false, message: currency ? `Amounts here are in ${currencyName(currency)}: write it as 12.50 or ${formatCents(1250, currency)}` : MONEY_FORMAT_MESSAGE };
  }
  const cents = Number((whole ?? '0').replace(/,/g, '')) * 100 + Number(fraction.padEnd(2, '0'));
  if (!Number.isSafeInteger(cents)) return { ok: false, message: 'That amount is too large' };
  return { ok: true, cents };
}

/** The cents in a typed amount, or null when it is not one (see parseMoney for the reason). */
export function parseCents(text: string, currency?: string): number | null {
  const result = parseMoney(text, currency);
  return result.ok ? result.cents : null;
}

/** A form field holding a typed amount: the string in, integer cents out, the refusal as the field's message. */
export const moneyTextSchema = z.string().transform((text, ctx) => {
  const result = parseMoney(text);
  if (!result.ok) {
    ctx.addIssue({ code: 'custom', message: result.message });
    return z.NEVER;
  }
  return result.cents;
});

const formatters = new Map<string, Intl.NumberFormat>();

function moneyFormat(currency: string): Intl.NumberFormat {
  const code = currency.toUpperCase();
  let format = formatters.get(code);
  if (!format) {
    format = new Intl.NumberFormat(SHOP_LOCALE, { style: 'currency', currency: code });
    formatters.set(code, format);
  }
  return format;
}

/** Integer cents for reading, in the shop's currency: 1250 → "$12.50", 123456 → "$1,234.56" (in euros "€12.50"). */
export function formatCents(cents: number, currency: string = SHOP_CURRENCY): string {
  if (!Number.isInteger(cents)) throw new RangeError(`formatCents: ${cents} is not a whole number of cents`);
  return moneyFormat(currency).format(cents / 100);
}

/** The currency's sign as formatCents writes it ("$", "€", "£", "CA$"), to label an amount input. */
export function currencySymbol(currency: string = SHOP_CURRENCY): string {
  return moneyFormat(currency).formatToParts(0).find((p) => p.type === 'currency')?.value ?? currency.toUpperCase();
}

const currencyNames = new Map<string, string>();

/**
 * The currency's name in the plural, to label an amount input: "euros",
 * "Canadian dollars". The shop locale's own currency goes without its
 * country ("dollars" rather than "US dollars" in en-US), as people say it.
 */
export function currencyName(currency: string = SHOP_CURRENCY): string {
  const code = currency.toUpperCase();
  let name = currencyNames.get(code);
  if (!name) {
    const parts = new Intl.NumberFormat(SHOP_LOCALE, { style: 'currency', currency: code, currencyDisplay: 'name' }).formatToParts(2);
    name = parts.find((p) => p.type === 'currency')?.value ?? code;
    if (code === SHOP_CURRENCY) name = name.replace(/^US /, '');
    currencyNames.set(code, name);
  }
  return name;
}

/** Cents as the text of an amount input (no sign, no separators): 1250 → "12.50", 7 → "0.07"; parseMoney reads it back. */
export function centsToInput(cents: number): string {
  if (!Number.isSafeInteger(cents) || cents < 0) throw new RangeError(`centsToInput: ${cents} is not a whole, non-negative number of cents`);
  return `${Math.floor(cents / 100)}.${String(cents % 100).padStart(2, '0')}`;
}
