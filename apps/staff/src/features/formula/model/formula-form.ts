/**
 * The formula editor's form: what it holds, and the live grams for a sample
 * batch, worked out with the same scaling the production sheet uses.
 */
import type { z } from 'zod';
import type { Path } from 'react-hook-form';
import { ProductionInputError, scaleFormula, type ScaledFormula } from '@fryline/production';
import type { FormulaInput, saveFormulaSchema } from '@fryline/schemas';
import { flourPercent } from '../../../lib/ingredient-kinds';

export type FormulaFormValues = z.input<typeof saveFormulaSchema>;
export type FormulaFormIngredient = FormulaFormValues['formula']['ingredients'][number];

export { kindLabels, type IngredientKindValue } from '../../../lib/ingredient-kinds';

export const SAMPLE_DOUGH_GRAMS = 2000;

export function toFormValues(formula: FormulaInput): FormulaFormValues {
  return { formula: structuredClone(formula), note: '' };
}

export function blankIngredient(): FormulaFormIngredient {
  return { name: '', percent: 0, kind: 'other' };
}

/** Every field a server error may name, for putting its message back on the form. */
export function formulaFieldNames(lineCount: number): Path<FormulaFormValues>[] {
  const names: Path<FormulaFormValues>[] = ['note', 'formula.ingredients', 'formula.starterHydrationPercent', 'formula.rouxLiquidPerFlour'];
  for (let i = 0; i < lineCount; i++) {
    names.push(`formula.ingredients.${i}.name`, `formula.ingredients.${i}.kind`, `formula.ingredients.${i}.percent`);
  }
  return names;
}

export function flourTotal(ingredients: readonly FormulaFormIngredient[]): number {
  return flourPercent(ingredients);
}

export type Preview = { ok: true; scaled: ScaledFormula } | { ok: false; problem: string };

/**
 * The formula scaled to a sample dough mass, or why it can't be: a blank
 * number, or a formula the scaling refuses (flour not adding up to 100 %,
 * a starter needing more water than the water lines hold…).
 */
export function previewFormula(formula: FormulaFormValues['formula'] | undefined, doughGrams: number): Preview {
  if (!formula?.ingredients?.length) return { ok: false, problem: 'Add at least one ingredient.' };
  const numbers = [
    doughGrams,
    ...formula.ingredients.map((line) => line.percent),
    formula.starterHydrationPercent ?? 100,
    formula.rouxLiquidPerFlour ?? 5,
  ];
  if (numbers.some((n) => typeof n !== 'number' || !Number.isFinite(n))) {
    return { ok: false, problem: 'Fill in every number to see the grams.' };
  }
  if (doughGrams <= 0) return { ok: false, problem: 'Give the sample dough a weight above 0 g.' };
  try {
    return { ok: true, scaled: scaleFormula(formula, doughGrams) };
  } catch (error) {
    if (error instanceof ProductionInputError) return { ok: false, problem: readableProblem(error) };
    throw error;
  }
}

/** "formula.ingredients: the flour lines must add up…" → "The flour lines must add up…". */
function readableProblem(error: ProductionInputError): string {
  const text = error.message.startsWith(`${error.field}: `) ? error.message.slice(error.field.length + 2) : error.message;
  const sentence = text.charAt(0).toUpperCase() + text.slice(1);
  return /^formula\.ingredients$/.test(error.field) || !error.field.startsWith('formula.')
    ? sentence
    : `${fieldWords(error.field)}: ${text}`;
}

function fieldWords(field: string): string {
  const line = /^formula\.ingredients\[(\d+)\]\.(\w+)$/.exec(field);
  if (line) return `Line ${Number(line[1]) + 1} ${line[2]}`;
  if (field === 'formula.rouxLiquidPerFlour') return 'Roux milk per gram of flour';
  if (field === 'formula.starterHydrationPercent') return 'Starter hydration';
  return field;
}
