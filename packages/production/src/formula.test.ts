import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEFAULT_FORMULA } from './defaults.js';
import { ProductionInputError } from './errors.js';
import {
  EGG_CLASS_OZ_PER_DOZEN, eggEdibleGrams, flourForDough, LARGE_EGG_GRAMS, scaleFormula, starterPercentFromPrefermentedFlour, wholeEggs, type Formula, type ScaledIngredient,
} from './formula.js';
import { gToOz, ozToG } from './units.js';

const sum = (rows: ScaledIngredient[]) => rows.reduce((s, r) => s + r.grams, 0);
const byKind = (rows: ScaledIngredient[], kind: string) => rows.filter((r) => r.kind === kind).reduce((s, r) => s + r.grams, 0);

describe("baker's percentages", () => {
  it('PMQ Pizza Magazine "Dough Doctor": 800 oz flour → salt 14, yeast 3, oil 8, water 464 oz', () => {
    const formula: Formula = {
      ingredients: [
        { name: 'Flour', percent: 100, kind: 'flour' },
        { name: 'Salt', percent: 1.75, kind: 'salt' },
        { name: 'Instant yeast', percent: 0.375, kind: 'other' },
        { name: 'Oil', percent: 1, kind: 'other' },
        { name: 'Water', percent: 58, kind: 'water' },
      ],
    };
    const doughOz = 800 + 14 + 3 + 8 + 464;
    const scaled = scaleFormula(formula, ozToG(doughOz));
    const oz = (name: string) => gToOz(scaled.ingredients.find((i) => i.name === name)!.grams);
    expect(gToOz(scaled.totalFlourGrams)).toBeCloseTo(800, 9);
    expect(oz('Salt')).toBeCloseTo(14, 9);
    expect(oz('Instant yeast')).toBeCloseTo(3, 9);
    expect(oz('Oil')).toBeCloseTo(8, 9);
    expect(oz('Water')).toBeCloseTo(464, 9);
    expect(oz('Water') / 16).toBeCloseTo(29, 9); // 29 lb
  });

  it('dough → flour: Σ 377.5 %, 3000 g dough → 794.70 g flour (Professional Baking method)', () => {
    expect(flourForDough(3000, 377.5)).toBeCloseTo(794.7, 2);
    const scaled = scaleFormula(
      { ingredients: [{ name: 'Flour', percent: 100, kind: 'flour' }, { name: 'Everything else', percent: 277.5, kind: 'other' }] },
      3000,
    );
    expect(scaled.totalFlourGrams).toBeCloseTo(794.7, 2);
    expect(scaled.percentSum).toBeCloseTo(377.5, 10);
  });

  it('R package "sourrr" README: 900 g, 75 % hydration, 25 % starter at 100 % → 514.29 / 385.71 / 128.57; added flour 450, water 321.4', () => {
    const scaled = scaleFormula(
      {
        ingredients: [
          { name: 'Flour', percent: 100, kind: 'flour' },
          { name: 'Water', percent: 75, kind: 'water' },
          { name: 'Starter', percent: 25, kind: 'starter' },
        ],
        starterHydrationPercent: 100,
      },
      900,
    );
    expect(scaled.totalFlourGrams).toBeCloseTo(514.29, 2);
    expect(byKind(scaled.ingredients, 'water')).toBeCloseTo(385.71, 2);
    expect(scaled.starter!.grams).toBeCloseTo(128.57, 2);
    expect(scaled.starter!.flourGrams).toBeCloseTo(64.29, 2);
    expect(scaled.starter!.waterGrams).toBeCloseTo(64.29, 2);
    expect(byKind(scaled.finalDough, 'flour')).toBeCloseTo(450, 2);
    expect(byKind(scaled.finalDough, 'water')).toBeCloseTo(321.4, 1);
    expect(scaled.hydrationPercent).toBe(75);
  });

  it('Bread Bakers Guild of America layout: 1000 g flour, 10 % prefermented at 100 % → levain 100 + 100; at 80 % water final dough 900 g flour, 700 g water', () => {
    const starterPercent = starterPercentFromPrefermentedFlour(10, 100);
    const scaled = scaleFormula(
      {
        ingredients: [
          { name: 'Flour', percent: 100, kind: 'flour' },
          { name: 'Water', percent: 80, kind: 'water' },
          { name: 'Levain', percent: starterPercent, kind: 'starter' },
        ],
      },
      1800,
    );
    expect(scaled.totalFlourGrams).toBeCloseTo(1000, 9);
    expect(scaled.starter!.flourGrams).toBeCloseTo(100, 9);
    expect(scaled.starter!.waterGrams).toBeCloseTo(100, 9);
    expect(scaled.starter!.prefermentedFlourPercent).toBeCloseTo(10, 9);
    expect(byKind(scaled.finalDough, 'flour')).toBeCloseTo(900, 9);
    expect(byKind(scaled.finalDough, 'water')).toBeCloseTo(700, 9);
  });

  it('milk roux flour counts in total flour and its milk in the milk (1:5 flour:milk, common practice)', () => {
    const scaled = scaleFormula(
      {
        ingredients: [
          { name: 'Flour', percent: 100, kind: 'flour' },
          { name: 'Milk', percent: 60, kind: 'milk' },
          { name: 'Roux flour', percent: 5, kind: 'roux-flour' },
        ],
      },
      1600,
    );
    expect(scaled.totalFlourGrams).toBeCloseTo(1000, 9);
    expect(scaled.roux!.flourGrams).toBeCloseTo(50, 9);
    expect(scaled.roux!.milkGrams).toBeCloseTo(250, 9);
    expect(scaled.roux!.cookToC).toBe(65); // Wikipedia "Water roux": starch gelatinises about 65 °C
    expect(byKind(scaled.finalDough, 'flour')).toBeCloseTo(950, 9);
    expect(byKind(scaled.finalDough, 'milk')).toBeCloseTo(350, 9);
  });
});

describe('hydration two ways (USDA SR Legacy water per 100 g)', () => {
  const formula = (salted: boolean): Formula => ({
    ingredients: [
      { name: 'Flour', percent: 100, kind: 'flour' },
      { name: 'Water', percent: 10, kind: 'water' },
      { name: 'Milk', percent: 40, kind: 'milk' },
      { name: 'Egg', percent: 10, kind: 'egg' },
      { name: 'Butter', percent: 10, kind: 'butter', salted },
    ],
  });

  it('milk 88.13 g, egg 76.15 g, unsalted butter 17.94 g water per 100 g (NDB 01077, 01123, 01145)', () => {
    const scaled = scaleFormula(formula(false), 1000);
    expect(scaled.hydrationPercent).toBeCloseTo(10, 10);
    expect(scaled.hydrationWithCarriedWaterPercent).toBeCloseTo(10 + 40 * 0.8813 + 10 * 0.7615 + 10 * 0.1794, 10);
  });

  it('salted butter carries 15.87 g water per 100 g (NDB 01001)', () => {
    const scaled = scaleFormula(formula(true), 1000);
    expect(scaled.hydrationWithCarriedWaterPercent).toBeCloseTo(10 + 40 * 0.8813 + 10 * 0.7615 + 10 * 0.1587, 10);
  });

  it('warns, without blocking, outside the BAKERpedia "Yeast Donuts" ranges (salt 1.5–2.2 %)', () => {
    const scaled = scaleFormula(
      { ingredients: [{ name: 'Flour', percent: 100, kind: 'flour' }, { name: 'Water', percent: 50, kind: 'water' }, { name: 'Salt', percent: 3, kind: 'salt' }] },
      1000,
    );
    expect(scaled.warnings.some((w) => w.startsWith('Salt is 3 %') && w.includes('1.5–2.2 %'))).toBe(true);
    expect(scaled.warnings.some((w) => w.startsWith('Water'))).toBe(false); // 50 % is inside 45–55 %
  });

  it('the default formula sits inside the BAKERpedia "Yeast Donuts" ranges', () => {
    expect(scaleFormula(DEFAULT_FORMULA, 3000).warnings).toEqual([]);
  });
});

describe('eggs and starter build', () => {
  it('whole large eggs of 50 g edible (USDA SR Legacy, NDB 01123): nearest, at least 1, mass change shown', () => {
    expect(wholeEggs(111.8, 4000)).toMatchObject({ count: 2, gramsPerEgg: 50 });
    expect(wholeEggs(111.8, 4000)!.massChangeGrams).toBeCloseTo(-11.8, 9);
    expect(wholeEggs(111.8, 4000)!.doughGramsWithWholeEggs).toBeCloseTo(3988.2, 9);
    expect(wholeEggs(75, 1000)!.count).toBe(2);
    expect(wholeEggs(20, 1000)!.count).toBe(1);
    expect(wholeEggs(0, 1000)).toBeNull();
  });

  it('feeds 1:2:2 (common practice, no source) so the starter needed is ready at its peak (4 ± 1 h, common practice)', () => {
    const scaled = scaleFormula(
      {
        ingredients: [
          { name: 'Flour', percent: 100, kind: 'flour' },
          { name: 'Water', percent: 75, kind: 'water' },
          { name: 'Starter', percent: 25, kind: 'starter' },
        ],
        starterFeed: { flourPerSeed: 2, extraPercent: 0 },
      },
      900,
    );
    const build = scaled.starter!.build;
    expect(build.ratio).toBe('1:2:2');
    expect(build.totalGrams).toBeCloseTo(128.57, 2); // "sourrr" README starter
    expect(build.seedGrams).toBeCloseTo(128.57 / 5, 2);
    expect(build.flourGrams).toBeCloseTo((2 * 128.57) / 5, 2);
    expect(build.waterGrams).toBeCloseTo((2 * 128.57) / 5, 2);
    expect(build.feedHoursBeforeMix).toBe(4);
    expect(build.peakWindowHours).toEqual({ from: 3, to: 5 });
  });
});

describe('bad formulas are refused with a clear error', () => {
  it('flour lines must add up to 100 %', () => {
    expect(() => scaleFormula({ ingredients: [{ name: 'Flour', percent: 90, kind: 'flour' }] }, 1000)).toThrow(/add up to 100 %/);
  });

  it("the water lines must hold the starter's water", () => {
    expect(() =>
      scaleFormula(
        { ingredients: [{ name: 'Flour', percent: 100, kind: 'flour' }, { name: 'Milk', percent: 60, kind: 'milk' }, { name: 'Starter', percent: 20, kind: 'starter' }] },
        1000,
      ),
    ).toThrow(ProductionInputError);
  });

  it("the milk lines must hold the roux's milk", () => {
    expect(() =>
      scaleFormula(
        { ingredients: [{ name: 'Flour', percent: 100, kind: 'flour' }, { name: 'Milk', percent: 20, kind: 'milk' }, { name: 'Roux flour', percent: 5, kind: 'roux-flour' }] },
        1000,
      ),
    ).toThrow(/roux needs 25 % milk/);
  });

  it('refuses a negative percentage and an unknown kind', () => {
    expect(() => scaleFormula({ ingredients: [{ name: 'Flour', percent: -1, kind: 'flour' }] }, 1000)).toThrow(ProductionInputError);
    expect(() => scaleFormula({ ingredients: [{ name: 'Flour', percent: 100, kind: 'grain' as never }] }, 1000)).toThrow(/kind/);
  });
});

describe('properties (fast-check)', () => {
  const formulaArb = fc
    .record({
      flours: fc.array(fc.double({ min: 1, max: 100, noNaN: true }), { minLength: 1, maxLength: 3 }),
      water: fc.double({ min: 0, max: 80, noNaN: true }),
      milk: fc.double({ min: 0, max: 80, noNaN: true }),
      egg: fc.double({ min: 0, max: 30, noNaN: true }),
      butter: fc.double({ min: 0, max: 30, noNaN: true }),
      salt: fc.double({ min: 0, max: 3, noNaN: true }),
      starterShare: fc.double({ min: 0, max: 1, noNaN: true }),
      rouxShare: fc.double({ min: 0, max: 1, noNaN: true }),
    })
    .map(({ flours, water, milk, egg, butter, salt, starterShare, rouxShare }): Formula => {
      const total = flours.reduce((s, f) => s + f, 0);
      const starter = water * 2 * starterShare; // at 100 %: starter water ≤ water lines
      const rouxFlour = Math.min((milk / 5) * rouxShare, 100 - starter / 2);
      return {
        ingredients: [
          ...flours.map((f, i) => ({ name: `Flour ${i}`, percent: (f / total) * 100, kind: 'flour' as const })),
          { name: 'Water', percent: water, kind: 'water' },
          { name: 'Milk', percent: milk, kind: 'milk' },
          { name: 'Egg', percent: egg, kind: 'egg' },
          { name: 'Butter', percent: butter, kind: 'butter' },
          { name: 'Salt', percent: salt, kind: 'salt' },
          { name: 'Starter', percent: starter, kind: 'starter' },
          { name: 'Roux flour', percent: rouxFlour, kind: 'roux-flour' },
        ],
      };
    });

  it('scaled grams always sum to the target, both as the overall formula and as the final dough', () => {
    fc.assert(
      fc.property(formulaArb, fc.double({ min: 1, max: 200_000, noNaN: true }), (formula, target) => {
        const scaled = scaleFormula(formula, target);
        const overall = sum(scaled.ingredients.filter((i) => !i.portion));
        expect(Math.abs(overall - target)).toBeLessThanOrEqual(target * 1e-9);
        expect(Math.abs(sum(scaled.finalDough) - target)).toBeLessThanOrEqual(target * 1e-9);
        expect(scaled.finalDough.every((r) => r.grams >= 0)).toBe(true);
      }),
    );
  });
});

describe('eggs in the shell (USDA AMS 56, weight classes: least net weight of a dozen)', () => {
  it('a large egg, 24 oz a dozen less 12 % shell (USDA SR Legacy 01123 refuse), is the 50 g edible egg of SR Legacy', () => {
    expect(EGG_CLASS_OZ_PER_DOZEN).toMatchObject({ medium: 21, large: 24, 'extra-large': 27 });
    expect((24 * 28.349523125) / 12).toBeCloseTo(56.7, 1);
    expect(eggEdibleGrams('large')).toBeCloseTo(49.9, 1);
    expect(Math.abs(eggEdibleGrams('large') - LARGE_EGG_GRAMS)).toBeLessThan(0.5);
    expect(eggEdibleGrams('medium')).toBeCloseTo((21 * 28.349523125 / 12) * 0.88, 9);
  });

  it('the shopping count follows the class: 300 g of egg is 6 large but 7 medium eggs', () => {
    expect(wholeEggs(300, 3000, eggEdibleGrams('large'))!.count).toBe(6);
    expect(wholeEggs(300, 3000, eggEdibleGrams('medium'))!.count).toBe(7);
    expect(wholeEggs(300, 3000, eggEdibleGrams('extra-large'))!.count).toBe(5);
  });
});
