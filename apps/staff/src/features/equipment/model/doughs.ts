/**
 * A flavoured dough is made one of two ways: the base dough with add-ins
 * folded into its share, or a formula of its own (started from one of the
 * saved formula versions and edited here). Switching keeps the name and the
 * menu flavours; the other way's details are dropped, since the settings
 * take one or the other, never both.
 */
import type { Path } from 'react-hook-form';
import type { FormulaInput, ProductionSettingsInput } from '@fryline/schemas';

/** A field of the settings form (the same type settings-fields names SettingsPath; written out to keep imports one-way). */
type SettingsPath = Path<ProductionSettingsInput>;

export type DoughVariationValues = NonNullable<ProductionSettingsInput['dough']>['variations'][number];
export type DoughFormulaValues = NonNullable<DoughVariationValues['formula']>;
export type DoughMadeFrom = 'add-ins' | 'own-formula';

export function madeFrom(dough: DoughVariationValues | undefined): DoughMadeFrom {
  return dough?.formula ? 'own-formula' : 'add-ins';
}

/** The formula a saved version holds, as a flavoured dough keeps it (a copy: editing it leaves the version alone). */
export function doughFormulaFrom(formula: FormulaInput): DoughFormulaValues {
  const copy = structuredClone(formula);
  return {
    ingredients: copy.ingredients,
    starterHydrationPercent: copy.starterHydrationPercent,
    rouxLiquidPerFlour: copy.rouxLiquidPerFlour,
    ...(copy.starterFeed ? { starterFeed: copy.starterFeed } : {}),
  };
}

/** The dough made of its own formula, a copy of `formula`. */
export function withOwnFormula(dough: DoughVariationValues, formula: FormulaInput): DoughVariationValues {
  const { addIns: _addIns, addAt: _addAt, formula: _old, ...rest } = dough;
  return { ...rest, formula: doughFormulaFrom(formula) };
}

/** The dough made from the base dough, with one blank add-in to fill in when it has none. */
export function withAddIns(dough: DoughVariationValues): DoughVariationValues {
  const { formula: _formula, addIns, addAt, ...rest } = dough;
  return { ...rest, addIns: addIns && addIns.length > 0 ? addIns : [{ name: '', gramsPerKg: 10 }], addAt: addAt ?? 'after-mix' };
}

/** Every field of the flavoured doughs an error can be shown beside. */
export function doughFieldNames(values: ProductionSettingsInput): SettingsPath[] {
  return (values.dough?.variations ?? []).flatMap((dough, i): SettingsPath[] => {
    const base = `dough.variations.${i}` as const;
    const fields: SettingsPath[] = [`${base}.id`, `${base}.name`, `${base}.flavours`, `${base}.addIns`];
    (dough.addIns ?? []).forEach((_a, j) => fields.push(`${base}.addIns.${j}.name`, `${base}.addIns.${j}.gramsPerKg`));
    if (dough.formula) {
      fields.push(`${base}.formula.ingredients`, `${base}.formula.starterHydrationPercent`, `${base}.formula.rouxLiquidPerFlour`);
      dough.formula.ingredients.forEach((_l, j) => fields.push(`${base}.formula.ingredients.${j}.name`, `${base}.formula.ingredients.${j}.kind`, `${base}.formula.ingredients.${j}.percent`));
    }
    return fields;
  });
}

/** The bake maths calls the flavoured doughs `doughs[i]`; the form holds them at `dough.variations.i`. */
export function doughFormPath(dottedPath: string): string {
  return dottedPath.replace(/^doughs\.(\d+)(?=\.|$)/, 'dough.variations.$1');
}
