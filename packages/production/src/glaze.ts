/**
 * Glaze amounts: grams per glazed piece × pieces, plus an allowance for what
 * stays in the bowl, split by the recipe's ratio (parts by weight).
 */
import { ProductionInputError, requireNonNegative, requirePositive, requireWholeNonNegative } from './errors.js';

export interface GlazePart {
  name: string;
  /** Parts by weight, e.g. icing sugar 4, milk 1. */
  parts: number;
}

export interface GlazeRecipe {
  id: string;
  name: string;
  gramsPerRing: number;
  gramsPerHole: number;
  parts: GlazePart[];
  /** Extra made for the bowl, percent of what the pieces take. Default 0. */
  extraPercent?: number;
  allergens?: string[];
}

export interface GlazeNeed {
  glazeId: string;
  rings: number;
  holes: number;
}

export interface GlazeAmount {
  glazeId: string;
  name: string;
  rings: number;
  holes: number;
  /** What the pieces take, without the bowl allowance. */
  onPiecesGrams: number;
  grams: number;
  parts: Array<{ name: string; grams: number }>;
}

function validateRecipe(recipe: GlazeRecipe, field: string): void {
  if (typeof recipe.id !== 'string' || recipe.id === '') throw new ProductionInputError(`${field}.id`, 'needs an id');
  requireNonNegative(`${field}.gramsPerRing`, recipe.gramsPerRing);
  requireNonNegative(`${field}.gramsPerHole`, recipe.gramsPerHole);
  requireNonNegative(`${field}.extraPercent`, recipe.extraPercent ?? 0);
  if (!Array.isArray(recipe.parts) || recipe.parts.length === 0) {
    throw new ProductionInputError(`${field}.parts`, 'needs at least one part');
  }
  recipe.parts.forEach((p, i) => requireNonNegative(`${field}.parts[${i}].parts`, p.parts));
  requirePositive(`${field}.parts (total)`, recipe.parts.reduce((s, p) => s + p.parts, 0));
}

/** Glaze to make for each recipe that has pieces, in the order the recipes are given. */
export function glazeAmounts(recipes: GlazeRecipe[], needs: GlazeNeed[]): GlazeAmount[] {
  recipes.forEach((r, i) => validateRecipe(r, `glazes[${i}]`));
  const byId = new Map(recipes.map((r) => [r.id, r]));
  const totals = new Map<string, { rings: number; holes: number }>();
  needs.forEach((need, i) => {
    if (!byId.has(need.glazeId)) throw new ProductionInputError(`glazeNeeds[${i}].glazeId`, `unknown glaze "${need.glazeId}"`);
    const t = totals.get(need.glazeId) ?? { rings: 0, holes: 0 };
    t.rings += requireWholeNonNegative(`glazeNeeds[${i}].rings`, need.rings);
    t.holes += requireWholeNonNegative(`glazeNeeds[${i}].holes`, need.holes);
    totals.set(need.glazeId, t);
  });
  const out: GlazeAmount[] = [];
  for (const recipe of recipes) {
    const t = totals.get(recipe.id);
    if (!t || t.rings + t.holes === 0) continue;
    const onPiecesGrams = t.rings * recipe.gramsPerRing + t.holes * recipe.gramsPerHole;
    const grams = onPiecesGrams * (1 + (recipe.extraPercent ?? 0) / 100);
    const totalParts = recipe.parts.reduce((s, p) => s + p.parts, 0);
    out.push({
      glazeId: recipe.id,
      name: recipe.name,
      rings: t.rings,
      holes: t.holes,
      onPiecesGrams,
      grams,
      parts: recipe.parts.map((p) => ({ name: p.name, grams: (grams * p.parts) / totalParts })),
    });
  }
  return out;
}
