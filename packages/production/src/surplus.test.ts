import { describe, expect, it } from 'vitest';
import { madeByMenuItem, shareOut } from './surplus.js';

describe('shareOut (largest remainder)', () => {
  it('matches the worked Hare-quota example of the largest remainder method (Wikipedia, "Largest remainder method"; figures from memory)', () => {
    // 100,000 votes, 10 seats: 47,000 / 16,000 / 15,800 / 12,000 / 6,100 / 3,100 → 5, 2, 1, 1, 1, 0
    expect(shareOut(10, [47_000, 16_000, 15_800, 12_000, 6_100, 3_100])).toEqual([5, 2, 1, 1, 1, 0]);
  });
  it('always hands out exactly the total, ties to the earlier item', () => {
    expect(shareOut(1, [1, 1])).toEqual([1, 0]);
    expect(shareOut(7, [3, 3, 3])).toEqual([3, 2, 2]);
    expect(shareOut(5, [0, 0])).toEqual([0, 0]);
  });
});

describe('madeByMenuItem', () => {
  const menu = [
    { id: 'vanilla', kind: 'ring' as const, glazeRecipeId: 'vanilla-glaze' },
    { id: 'maple', kind: 'ring' as const, glazeRecipeId: 'maple-glaze' },
    { id: 'holes', kind: 'hole' as const, glazeRecipeId: 'cinnamon' },
  ];
  it('gives the extra rings to the item with the spare glaze', () => {
    const made = madeByMenuItem({ menu, ordered: [{ menuItemId: 'vanilla', quantity: 30 }, { menuItemId: 'maple', quantity: 10 }], extra: { rings: 4, holes: 0 }, spareGlazeId: 'maple-glaze' });
    expect(Object.fromEntries(made)).toEqual({ vanilla: 30, maple: 14, holes: 0 });
  });
  it('shares the extra in proportion to what was ordered when the spare is plain', () => {
    const made = madeByMenuItem({ menu, ordered: [{ menuItemId: 'vanilla', quantity: 30 }, { menuItemId: 'maple', quantity: 10 }], extra: { rings: 4, holes: 40 }, spareGlazeId: null });
    // 4 × 30/40 = 3, 4 × 10/40 = 1; the cut centres go to the only hole item
    expect(Object.fromEntries(made)).toEqual({ vanilla: 33, maple: 11, holes: 40 });
  });
  it('refuses a fractional piece count', () => {
    expect(() => madeByMenuItem({ menu, ordered: [{ menuItemId: 'vanilla', quantity: 1.5 }], extra: { rings: 0, holes: 0 }, spareGlazeId: null })).toThrow(/whole number/);
  });
});
