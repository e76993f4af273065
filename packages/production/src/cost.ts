/**
 * Costing. Prices are integer cents per kilogram. Sums are kept unrounded and
 * each reported figure is rounded once, at the end, to the nearest cent
 * (halves up): a box's cost is summed from unrounded piece costs, then
 * rounded, so it can differ by a cent from adding the rounded piece costs.
 *
 * A piece's cost = the dough it takes (its share of the scrap included) +
 * the frying fat it takes up + its share of the pot's oil (one fill spread
 * over `oilBakesPerFill` bake days and over a full day's dough, by mass) + glaze.
 * Nothing in it depends on how many pieces are ordered tonight.
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
  /** Dough the `ingredients` make (any amount: prices per gram follow from it). */
  doughGrams: number;
  /** Dough mixed tonight, for `doughCents`; default `doughGrams`. */
  mixedDoughGrams?: number;
  ringGrams: number;
  holeGrams: number;
  /** Dough cut into pieces ÷ dough mixed. */
  cutYield: number;
  fatAbsorbedGramsPerRing: number;
  oilFillGrams: number;
  /** Dough mass the pot's fill is spread over on one bake day (a full day's, so a piece's cost does not depend on tonight's count). */
  friedGrams: number;
  glazes: GlazeRecipe[];
  prices: Prices;
  boxes: BoxOffer[];
  /**
   * Flavoured doughs, each as the lines of some amount of it (`doughGrams`):
   * the base dough's lines with its add-ins, or its own formula's. A piece of
   * that flavour costs its own dough; fat, oil and glaze are as for any piece.
   */
  doughs?: Array<{
    dough: string;
    name: string;
    ingredients: Array<Pick<ScaledIngredient, 'name' | 'grams' | 'portion'>>;
    doughGrams: number;
    /** Default true: its unpriced lines join `missingPrices` (false for a dough not made tonight; its own list still says). */
    listMissing?: boolean;
  }>;
}

export interface PieceCost {
  glazeId: string | null;
  ringCents: number;
  holeCents: number;
}

/** A flavoured dough's pieces: plain first (glazeId null), then one entry per glaze, as `perPiece`. */
export interface DoughPieceCost {
  dough: string;
  name: string;
  perPiece: PieceCost[];
  /** Its lines without a price (counted as free). */
  missingPrices: string[];
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
  /** The same for each flavoured dough (base dough with add-ins, or its own formula). */
  perDough: DoughPieceCost[];
  boxes: BoxCost[];
  /** Ingredient names without a price; counted as free. */
  missingPrices: string[];
  rounding: string;
}

export const COST_ROUNDING = 'Each figure is rounded once to the nearest cent (halves up) after unrounded sums.';

function priceLookup(prices: Prices, missing: Set<string>) {
  return (name: string, missingHere: Set<string> = missing): number => {
    const price = prices.centsPerKg[name];
    if (price === undefined) {
      missingHere.add(name);
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

  const centsOf = (lines: Array<Pick<ScaledIngredient, 'name' | 'grams' | 'portion'>>, missingHere = missing) =>
    lines.filter((i) => !i.portion).reduce((s, i) => s + i.grams * price(i.name, missingHere), 0);
  const doughCents = centsOf(input.ingredients);
  const doughPerGram = input.doughGrams > 0 ? doughCents / input.doughGrams : 0;
  const fillPerFriedGram = input.friedGrams > 0 ? (input.oilFillGrams * oilPerGram) / bakesPerFill / input.friedGrams : 0;
  const pieceCents = (grams: number, perGramOfDough: number) =>
    (grams / cutYield) * perGramOfDough
    + (input.fatAbsorbedGramsPerRing * grams / input.ringGrams) * oilPerGram
    + grams * fillPerFriedGram;
  const plainOf = (perGramOfDough: number) => ({ ring: pieceCents(input.ringGrams, perGramOfDough), hole: pieceCents(input.holeGrams, perGramOfDough) });
  const plain = plainOf(doughPerGram);

  const glazeCost = new Map<string, { ring: number; hole: number }>();
  input.glazes.forEach((g) => {
    const totalParts = g.parts.reduce((s, p) => s + p.parts, 0);
    const perGram = totalParts > 0 ? g.parts.reduce((s, p) => s + p.parts * price(p.name), 0) / totalParts : 0;
    const factor = 1 + (g.extraPercent ?? 0) / 100;
    glazeCost.set(g.id, { ring: g.gramsPerRing * factor * perGram, hole: g.gramsPerHole * factor * perGram });
  });
  const glazedOf = (base: { ring: number; hole: number }) => (glazeId: string | null, field: string) => {
    if (glazeId === null) return base;
    const glaze = glazeCost.get(glazeId);
    if (!glaze) throw new ProductionInputError(field, `unknown glaze "${glazeId}"`);
    return { ring: base.ring + glaze.ring, hole: base.hole + glaze.hole };
  };
  const unrounded = glazedOf(plain);
  const perPieceOf = (costOf: typeof unrounded): PieceCost[] => [null, ...input.glazes.map((g) => g.id)].map((glazeId) => {
    const c = costOf(glazeId, 'glazes');
    return { glazeId, ringCents: roundHalfUp(c.ring), holeCents: roundHalfUp(c.hole) };
  });
  const perPiece = perPieceOf(unrounded);
  const perDough: DoughPieceCost[] = (input.doughs ?? []).map((d, i) => {
    const grams = requirePositive(`doughs[${i}].doughGrams`, d.doughGrams);
    const missingHere = new Set<string>();
    const perPieceHere = perPieceOf(glazedOf(plainOf(centsOf(d.ingredients, missingHere) / grams)));
    if (d.listMissing !== false) missingHere.forEach((name) => missing.add(name));
    return { dough: d.dough, name: d.name, perPiece: perPieceHere, missingPrices: [...missingHere].sort() };
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
  const mixed = input.mixedDoughGrams !== undefined ? requireNonNegative('mixedDoughGrams', input.mixedDoughGrams) : input.doughGrams;
  return { doughCents: roundHalfUp(doughPerGram * mixed), perPiece, perDough, boxes, missingPrices: [...missing].sort(), rounding: COST_ROUNDING };
}
