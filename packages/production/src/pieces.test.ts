import { describe, expect, it } from 'vitest';
import { DOUGH_DENSITY_G_PER_CM3, effectivePieceMass, pieceMass } from './pieces.js';
import { ProductionInputError } from './errors.js';

describe('pieceMass (annulus × thickness × density)', () => {
  it('ring + hole = the whole disc; a disc of 100 cm² × 1 cm at 1 g/cm³ weighs 100 g (area of a circle, πr²)', () => {
    const outerMm = 2 * Math.sqrt(10_000 / Math.PI); // 100 cm² = 10 000 mm²
    const m = pieceMass({ outerMm, innerMm: 30, thicknessMm: 10, densityGPerCm3: 1 });
    expect(m.ringGrams + m.holeGrams).toBeCloseTo(100, 9);
    expect(m.holeGrams).toBeCloseTo((Math.PI * 15 * 15 * 10) / 1000, 9);
  });

  it('uses unproofed dough density 1.18 g/cm³ (Sourdough Biotechnology, Table 3.4)', () => {
    expect(DOUGH_DENSITY_G_PER_CM3).toBe(1.18);
    expect(1 / DOUGH_DENSITY_G_PER_CM3).toBeCloseTo(0.85, 2); // specific volume 0.85 mL/g
  });

  it('a weighed piece overrides the computed mass (baker\'s measurement)', () => {
    const geometry = { outerMm: 76, innerMm: 25, thicknessMm: 13, densityGPerCm3: 1.18 };
    const m = effectivePieceMass(geometry, { ringGrams: 58 });
    expect(m.ringGrams).toBe(58);
    expect(m.holeGrams).toBeCloseTo(pieceMass(geometry).holeGrams, 12);
  });

  it('refuses a hole as wide as the ring', () => {
    expect(() => pieceMass({ outerMm: 50, innerMm: 50, thicknessMm: 10, densityGPerCm3: 1.18 })).toThrow(ProductionInputError);
  });
});
