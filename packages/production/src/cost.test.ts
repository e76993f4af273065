import { describe, expect, it } from 'vitest';
import { costBake, type CostInput } from './cost.js';
import { scaleFormula } from './formula.js';

const dough = scaleFormula(
  { ingredients: [{ name: 'Flour', percent: 100, kind: 'flour' }, { name: 'Water', percent: 60, kind: 'water' }] },
  1600,
);

const base: CostInput = {
  ingredients: dough.ingredients,
  doughGrams: 1600,
  ringGrams: 50,
  holeGrams: 10,
  cutYield: 1,
  fatAbsorbedGramsPerRing: 0,
  oilFillGrams: 0,
  friedGrams: 1600,
  glazes: [{ id: 'sugar', name: 'Sugar', gramsPerRing: 10, gramsPerHole: 2, parts: [{ name: 'Sugar', parts: 1 }] }],
  prices: { centsPerKg: { Flour: 200, Water: 0, Sugar: 300 }, fryingOilCentsPerKg: 400 },
  boxes: [{ id: 'dozen', name: 'Dozen', rings: 12, holes: 0, glazeId: null, priceCents: 2400, packagingCents: 50 }],
};

describe('cost per piece and per box (worked by hand; rounding stated in the code)', () => {
  it('rounds each figure once, at the end, to the nearest cent', () => {
    // 1000 g flour at 200 ¢/kg = 200 ¢ for 1600 g dough → 0.125 ¢/g; ring 50 g → 6.25 ¢ → 6 ¢.
    const c = costBake(base);
    expect(c.doughCents).toBe(200);
    expect(c.perPiece[0]).toEqual({ glazeId: null, ringCents: 6, holeCents: 1 });
    // box: 12 × 6.25 = 75 ¢ + 50 ¢ packaging = 125 ¢ (not 12 × 6 + 50 = 122)
    expect(c.boxes[0]).toMatchObject({ costCents: 125, marginCents: 2275 });
    expect(c.boxes[0]!.marginPercent).toBeCloseTo((2275 / 2400) * 100, 9);
  });

  it('spreads scrap over the pieces and adds glaze and frying fat', () => {
    const c = costBake({ ...base, cutYield: 0.8, fatAbsorbedGramsPerRing: 5 });
    // dough 6.25 / 0.8 = 7.8125 ¢; fat 5 g × 0.4 ¢/g = 2 ¢; glaze 10 g × 0.3 ¢/g = 3 ¢ → 12.8125 → 13 ¢
    expect(c.perPiece.find((p) => p.glazeId === 'sugar')!.ringCents).toBe(13);
  });

  it('lists ingredients without a price', () => {
    const c = costBake({ ...base, prices: { ...base.prices, centsPerKg: { Flour: 200 } } });
    expect(c.missingPrices).toEqual(['Sugar', 'Water']);
  });

  it('counts a flavour\'s add-ins in the cost of its pieces', () => {
    // Worked by hand. Base: 1000 g flour + 600 g water; 1000 g flour at 200 ¢/kg = 200 ¢ for 1600 g → 0.125 ¢/g.
    // Lemon dough: per 1000 g of base, 40 g zest at 2500 ¢/kg = 100 ¢. 1040 g of lemon dough cost
    // 125 + 100 = 225 ¢ → 0.216346… ¢/g. Ring 50 g → 10.817 ¢ → 11 ¢ (plain base ring 6.25 → 6 ¢);
    // hole 10 g → 2.163 ¢ → 2 ¢; sugar-glazed ring adds 10 g × 0.3 ¢/g = 3 ¢ → 13.817 → 14 ¢.
    const lemon = [...scaleFormula({ ingredients: [{ name: 'Flour', percent: 100, kind: 'flour' }, { name: 'Water', percent: 60, kind: 'water' }] }, 1000).ingredients, { name: 'Lemon zest', grams: 40, portion: false }];
    const c = costBake({ ...base, prices: { ...base.prices, centsPerKg: { ...base.prices.centsPerKg, 'Lemon zest': 2500 } }, doughs: [{ dough: 'lemon', name: 'Lemon dough', ingredients: lemon, doughGrams: 1040 }] });
    expect(c.perPiece[0]).toEqual({ glazeId: null, ringCents: 6, holeCents: 1 });
    expect(c.perDough).toEqual([{
      dough: 'lemon',
      name: 'Lemon dough',
      perPiece: [{ glazeId: null, ringCents: 11, holeCents: 2 }, { glazeId: 'sugar', ringCents: 14, holeCents: 3 }],
      missingPrices: [],
    }]);
    // An add-in without a price is listed, like any ingredient.
    expect(costBake({ ...base, doughs: [{ dough: 'lemon', name: 'Lemon dough', ingredients: lemon, doughGrams: 1040 }] }).missingPrices).toEqual(['Lemon zest']);
    // A dough not made tonight keeps its list to itself.
    const notTonight = costBake({ ...base, doughs: [{ dough: 'lemon', name: 'Lemon dough', ingredients: lemon, doughGrams: 1040, listMissing: false }] });
    expect(notTonight.missingPrices).toEqual([]);
    expect(notTonight.perDough[0]!.missingPrices).toEqual(['Lemon zest']);
  });
});
