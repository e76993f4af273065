import { describe, expect, it } from 'vitest';
import { centsToInput, currencyName, currencySymbol, formatCents, moneyTextSchema, parseCents, parseMoney, roundHalfUp } from './money.js';

// ISO 4217 gives USD two minor-unit digits: one dollar is 100 cents.
describe('parseMoney: typed amounts into integer cents (ISO 4217: USD has 2 decimal places)', () => {
  it.each([
    ['30', 3000],
    ['16.5', 1650],
    ['16.50', 1650],
    ['$8', 800],
    ['$ 8.00', 800],
    ['.75', 75],
    ['12.', 1200],
    [' 0 ', 0],
    ['1,234.56', 123456],
    ['$1,234.56', 123456],
    ['1,000', 100000],
    ['12,345,678', 1234567800],
    ['1234.56', 123456],
  ])('"%s" is %i cents', (text, cents) => {
    expect(parseMoney(text)).toEqual({ ok: true, cents });
    expect(parseCents(text)).toBe(cents);
  });

  it('works on the digits, so 0.29 and 19.99 are exact where 0.29 × 100 in binary floating point is not (IEEE 754)', () => {
    expect(0.29 * 100).not.toBe(29);
    expect(parseCents('0.29')).toBe(29);
    expect(parseCents('19.99')).toBe(1999);
    expect(parseCents('1.005')).toBeNull(); // a third decimal is refused, not rounded
  });

  it.each(['', '.', '$', 'abc', '+5', '1,50', '1,00.00', '12,34', ',123', '1e3', '12.3.4', '4 50', '30 dollars', 'NaN', 'Infinity', '0x10'])(
    'refuses "%s" with the format message, never NaN',
    (text) => {
      const result = parseMoney(text);
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.message).toMatch(/amount like 12\.50/);
      expect(parseCents(text)).toBeNull();
    },
  );

  it('says why for a third decimal and for a negative amount', () => {
    expect(parseMoney('2.345')).toEqual({ ok: false, message: 'At most two decimals (whole cents)' });
    expect(parseMoney('-5')).toEqual({ ok: false, message: 'The amount can’t be negative' });
  });

  it('refuses an amount too large to count in whole cents exactly (Number.MAX_SAFE_INTEGER, ECMAScript)', () => {
    expect(parseMoney('99999999999999999')).toEqual({ ok: false, message: 'That amount is too large' });
  });

  it.each(['usd', 'cad', 'eur', 'gbp', 'aud', 'nzd'])(
    'reads back what formatCents writes in %s, with its sign or its ISO 4217 code (Intl.NumberFormat, en-US, ECMA-402)',
    (currency) => {
      expect(parseMoney(formatCents(123456, currency), currency)).toEqual({ ok: true, cents: 123456 });
      expect(parseMoney(`${currency.toUpperCase()} 12.50`, currency)).toEqual({ ok: true, cents: 1250 });
      expect(parseMoney('12.50', currency)).toEqual({ ok: true, cents: 1250 });
    },
  );

  it("refuses another currency's sign when the currency is known, rather than reading €12 as $12", () => {
    expect(parseMoney('€12', 'usd')).toEqual({ ok: false, message: 'Amounts here are in dollars: write it as 12.50 or $12.50' });
    expect(parseMoney('CA$5', 'usd').ok).toBe(false);
    expect(parseMoney('£3', 'eur').ok).toBe(false);
    // a bare "$" is every dollar's sign (common practice, no source)
    expect(parseMoney('$5', 'cad')).toEqual({ ok: true, cents: 500 });
    expect(parseMoney('$5', 'nzd')).toEqual({ ok: true, cents: 500 });
    // not knowing the currency, any sign a shop may charge in is read
    expect(parseMoney('£3')).toEqual({ ok: true, cents: 300 });
    expect(parseMoney('¥3').ok).toBe(false);
  });

  it('drives a form field: a string in, cents out, the refusal as the field message', () => {
    expect(moneyTextSchema.parse('$1,234.56')).toBe(123456);
    const bad = moneyTextSchema.safeParse('12.345');
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0]?.message).toBe('At most two decimals (whole cents)');
  });
});

describe('formatCents: integer cents through Intl.NumberFormat (en-US, ECMA-402)', () => {
  it.each([
    [1250, '$12.50'],
    [7, '$0.07'],
    [0, '$0.00'],
    [123456, '$1,234.56'],
  ])('%i cents reads "%s"', (cents, text) => {
    expect(formatCents(cents)).toBe(text);
  });

  it('takes the shop setting’s lower-case code as well (ISO 4217 codes are case-insensitive in ECMA-402)', () => {
    expect(formatCents(1250, 'usd')).toBe('$12.50');
    expect(formatCents(1250, 'CAD')).toBe('CA$12.50');
  });

  // the expected text is Intl.NumberFormat's own (ECMA-402 with the runtime's CLDR data), not typed-in signs
  it.each(['eur', 'gbp', 'cad', 'aud', 'nzd'])('writes %s amounts as Intl.NumberFormat does, and names its sign for input labels', (code) => {
    const intl = new Intl.NumberFormat('en-US', { style: 'currency', currency: code.toUpperCase() });
    expect(formatCents(123456, code)).toBe(intl.format(1234.56));
    expect(formatCents(123456, code)).not.toBe(formatCents(123456, 'usd'));
    expect(currencySymbol(code)).toBe(intl.formatToParts(1).find((p) => p.type === 'currency')!.value);
    expect(formatCents(500, code).startsWith(currencySymbol(code))).toBe(true);
  });

  it('refuses a fraction of a cent rather than show it', () => {
    expect(() => formatCents(1.5)).toThrow(/whole number of cents/);
  });

  it('reads back what it writes, and the input text goes there and back for every cent from $0.00 to $40.00', () => {
    expect(parseCents(formatCents(123456))).toBe(123456);
    expect(centsToInput(1650)).toBe('16.50');
    expect(centsToInput(7)).toBe('0.07');
    for (let cents = 0; cents <= 4000; cents += 1) expect(parseCents(centsToInput(cents))).toBe(cents);
  });
});

describe('roundHalfUp (common practice, no source; values worked by hand)', () => {
  it('rounds a ratio of integers with halves up and no float drift', () => {
    expect(roundHalfUp(22275, 10_000)).toBe(2); // 2.2275 → 2
    expect(roundHalfUp(5, 10)).toBe(1); // 0.5 → 1
    expect(roundHalfUp(25, 10)).toBe(3); // 2.5 → 3
    expect(roundHalfUp(24, 10)).toBe(2);
  });

  it('rounds an amount of cents already worked out: 12.5 ¢ → 13 ¢, 12.49 ¢ → 12 ¢', () => {
    expect(roundHalfUp(12.5)).toBe(13);
    expect(roundHalfUp(12.49)).toBe(12);
  });

  it('refuses a non-number rather than return NaN', () => {
    expect(() => roundHalfUp(Number.NaN)).toThrow(/amount/);
    expect(() => roundHalfUp(1, 0)).toThrow(/divisor/);
  });
});

describe('currencyName (the plural name from Intl.NumberFormat with currencyDisplay "name", ECMA-402)', () => {
  it('names the shop locale’s own currency without its country, and others as Intl spells them', () => {
    expect(currencyName('USD')).toBe('dollars');
    for (const code of ['EUR', 'GBP', 'CAD']) {
      const intl = new Intl.NumberFormat('en-US', { style: 'currency', currency: code, currencyDisplay: 'name' });
      expect(currencyName(code)).toBe(intl.formatToParts(2).find((p) => p.type === 'currency')!.value);
    }
    // from memory: en-US spells the euro's plural "euros" and the Canadian dollar's "Canadian dollars"
    expect(currencyName('eur')).toBe('euros');
    expect(currencyName('CAD')).toBe('Canadian dollars');
  });
});
