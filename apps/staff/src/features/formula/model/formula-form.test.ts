import { describe, expect, it } from 'vitest';
import { flourTotal, formulaFieldNames, previewFormula, type FormulaFormValues } from './formula-form';

const sourdough = (): FormulaFormValues['formula'] => ({
  ingredients: [
    { name: 'Flour', percent: 100, kind: 'flour' },
    { name: 'Water', percent: 75, kind: 'water' },
    { name: 'Starter', percent: 25, kind: 'starter' },
  ],
  starterHydrationPercent: 100,
});

describe('live grams for the sample dough', () => {
  it('matches the sourrr worked split: 900 g at 75 % with 25 % starter → 514.29 g flour, 128.57 g starter, 450 g flour and 321.4 g water added (R package "sourrr" README)', () => {
    const preview = previewFormula(sourdough(), 900);
    if (!preview.ok) throw new Error(preview.problem);
    const { scaled } = preview;
    expect(scaled.totalFlourGrams).toBeCloseTo(514.29, 2);
    expect(scaled.starter?.grams).toBeCloseTo(128.57, 2);
    expect(scaled.starter?.flourGrams).toBeCloseTo(64.29, 2);
    expect(scaled.starter?.waterGrams).toBeCloseTo(64.29, 2);
    const mixer = Object.fromEntries(scaled.finalDough.map((row) => [row.name, row.grams]));
    expect(mixer.Flour).toBeCloseTo(450, 2);
    expect(mixer.Water).toBeCloseTo(321.4, 1);
    // Line by line, in the order typed: 514.29 g flour, 385.71 g water (75 %), 128.57 g starter
    expect(scaled.ingredients.map((row) => Number(row.grams.toFixed(2)))).toEqual([514.29, 385.71, 128.57]);
  });

  it('counts the water that milk carries in the wider hydration (whole milk is 88.13 % water, USDA SR Legacy NDB 01077)', () => {
    const preview = previewFormula(
      {
        ingredients: [
          { name: 'Flour', percent: 100, kind: 'flour' },
          { name: 'Water', percent: 10, kind: 'water' },
          { name: 'Milk', percent: 40, kind: 'milk' },
        ],
      },
      1500,
    );
    if (!preview.ok) throw new Error(preview.problem);
    expect(preview.scaled.hydrationPercent).toBeCloseTo(10, 9);
    expect(preview.scaled.hydrationWithCarriedWaterPercent).toBeCloseTo(10 + 40 * 0.8813, 6);
  });

  it('flags a salt level outside the doughnut range (1.5–2.2 %, BAKERpedia "Yeast Donuts")', () => {
    const formula = sourdough();
    formula.ingredients.push({ name: 'Salt', percent: 3, kind: 'salt' });
    const preview = previewFormula(formula, 1000);
    expect(preview.ok && preview.scaled.warnings.some((w) => w.startsWith('Salt is 3 %'))).toBe(true);
  });

  it('says why there are no grams instead of showing wrong ones', () => {
    const blank = sourdough();
    blank.ingredients[1]!.percent = Number.NaN;
    expect(previewFormula(blank, 900)).toEqual({ ok: false, problem: 'Fill in every number to see the grams.' });

    const short = sourdough();
    short.ingredients[0]!.percent = 90;
    const shortPreview = previewFormula(short, 900);
    expect(shortPreview.ok).toBe(false);
    expect(!shortPreview.ok && shortPreview.problem).toBe('The flour lines must add up to 100 % (they add up to 90 %)');

    expect(previewFormula(sourdough(), 0)).toEqual({ ok: false, problem: 'Give the sample dough a weight above 0 g.' });
    expect(previewFormula({ ingredients: [] }, 900).ok).toBe(false);
  });

  it('adds up the flour lines only (all flours together are 100 %, Professional Baking, "Bakers\' percentages")', () => {
    expect(
      flourTotal([
        { name: 'Bread flour', percent: 80, kind: 'flour' },
        { name: 'Whole wheat', percent: 20, kind: 'flour' },
        { name: 'Roux flour', percent: 5, kind: 'roux-flour' },
        { name: 'Water', percent: 70, kind: 'water' },
      ]),
    ).toBe(100);
  });
});

describe('server field errors land on the right inputs', () => {
  it('names every line’s fields the way the API reports them', () => {
    const names = formulaFieldNames(2);
    expect(names).toContain('formula.ingredients.1.percent');
    expect(names).toContain('formula.ingredients');
    expect(names).not.toContain('formula.ingredients.2.percent');
  });
});
