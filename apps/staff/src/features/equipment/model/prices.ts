/**
 * Ingredient prices as the owner types them (dollars a kilogram, or a pound
 * for someone reading ounces) and as they are stored (whole cents a
 * kilogram). The typed amount is read by the shared money rule, so a price
 * is accepted here exactly when it is on every other screen; the change of
 * unit is done on integers (a pound is exactly 453.59237 g) and rounded half up.
 */
import { GRAMS_PER_POUND } from '@fryline/production';
import { centsToInput, parseCents, roundHalfUp, type FormulaInput, type ingredientKinds } from '@fryline/schemas';
import type { MassUnit } from '../../../lib/units';

export type PriceUnit = 'kg' | 'lb';

/** Prices follow the weight switch: per kg beside grams, per lb beside ounces. */
export function priceUnitFor(mass: MassUnit): PriceUnit {
  return mass === 'oz' ? 'lb' : 'kg';
}

/** The highest price the settings accept, in cents a kilogram. */
export const MAX_CENTS_PER_KG = 1_000_000;

/** A plain decimal constant ("453.59237", not "1e-7") as an exact fraction of integers. */
function exactConstant(value: number): { num: number; den: number } {
  const [whole = '0', decimals = ''] = String(value).split('.');
  return { num: Number(`${whole}${decimals}`), den: 10 ** decimals.length };
}

/** Grams in one unit the price is typed for, as num ÷ den. */
const gramsPer: Record<PriceUnit, { num: number; den: number }> = {
  kg: { num: 1000, den: 1 },
  lb: exactConstant(GRAMS_PER_POUND),
};

/**
 * A price typed in dollars a kg (or a lb) as whole cents a kilogram,
 * rounded half up to the cent. NaN when the text is not an amount: the form
 * holds the price as a number, and `priceProblem` words the NaN.
 */
export function centsPerKgFromText(text: string, unit: PriceUnit): number {
  const cents = parseCents(text);
  if (cents === null) return Number.NaN;
  const grams = gramsPer[unit];
  // ¢/unit × 1000 g/kg ÷ (grams/unit)
  return roundHalfUp(cents * 1000 * grams.den, grams.num);
}

/** Stored cents a kilogram as the dollars to show in the input: "4.41". Blank for no price. */
export function priceText(centsPerKg: number | undefined, unit: PriceUnit): string {
  if (centsPerKg === undefined || !Number.isFinite(centsPerKg) || centsPerKg < 0) return '';
  const grams = gramsPer[unit];
  // Stored prices are whole cents; anything else is rounded first.
  return centsToInput(roundHalfUp(roundHalfUp(centsPerKg) * grams.num, grams.den * 1000));
}

/** What is wrong with a price as the form holds it, in the owner's words; undefined when it is fine or not set. */
export function priceProblem(centsPerKg: number | undefined): string | undefined {
  if (centsPerKg === undefined) return undefined;
  if (!Number.isFinite(centsPerKg)) return 'Type dollars and cents, like 4.50';
  if (centsPerKg > MAX_CENTS_PER_KG) return 'That price is too large';
  return undefined;
}

/** Formula lines that are portions of other lines; their flour, milk and water are priced there. */
const portionKinds: ReadonlySet<(typeof ingredientKinds)[number]> = new Set(['starter', 'roux-flour', 'roux-milk']);

export interface PricedName {
  /** As the cost looks it up: exact, trimmed. */
  name: string;
  /** "Dough" and the glazes that use it. */
  usedIn: string[];
}

interface GlazeLike {
  name: string;
  parts: ReadonlyArray<{ name: string }>;
}

/**
 * Every name the production sheet's cost looks a price up for: the formula's
 * own lines (not the portion lines) and each glaze's parts, in that order,
 * each once.
 */
export function namesToPrice(ingredients: FormulaInput['ingredients'] | undefined, glazes: readonly GlazeLike[]): PricedName[] {
  const byName = new Map<string, PricedName>();
  const use = (raw: string, where: string) => {
    const name = raw.trim();
    if (name === '') return;
    const entry = byName.get(name) ?? { name, usedIn: [] };
    if (!entry.usedIn.includes(where)) entry.usedIn.push(where);
    byName.set(name, entry);
  };
  ingredients?.filter((line) => !portionKinds.has(line.kind)).forEach((line) => use(line.name, 'Dough'));
  glazes.forEach((glaze) => glaze.parts.forEach((part) => use(part.name, glaze.name.trim() || 'New glaze')));
  return [...byName.values()];
}
