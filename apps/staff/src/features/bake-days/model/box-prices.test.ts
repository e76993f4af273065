import { describe, expect, it } from 'vitest';
import { centsToDollars, dollarsToCents, standardPieces } from './box-prices';

// ISO 4217 gives USD two minor-unit digits: one dollar is 100 cents.
describe('box prices typed in dollars, sent in cents (ISO 4217: USD has 2 decimal places)', () => {
  it.each([
    ['30', 3000],
    ['16.5', 1650],
    ['16.50', 1650],
    ['$8', 800],
    ['$ 8.00', 800],
    ['.75', 75],
    ['12.', 1200],
    [' 0 ', 0],
  ])('"%s" is %i cents', (text, cents) => {
    expect(dollarsToCents(text)).toBe(cents);
  });

  it('works on the digits, so 0.29 and 19.99 are exact where 0.29 × 100 in binary floating point is not (IEEE 754)', () => {
    expect(0.29 * 100).not.toBe(29);
    expect(dollarsToCents('0.29')).toBe(29);
    expect(dollarsToCents('19.99')).toBe(1999);
  });

  it('rounds to the cent half up: a third decimal of 5 or more goes up, less goes down (common practice, no source)', () => {
    expect(dollarsToCents('2.345')).toBe(235);
    expect(dollarsToCents('2.3449')).toBe(234);
    expect(dollarsToCents('2.344')).toBe(234);
    expect(dollarsToCents('0.005')).toBe(1);
    expect(dollarsToCents('0.0049')).toBe(0);
    expect(dollarsToCents('9.995')).toBe(1000);
    expect(dollarsToCents('1.005')).toBe(101); // 1.005 × 100 is 100.4999… as a float (IEEE 754)
  });

  it.each(['', '.', '$', 'abc', '-5', '+5', '1,50', '1,000', '1e3', '12.3.4', '4 50', '30 dollars'])('refuses "%s" rather than guess', (text) => {
    expect(dollarsToCents(text)).toBeNull();
  });

  it.each([
    [3000, '30.00'],
    [1650, '16.50'],
    [7, '0.07'],
    [0, '0.00'],
  ])('%i cents shows as "%s" in the price input', (cents, text) => {
    expect(centsToDollars(cents)).toBe(text);
  });

  it('goes there and back unchanged for every cent from $0.00 to $40.00', () => {
    for (let cents = 0; cents <= 4000; cents += 1) expect(dollarsToCents(centsToDollars(cents))).toBe(cents);
  });
});

describe('what a box holds', () => {
  it('a dozen is 12 and a half dozen 6 (the words’ dictionary sense); a bag of holes starts at 12 (common practice, no source)', () => {
    expect(standardPieces).toEqual({ dozen: 12, 'half-dozen': 6, holes: 12 });
  });
});
