import { describe, expect, it } from 'vitest';
import { DEFAULT_FORMULA, DEFAULT_PLAN_SETTINGS, planBake, ProductionInputError, type Formula } from '@fryline/production';
import { productionSettingsSchema, type FormulaInput } from '@fryline/schemas';
import { ApiError } from '@fryline/ui/api-client';
import { madeFrom, withAddIns, withOwnFormula } from './doughs';
import { placeServerErrors, toSettingsValues } from './settings-fields';
import { storedSettings } from './test-settings';

const savedVersion = () => structuredClone(DEFAULT_FORMULA) as FormulaInput;

describe('a flavoured dough of its own formula', () => {
  it('starts from a copy of a saved formula version, keeps its name and flavours, and drops the add-ins', () => {
    const values = toSettingsValues(storedSettings());
    const version = savedVersion();
    const lemon = values.dough!.variations[0]!;
    const own = withOwnFormula(lemon, version);
    expect(madeFrom(own)).toBe('own-formula');
    expect(own).toMatchObject({ id: 'lemon-zest', name: 'Lemon zest dough', flavours: ['Lemon zest'] });
    expect(own.addIns).toBeUndefined();
    expect(own.formula!.ingredients).toEqual(version.ingredients);
    own.formula!.ingredients[0]!.percent = 50;
    expect(version.ingredients[0]!.percent).toBe(DEFAULT_FORMULA.ingredients[0]!.percent);
    values.dough!.variations[0] = own;
    expect(productionSettingsSchema.safeParse(values).success).toBe(false); // flour at 50 %
    own.formula!.ingredients[0]!.percent = DEFAULT_FORMULA.ingredients[0]!.percent;
    expect(productionSettingsSchema.safeParse(values).success).toBe(true);
    const back = withAddIns(own);
    expect(madeFrom(back)).toBe('add-ins');
    expect(back.formula).toBeUndefined();
    expect(back.addIns).toEqual([{ name: '', gramsPerKg: 10 }]);
  });

  it('shows the contract\'s flour check beside the dough\'s lines', () => {
    const values = toSettingsValues(storedSettings());
    const own = withOwnFormula(values.dough!.variations[0]!, savedVersion());
    own.formula!.ingredients.find((l) => l.kind === 'flour')!.percent = 90;
    values.dough!.variations[0] = own;
    const issue = productionSettingsSchema.safeParse(values).error!.issues[0]!;
    expect(issue.path.join('.')).toBe('dough.variations.0.formula.ingredients');
    expect(issue.message).toBe('The flour lines must add up to 100 %');
  });

  it('puts the bake maths\' refusal of an unmixable formula (its own field name, doughs[i]…) beside the dough', () => {
    const values = toSettingsValues(storedSettings());
    const own = withOwnFormula(values.dough!.variations[0]!, savedVersion());
    // A roux-milk line with no roux flour: the contract lets it through, the maths does not.
    own.formula!.ingredients = own.formula!.ingredients.filter((l) => l.kind !== 'roux-flour' && l.kind !== 'roux-milk');
    own.formula!.ingredients.push({ name: 'Roux milk', percent: 10, kind: 'roux-milk' });
    values.dough!.variations[0] = own;
    expect(productionSettingsSchema.safeParse(values).success).toBe(true);
    let field = '';
    try {
      planBake({ ...DEFAULT_PLAN_SETTINGS, orders: [], roomTempC: 22, firstPickupStartsAt: '2030-06-01T15:00:00Z', timeZone: 'UTC', now: '2030-05-01T00:00:00Z', prices: { centsPerKg: {}, fryingOilCentsPerKg: 0 }, allergens: { dough: [] }, doughs: [{ id: own.id, name: own.name, formula: own.formula as Formula }] });
    } catch (error) {
      field = error instanceof ProductionInputError ? error.field : '';
    }
    expect(field).toBe('doughs[0].formula.ingredients');
    const placed: Record<string, string> = {};
    const left = placeServerErrors(new ApiError({ status: 400, code: 'invalid', message: 'Invalid input', details: { fields: { [field]: 'a roux-milk line needs a roux-flour line' } } }), values, (name, e) => {
      placed[name] = e.message;
    });
    expect(left).toEqual([]);
    expect(placed).toEqual({ 'dough.variations.0.formula.ingredients': 'a roux-milk line needs a roux-flour line' });
  });
});
