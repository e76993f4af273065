import { describe, expect, it } from 'vitest';
import { priceOrder } from './pricing.js';

// Worked by hand; rounding half up to the cent is common practice, no source.
describe('priceOrder', () => {
  const dozen = { boxPriceCents: 3000, items: [{ surchargeCents: 0, quantity: 4 }, { surchargeCents: 50, quantity: 8 }] };
  const holes = { boxPriceCents: 800, items: [{ surchargeCents: 0, quantity: 12 }] };

  it('adds each item surcharge × quantity to its box price', () => {
    const price = priceOrder([dozen, holes], { mode: 'included', rateBasisPoints: 0 });
    expect(price).toEqual({ boxesCents: [3400, 800], subtotalCents: 4200, taxCents: 0, totalCents: 4200 });
  });

  it('adds tax on the subtotal, rounded half up: 8.25 % of $34.00 = $2.805 → $2.81', () => {
    const price = priceOrder([dozen], { mode: 'added', rateBasisPoints: 825 });
    expect(price).toMatchObject({ subtotalCents: 3400, taxCents: 281, totalCents: 3681 });
  });

  it('rounds an exact half cent up and a smaller fraction down', () => {
    // 5 % of $0.10 = 0.5 ¢ → 1 ¢; 4 % of $0.10 = 0.4 ¢ → 0 ¢
    expect(priceOrder([{ boxPriceCents: 10, items: [] }], { mode: 'added', rateBasisPoints: 500 }).taxCents).toBe(1);
    expect(priceOrder([{ boxPriceCents: 10, items: [] }], { mode: 'added', rateBasisPoints: 400 }).taxCents).toBe(0);
  });

  it('finds the tax inside a tax-included price: $33.00 at 10 % holds $3.00', () => {
    const price = priceOrder([{ boxPriceCents: 3300, items: [] }], { mode: 'included', rateBasisPoints: 1000 });
    expect(price).toEqual({ boxesCents: [3300], subtotalCents: 3300, taxCents: 300, totalCents: 3300 });
  });

  it('never makes included tax exceed the price, for any price and rate', () => {
    for (let cents = 0; cents <= 5000; cents += 37) {
      for (const rate of [0, 1, 500, 825, 1000, 2500]) {
        const p = priceOrder([{ boxPriceCents: cents, items: [] }], { mode: 'included', rateBasisPoints: rate });
        expect(p.taxCents).toBeGreaterThanOrEqual(0);
        expect(p.taxCents).toBeLessThanOrEqual(cents);
        expect(Number.isInteger(p.taxCents)).toBe(true);
      }
    }
  });
});
