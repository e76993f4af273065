import { describe, expect, it } from 'vitest';
import { dollarsText, parseDollars } from './money';

// ISO 4217 gives USD two minor-unit digits: one dollar is 100 cents.
describe('typed dollars to cents (ISO 4217: USD has 2 decimal places)', () => {
  it.each([
    ['12', 1200],
    ['12.5', 1250],
    ['12.50', 1250],
    ['12.', 1200],
    ['.75', 75],
    ['0.07', 7],
    ['$19.99', 1999],
    ['$ 4', 400],
    ['1,234.56', 123456],
    ['  8.10  ', 810],
  ])('"%s" is %i cents', (text, cents) => {
    expect(parseDollars(text)).toBe(cents);
  });

  it('reads 0.29 and 19.99 as exact cents, where binary floats would not (0.29 × 100 = 28.999…, IEEE 754)', () => {
    expect(0.29 * 100).not.toBe(29);
    expect(parseDollars('0.29')).toBe(29);
    expect(parseDollars('19.99')).toBe(1999);
  });

  it.each(['', '.', '$', 'abc', '-5', '+5', '12.345', '1e3', '12,34', '1,2345.00', '12.3.4', '4 50'])(
    'refuses "%s" rather than guess',
    (text) => {
      expect(parseDollars(text)).toBeNull();
    },
  );

  it('reads zero as zero cents; the refund form decides that zero is too little', () => {
    expect(parseDollars('0')).toBe(0);
    expect(parseDollars('0.00')).toBe(0);
  });
});

describe('cents back to the text of a dollar input (ISO 4217: 2 decimal places)', () => {
  it.each([
    [1250, '12.50'],
    [7, '0.07'],
    [0, '0.00'],
    [123456, '1234.56'],
    [100, '1.00'],
  ])('%i cents reads "%s"', (cents, text) => {
    expect(dollarsText(cents)).toBe(text);
  });

  it('goes there and back unchanged for every cent from 0 to $20.00', () => {
    for (let cents = 0; cents <= 2000; cents += 1) expect(parseDollars(dollarsText(cents))).toBe(cents);
  });
});
