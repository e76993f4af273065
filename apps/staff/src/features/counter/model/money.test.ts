import { describe, expect, it } from 'vitest';
import { parseDollars } from './money';

describe('parseDollars', () => {
  it('reads what is typed at the stall as whole cents', () => {
    expect(parseDollars('3.50')).toBe(350);
    expect(parseDollars('$7')).toBe(700);
    expect(parseDollars(' 12,05 ')).toBe(1205);
    expect(parseDollars('0.1')).toBe(10);
  });
  it('refuses what is not an amount', () => {
    for (const bad of ['', 'abc', '-2', '3.505', '1e3', '123456']) expect(parseDollars(bad), bad).toBeNull();
  });
});
