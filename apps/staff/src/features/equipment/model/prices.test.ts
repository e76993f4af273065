import { describe, expect, it } from 'vitest';
import { DEFAULT_DOUGH_ALLERGENS, DEFAULT_PLAN_SETTINGS, planBake, type Formula, type GlazeRecipe } from '@fryline/production';
import type { FormulaInput } from '@fryline/schemas';
import { centsPerKgFromText, namesToPrice, priceProblem, priceText } from './prices';

// 1 lb = 0.45359237 kg exactly (NIST SP 811 / Handbook 44 App. C), so 1 kg = 2.2046226218… lb.
describe('a price typed a pound, stored a kilogram', () => {
  it('$1.00 a lb is 220.46… ¢ a kg, stored as 220 ¢ (NIST SP 811: 1 lb = 0.45359237 kg)', () => {
    expect(centsPerKgFromText('1.00', 'lb')).toBe(220);
  });

  it('$2.00 a lb is 440.92… ¢ a kg → 441 ¢, which reads back as $2.00 a lb (441 × 0.45359237 = 200.03 ¢, NIST SP 811)', () => {
    expect(centsPerKgFromText('2.00', 'lb')).toBe(441);
    expect(priceText(441, 'lb')).toBe('2.00');
  });

  it('$10.00 a kg reads as $4.54 a lb (1000 ¢ × 0.45359237 = 453.59 ¢, NIST SP 811)', () => {
    expect(priceText(1000, 'lb')).toBe('4.54');
  });

  it('every whole-cent price a pound from $0.00 to $25.00 comes back as typed (derived from NIST SP 811: the half-cent a kg stored is under half a cent a pound)', () => {
    for (let cents = 0; cents <= 2500; cents += 1) {
      const typed = `${Math.floor(cents / 100)}.${String(cents % 100).padStart(2, '0')}`;
      expect(priceText(centsPerKgFromText(typed, 'lb'), 'lb'), typed).toBe(typed);
    }
  });
});

// Rounding half up to the cent is common practice, no source; the cases are worked by hand.
describe('a price typed a kilogram', () => {
  it('keeps whole cents as typed, with or without the dollar sign', () => {
    expect(centsPerKgFromText('4.50', 'kg')).toBe(450);
    expect(centsPerKgFromText('$4.5', 'kg')).toBe(450);
    expect(centsPerKgFromText(' 3 ', 'kg')).toBe(300);
    expect(centsPerKgFromText('.25', 'kg')).toBe(25);
    expect(centsPerKgFromText('0', 'kg')).toBe(0);
    expect(priceText(450, 'kg')).toBe('4.50');
    expect(priceText(5, 'kg')).toBe('0.05');
  });

  it('takes a price by the shared money rule: at most two decimals, thousands commas allowed (ISO 4217: USD has 2 decimal places)', () => {
    expect(centsPerKgFromText('1,234.50', 'kg')).toBe(123450);
    expect(centsPerKgFromText('1.005', 'kg')).toBeNaN();
  });

  it('refuses what is not a price, and says so in dollars', () => {
    for (const text of ['', '.', 'abc', '-1', '1,50', '4.50 a kg', '1e3']) {
      expect(centsPerKgFromText(text, 'kg'), text).toBeNaN();
    }
    expect(priceProblem(Number.NaN)).toMatch(/dollars/);
    expect(priceProblem(undefined)).toBeUndefined();
    expect(priceProblem(1_000_001)).toMatch(/too large/); // above the settings schema's 1,000,000 ¢ a kg
    expect(priceProblem(1_000_000)).toBeUndefined();
    expect(priceText(undefined, 'kg')).toBe('');
    expect(priceText(Number.NaN, 'lb')).toBe('');
  });
});

describe('the names that need a price', () => {
  const sheetLeavesOut = (formula: Formula, glazes: GlazeRecipe[]) =>
    planBake({
      ...DEFAULT_PLAN_SETTINGS,
      formula,
      glazes,
      orders: [{ menuItemId: 'plain', name: 'Plain ring', kind: 'ring', glaze: null, quantity: 12 }],
      roomTempC: 22,
      firstPickupStartsAt: '2030-06-01T15:00:00Z',
      timeZone: 'UTC',
      now: '2030-05-01T00:00:00Z',
      prices: { centsPerKg: {}, fryingOilCentsPerKg: 300 },
      boxes: [],
      allergens: { dough: DEFAULT_DOUGH_ALLERGENS, byMenuItem: {} },
    }).cost.missingPrices;

  it('are exactly the ones the production sheet’s cost looks up (its own list of missing prices, with none set)', () => {
    const formula = DEFAULT_PLAN_SETTINGS.formula;
    const names = namesToPrice(formula.ingredients as FormulaInput['ingredients'], DEFAULT_PLAN_SETTINGS.glazes);
    expect(names.map((n) => n.name).sort()).toEqual(sheetLeavesOut(formula, DEFAULT_PLAN_SETTINGS.glazes));
    expect(names.some((n) => /starter|roux/i.test(n.name))).toBe(false);
  });

  it('follow a glaze part added in the form, and say where each is used', () => {
    const glazes: GlazeRecipe[] = [
      ...DEFAULT_PLAN_SETTINGS.glazes,
      { id: 'toasted-maple', name: 'Toasted maple', gramsPerRing: 12, gramsPerHole: 4, parts: [{ name: 'Maple syrup', parts: 3 }, { name: 'Icing sugar', parts: 7 }] },
    ];
    const formula = DEFAULT_PLAN_SETTINGS.formula;
    const names = namesToPrice(formula.ingredients as FormulaInput['ingredients'], glazes);
    expect(names.map((n) => n.name).sort()).toEqual(sheetLeavesOut(formula, glazes));
    expect(names.find((n) => n.name === 'Maple syrup')?.usedIn).toEqual(['Toasted maple']);
    expect(names.find((n) => n.name === 'Icing sugar')?.usedIn).toEqual(['Vanilla milk glaze', 'Toasted maple']);
    expect(names.find((n) => n.name === 'Whole milk')?.usedIn).toEqual(['Dough', 'Vanilla milk glaze']);
  });

  it('are trimmed as the settings store them, and a part not named yet asks for nothing', () => {
    const glazes = [{ name: ' ', parts: [{ name: ' Maple syrup ' }, { name: '' }] }];
    expect(namesToPrice(undefined, glazes)).toEqual([{ name: 'Maple syrup', usedIn: ['New glaze'] }]);
  });

  it('while the formula is still loading, are the glazes’ parts', () => {
    expect(namesToPrice(undefined, DEFAULT_PLAN_SETTINGS.glazes).map((n) => n.name)).toEqual([
      'Icing sugar',
      'Whole milk',
      'Vanilla extract',
      'Sugar',
      'Ground cinnamon',
    ]);
  });
});
