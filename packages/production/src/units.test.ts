import { describe, expect, it } from 'vitest';
import {
  cDeltaToF, cToF, fDeltaToC, fToC, gToLb, gToOz, inToMm, lbToG, mmToIn, ozToG, roundHalfUp, tempInBothScales,
} from './units.js';
import { ProductionInputError } from './errors.js';

describe('temperatures (NIST SP 811 App. B: °C = (°F − 32) / 1.8)', () => {
  it.each([
    [350, 176.67],
    [365, 185.0],
    [375, 190.56],
    [149, 65.0],
    [40, 4.44],
  ])('%s °F = %s °C (NIST SP 811 check value)', (f, c) => {
    expect(fToC(f)).toBeCloseTo(c, 2);
    expect(cToF(fToC(f))).toBeCloseTo(f, 10);
  });

  it('375 °F is 190.56 °C, not the 190.5 some tables print (NIST SP 811)', () => {
    expect(Math.round(fToC(375) * 100) / 100).toBe(190.56);
  });

  it('a 10 °C interval is 18 °F, without the 32° offset (NIST SP 811 App. B)', () => {
    expect(cDeltaToF(10)).toBeCloseTo(18, 12);
    expect(fDeltaToC(18)).toBeCloseTo(10, 12);
    expect(fDeltaToC(1)).toBeCloseTo(5 / 9, 12);
  });

  it('formats both scales for the baker\'s texts (NIST SP 811 check value 375 °F = 190.56 °C)', () => {
    expect(tempInBothScales(fToC(375))).toBe('191 °C (375 °F)');
  });
});

describe('masses and lengths (NIST Handbook 44 App. C, exact)', () => {
  it('1 oz = 28.349523125 g and 1 lb = 453.59237 g', () => {
    expect(ozToG(1)).toBe(28.349523125);
    expect(lbToG(1)).toBe(453.59237);
    expect(gToOz(453.59237)).toBeCloseTo(16, 12);
    expect(gToLb(ozToG(16))).toBeCloseTo(1, 12);
  });

  it('1 in = 25.4 mm', () => {
    expect(inToMm(3)).toBeCloseTo(76.2, 12);
    expect(mmToIn(50.8)).toBeCloseTo(2, 12);
  });
});

describe('money helpers', () => {
  it('rounds cents to the nearest cent with halves up (worked by hand)', () => {
    expect(roundHalfUp(12.5)).toBe(13);
    expect(roundHalfUp(12.49)).toBe(12);
  });

  it('refuses non-numbers with a clear error', () => {
    expect(() => fToC(Number.NaN)).toThrow(ProductionInputError);
  });
});
