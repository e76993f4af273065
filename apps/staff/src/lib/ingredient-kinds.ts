/** The kinds of formula line, in plain words, shared by the formula editor and the flavoured doughs. */
import type { ingredientKinds } from '@fryline/schemas';

export type IngredientKindValue = (typeof ingredientKinds)[number];

/** Plain names for the kinds of line; the last three are shares of other lines, not additions. */
export const kindLabels: Record<IngredientKindValue, string> = {
  flour: 'Flour',
  water: 'Water',
  milk: 'Milk',
  egg: 'Egg',
  butter: 'Butter',
  sugar: 'Sugar',
  salt: 'Salt',
  starter: 'Starter (share of flour and water)',
  'roux-flour': 'Roux flour (share of flour)',
  'roux-milk': 'Roux milk (share of milk)',
  flavouring: 'Flavouring',
  other: 'Other',
};

/** Baker's percentage of the flour lines (100 when the formula is right); a blank line counts 0. */
export function flourPercent(ingredients: ReadonlyArray<{ kind: string; percent: unknown }>): number {
  return ingredients.filter((line) => line.kind === 'flour').reduce((sum, line) => sum + (Number(line.percent) || 0), 0);
}
