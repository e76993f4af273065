import { describe, expect, it } from 'vitest';
import { get } from 'react-hook-form';
import { z } from 'zod';
import { DEFAULT_PLAN_SETTINGS, glazeAmounts, ProductionInputError, type GlazeRecipe } from '@fryline/production';
import { productionSettingsSchema } from '@fryline/schemas';
import { ApiError } from '@fryline/ui/api-client';
import { tempFromUnit } from '../../../lib/units';
import { storedSettings } from './test-settings';
import {
  dottedPath,
  formFieldNames,
  placeServerErrors,
  settingsFieldNames,
  settingsGroups,
  toSettingsValues,
} from './settings-fields';

describe('the equipment form', () => {
  it('holds exactly what the settings schema accepts: no save date, nothing lost', () => {
    const values = toSettingsValues(storedSettings());
    expect(values).not.toHaveProperty('updatedAt');
    expect(productionSettingsSchema.safeParse(values).success).toBe(true);
    expect(values.glazes).toHaveLength(DEFAULT_PLAN_SETTINGS.glazes.length);
  });

  it('has an input for every number it names, and names each only once', () => {
    const values = toSettingsValues(storedSettings());
    for (const name of settingsFieldNames) {
      const optional = settingsGroups.flatMap((g) => g.fields).find((f) => f.name === name)?.optional;
      if (!optional) expect(typeof get(values, name), name).toBe('number');
    }
    expect(new Set(settingsFieldNames).size).toBe(settingsFieldNames.length);
  });

  it('takes oil temperatures typed in °F within the usual 350–375 °F frying range (doughnut equipment makers’ tips; °C = (°F − 32) / 1.8, NIST SP 811)', () => {
    const values = toSettingsValues(storedSettings());
    values.equipment.oil.startC = tempFromUnit(375, 'F');
    values.equipment.oil.floorC = tempFromUnit(350, 'F');
    const parsed = productionSettingsSchema.parse(values);
    expect(parsed.equipment.oil.startC).toBeCloseTo(190.56, 2);
    expect(parsed.equipment.oil.floorC).toBeCloseTo(176.67, 2);
  });

  it('refuses a lowest oil temperature above the start temperature, on the lowest-temperature field', () => {
    const values = toSettingsValues(storedSettings());
    values.equipment.oil.floorC = tempFromUnit(380, 'F');
    const result = productionSettingsSchema.safeParse(values);
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path.join('.')).toBe('equipment.oil.floorC');
    expect(settingsFieldNames).toContain('equipment.oil.floorC');
  });
});

describe('errors from the API beside the inputs they name', () => {
  const withPrices = () => {
    const values = toSettingsValues(storedSettings());
    values.prices.centsPerKg = { Sugar: 160, 'Icing sugar': 320, 'No. 2 flour': 190 };
    return values;
  };
  const place = (fields: Record<string, string>, values = withPrices()) => {
    const placed: Record<string, string> = {};
    const left = placeServerErrors(
      new ApiError({ status: 400, code: 'invalid', message: 'Invalid input', details: { fields } }),
      values,
      (name, error) => {
        placed[name] = error.message;
      },
    );
    return { placed, left };
  };

  it('reads a path written with brackets as zod prints it (zod’s toDotPath) the same as one joined with dots', () => {
    const paths: PropertyKey[][] = [
      ['glazes', 1, 'parts', 0, 'parts'],
      ['prices', 'centsPerKg', 'Icing sugar'],
      ['prices', 'centsPerKg', 'Sugar'],
      ['prices', 'centsPerKg', 'Baker\'s "best"'],
    ];
    for (const path of paths) expect(dottedPath(z.core.toDotPath(path))).toBe(path.join('.'));
  });

  it('puts every error the settings schema finds in glazes and prices on a field of the form', () => {
    const values = withPrices();
    values.glazes[1]!.parts[0]!.parts = 0;
    values.glazes[0]!.gramsPerHole = -1;
    values.prices.centsPerKg.Sugar = 1.5;
    values.prices.fryingOilCentsPerKg = -3;
    const issues = productionSettingsSchema.safeParse(values).error?.issues ?? [];
    expect(issues).toHaveLength(4);
    const { placed, left } = place(Object.fromEntries(issues.map((i) => [i.path.join('.'), i.message])), values);
    expect(left).toEqual([]);
    expect(Object.keys(placed).sort()).toEqual([
      'glazes.0.gramsPerHole',
      'glazes.1.parts.0.parts',
      'prices.centsPerKg.Sugar',
      'prices.fryingOilCentsPerKg',
    ]);
  });

  it('takes the bake maths’ own field names too (its error for a glaze part with negative parts)', () => {
    const glazes = structuredClone(DEFAULT_PLAN_SETTINGS.glazes) as GlazeRecipe[];
    glazes[1]!.parts[0]!.parts = -1;
    let field = '';
    try {
      glazeAmounts(glazes, []);
    } catch (error) {
      field = error instanceof ProductionInputError ? error.field : '';
    }
    expect(field).toBe('glazes[1].parts[0].parts');
    expect(place({ [field]: 'must not be negative' }).placed).toEqual({ 'glazes.1.parts.0.parts': 'must not be negative' });
  });

  it('says above the form what no input can hold: unknown fields, and prices whose names a field path would split', () => {
    const { placed, left } = place({ 'prices.centsPerKg.No. 2 flour': 'Too large', 'glazes.7.name': 'Name the glaze', _: 'Odd' });
    expect(placed).toEqual({});
    expect(left.sort()).toEqual(['Name the glaze', 'Odd', 'Too large']);
  });
});

describe('the glazes and prices in the form', () => {
  it('compare equal to what was loaded until something is changed (optional keys present, values untouched)', () => {
    const loaded = storedSettings();
    const values = toSettingsValues(loaded);
    expect(values.glazes).toEqual(loaded.glazes);
    expect(Object.keys(values.glazes[1]!)).toEqual(expect.arrayContaining(['extraPercent', 'allergens']));
    expect(Object.keys(values.prices)).toContain('oilBakesPerFill');
    expect(formFieldNames(values)).toEqual(expect.arrayContaining(['glazes.1.parts.1.name', 'glazes.0.allergens', 'prices.oilBakesPerFill']));
  });
});
