import { describe, expect, it } from 'vitest';
import { orderBill, priceOrder } from './pricing.js';

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

// Worked by hand from the menu's own prices; tax rounding half up is common practice, no source.
describe('orderBill', () => {
  const boxes = [
    {
      size: 'dozen' as const,
      priceCents: 3000,
      items: [
        { name: 'Plain sugar', quantity: 2, surchargeCents: 0 },
        { name: 'Brown butter glaze', quantity: 6, surchargeCents: 125 },
        { name: 'Passion fruit glaze', quantity: 4, surchargeCents: 100 },
      ],
    },
    { size: 'holes' as const, priceCents: 800, items: [{ name: 'Cinnamon holes', quantity: 12, surchargeCents: 0 }] },
  ];

  it('lists box prices, each surcharge and added tax, and the lines sum to the total (mixed dozen $30 + $7.50 + $4 surcharges, holes $8, 8.25 % added)', () => {
    const price = priceOrder(boxes.map((b) => ({ boxPriceCents: b.priceCents, items: b.items })), { mode: 'added', rateBasisPoints: 825 });
    // subtotal 3000 + 750 + 400 + 800 = 4950; 8.25 % of 4950 = 408.375 → 408
    expect(price).toMatchObject({ subtotalCents: 4950, taxCents: 408, totalCents: 5358 });
    const bill = orderBill({ boxes, ...price });
    expect(bill.lines.map((l) => [l.kind, l.cents])).toEqual([
      ['box', 3000],
      ['surcharge', 750],
      ['surcharge', 400],
      ['box', 800],
      ['tax', 408],
    ]);
    expect(bill.lines.reduce((s, l) => s + l.cents, 0)).toBe(bill.totalCents);
    expect(bill.totalCents).toBe(5358);
    expect(bill.lines[1]!.label).toBe('6 × Brown butter glaze (+$1.25 each)');
    expect(bill.includedTaxCents).toBeNull();
  });

  it('keeps included tax out of the lines and reports it as a note', () => {
    const price = priceOrder(boxes.map((b) => ({ boxPriceCents: b.priceCents, items: b.items })), { mode: 'included', rateBasisPoints: 1000 });
    const bill = orderBill({ boxes, ...price });
    expect(bill.lines.some((l) => l.kind === 'tax')).toBe(false);
    expect(bill.lines.reduce((s, l) => s + l.cents, 0)).toBe(4950);
    // 4950 ÷ 1.1 = 4500 → 450 inside
    expect(bill.includedTaxCents).toBe(450);
  });

  it('refuses stored figures whose lines would not add up', () => {
    expect(() => orderBill({ boxes, subtotalCents: 4950, taxCents: 0, totalCents: 3000 })).toThrow(/add up/);
  });
});
