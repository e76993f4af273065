/**
 * Costing. Prices are integer cents per kilogram. Sums are kept unrounded and
 * each reported figure is rounded once, at the end, to the nearest cent
 * (halves up): a box's cost is summed from unrounded piece costs, then
 * rounded, so it can differ by a cent from adding the rounded piece costs.
 *
 * A piece's cost = the dough it takes (its share of the scrap included) +
 * the frying fat it takes up + its share of the pot's oil (one fill spread
 * over `oilBakesPerFill` bake days and over the dough fried, by mass) + glaze.
 */
import { ProductionInputError, requirePositive, requireWholeNonNegative, requireNonNegative } from './errors.js';
import type { ScaledIngredient } from './formula.js';
import type { GlazeRecipe } from './glaze.js';
import { roundHalfUp } from './units.js';

export interface Prices {
  /** Integer cents per kg by ingredient name (formula lines and glaze parts). */
  centsPerKg: Record<string, number>;
  fryingOilCentsPerKg: number;
  /** Bake days one pot of oil lasts. Default 1. */
  oilBakesPerFill?: number;
}

export interface BoxOffer {
  id: string;
  name: string;
  rings: number;
  holes: number;
  /** Glaze on the box's pieces; null for plain. */
  glazeId: string | null;
  priceCents: number;
  packagingCents?: number;
}

export interface CostInput {
  /** Overall formula lines, scaled (portion lines are skipped). */
  ingredients: ScaledIngredient[];
  doughGrams: number;
  ringGrams: number;
  holeGrams: number;
  /** Dough cut into pieces ÷ dough mixed. */
  cutYield: number;
  fatAbsorbedGramsPerRing: number;
  oilFillGrams: number;
  /** Dough mass fried tonight (all pieces). */
  friedGrams: number;
  glazes: GlazeRecipe[];
  prices: Prices;
  boxes: BoxOffer[];
}

export interface PieceCost {
  glazeId: string | null;
  ringCents: number;
  holeCents: number;
}

export interface BoxCost {
  id: string;
  name: string;
  priceCents: number;
  costCents: number;
  marginCents: number;
  /** Margin ÷ price × 100 (unrounded); null for a free box. */
  marginPercent: number | null;
}

export interface CostPlan {
  doughCents: number;
  /** Plain pieces first (glazeId null), then one entry per glaze. */
  perPiece: PieceCost[];
  boxes: BoxCost[];
  /** Ingredient names without a price; counted as free. */
  missingPrices: string[];
  rounding: string;
}

export const COST_ROUNDING = 'Each figure is rounded once to the nearest cent (halves up) after unrounded sums.';

function priceLookup(prices: Prices, missing: Set<string>) {
  return (name: string): number => {
    const price = prices.centsPerKg[name];
    if (price === undefined) {
      missing.add(name);
      return 0;
    }
    return requireWholeNonNegative(`prices.centsPerKg["${name}"]`, price) / 1000; // cents per gram
  };
}

export function costBake(input: CostInput): CostPlan {
  requireNonNegative('doughGrams', input.doughGrams);
  requirePositive('ringGrams', input.ringGrams);
  requireNonNegative('holeGrams', input.holeGrams);
  const cutYield = requirePositive('cutYield', input.cutYield);
  const oilPerGram = requireWholeNonNegative('prices.fryingOilCentsPerKg', input.prices.fryingOilCentsPerKg) / 1000;
  const bakesPerFill = requirePositive('prices.oilBakesPerFill', input.prices.oilBakesPerFill ?? 1);
  const missing = new Set<string>();
  const price = priceLookup(input.prices, missing);

  const doughCents = input.ingredients.filter((i) => !i.portion).reduce((s, i) => s + i.grams * price(i.name), 0);
  const doughPerGram = input.doughGrams > 0 ? doughCents / input.doughGrams : 0;
  const fillPerFriedGram = input.friedGrams > 0 ? (input.oilFillGrams * oilPerGram) / bakesPerFill / input.friedGrams : 0;
  const pieceCents = (grams: number) =>
    (grams / cutYield) * doughPerGram
    + (input.fatAbsorbedGramsPerRing * grams / input.ringGrams) * oilPerGram
    + grams * fillPerFriedGram;
  const plain = { ring: pieceCents(input.ringGrams), hole: pieceCents(input.holeGrams) };

  const glazeCost = new Map<string, { ring: number; hole: number }>();
  input.glazes.forEach((g) => {
    const totalParts = g.parts.reduce((s, p) => s + p.parts, 0);
    const perGram = totalParts > 0 ? g.parts.reduce((s, p) => s + p.parts * price(p.name), 0) / totalParts : 0;
    const factor = 1 + (g.extraPercent ?? 0) / 100;
    glazeCost.set(g.id, { ring: g.gramsPerRing * factor * perGram, hole: g.gramsPerHole * factor * perGram });
  });
  const unrounded = (glazeId: string | null, field: string) => {
    if (glazeId === null) return plain;
    const glaze = glazeCost.get(glazeId);
    if (!glaze) throw new ProductionInputError(field, `unknown glaze "${glazeId}"`);
    return { ring: plain.ring + glaze.ring, hole: plain.hole + glaze.hole };
  };

  const perPiece: PieceCost[] = [null, ...input.glazes.map((g) => g.id)].map((glazeId) => {
    const c = unrounded(glazeId, 'glazes');
    return { glazeId, ringCents: roundHalfUp(c.ring), holeCents: roundHalfUp(c.hole) };
  });
  const boxes = input.boxes.map((box, i): BoxCost => {
    const field = `boxes[${i}]`;
    const rings = requireWholeNonNegative(`${field}.rings`, box.rings);
    const holes = requireWholeNonNegative(`${field}.holes`, box.holes);
    const priceCents = requireWholeNonNegative(`${field}.priceCents`, box.priceCents);
    const packaging = requireWholeNonNegative(`${field}.packagingCents`, box.packagingCents ?? 0);
    const c = unrounded(box.glazeId, `${field}.glazeId`);
    const costCents = roundHalfUp(rings * c.ring + holes * c.hole + packaging);
    const marginCents = priceCents - costCents;
    return { id: box.id, name: box.name, priceCents, costCents, marginCents, marginPercent: priceCents > 0 ? (marginCents / priceCents) * 100 : null };
  });
  return { doughCents: roundHalfUp(doughCents), perPiece, boxes, missingPrices: [...missing].sort(), rounding: COST_ROUNDING };
}
