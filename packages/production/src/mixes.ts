/**
 * Dough variations and mixes.
 *
 * A flavour can name its dough. Either the base dough with add-ins folded
 * into a weighed share of it (grams per kg of base dough, at a stated step),
 * or a dough of its own formula. Each distinct formula is mixed in as many
 * equal mixes as the bowl needs; every mix is scaled on its own (so eggs are
 * whole per mix, and the starter and roux are built per mix). The shares for
 * the variations are taken from the mixes in order, so one flavour's dough
 * comes from as few mixes as possible.
 */
import { ProductionInputError, requireNonNegative, requirePositive } from './errors.js';
import { scaleFormula, wholeEggs, type EggCount, type Formula, type RouxPlan, type ScaledIngredient, type StarterPlan } from './formula.js';

export type AddInStep = 'after-mix' | 'at-shaping';

export interface DoughAddIn {
  name: string;
  /** Grams per kg of base dough in the share that gets it. */
  gramsPerKg: number;
}

export interface DoughVariation {
  /** Referred to by order lines' `dough`. */
  id: string;
  name: string;
  /** Base dough plus these, folded in by hand at `addAt`. */
  addIns?: DoughAddIn[];
  /** When the add-ins go in. Default after the mix, before bulk fermentation. */
  addAt?: AddInStep;
  /** A dough of its own formula instead of the base dough. */
  formula?: Formula;
  allergens?: string[];
}

export const ADD_IN_STEP_WORDS: Record<AddInStep, string> = {
  'after-mix': 'straight after mixing, before bulk fermentation',
  'at-shaping': 'when shaping, before the cold retard',
};

export interface MixPortion {
  /** Variation id; null for the plain base dough. */
  dough: string | null;
  name: string;
  /** Dough from this mix for this share, before add-ins. */
  baseGrams: number;
  addIns: Array<{ name: string; grams: number }>;
  addAt: AddInStep | null;
}

export interface MixPlan {
  /** 1, 2, … in mixing order. */
  mix: number;
  /** Which formula: null for the base formula, else the variation id whose formula it is. */
  formulaOf: string | null;
  doughGrams: number;
  /** What goes into the bowl for this mix. */
  ingredients: ScaledIngredient[];
  eggs: EggCount | null;
  starter: StarterPlan | null;
  roux: RouxPlan | null;
  portions: MixPortion[];
}

export interface DoughShare {
  dough: string | null;
  name: string;
  /** Dough needed, add-ins included. */
  grams: number;
  addIns: DoughAddIn[];
  addAt: AddInStep | null;
}

export function validateVariations(list: DoughVariation[] | undefined): Map<string, DoughVariation> {
  const byId = new Map<string, DoughVariation>();
  if (list === undefined) return byId;
  if (!Array.isArray(list)) throw new ProductionInputError('doughs', 'must be a list');
  list.forEach((v, i) => {
    const field = `doughs[${i}]`;
    if (!v || typeof v.id !== 'string' || v.id === '') throw new ProductionInputError(`${field}.id`, 'is required');
    if (byId.has(v.id)) throw new ProductionInputError(`${field}.id`, `"${v.id}" is used twice`);
    if (v.formula && v.addIns && v.addIns.length > 0) throw new ProductionInputError(field, 'takes add-ins or its own formula, not both');
    (v.addIns ?? []).forEach((a, j) => {
      if (typeof a.name !== 'string' || a.name.trim() === '') throw new ProductionInputError(`${field}.addIns[${j}].name`, 'is required');
      requireNonNegative(`${field}.addIns[${j}].gramsPerKg`, a.gramsPerKg);
    });
    if (v.formula) {
      // Checked here, ordered or not, so a formula that cannot be mixed is refused when it is saved.
      try {
        scaleFormula(v.formula, 1000);
      } catch (err) {
        if (err instanceof ProductionInputError) throw new ProductionInputError(`${field}.${err.field}`, err.reason);
        throw err;
      }
    }
    byId.set(v.id, v);
  });
  return byId;
}

/** Grams of add-ins per gram of base dough. */
export function addInRatio(addIns: DoughAddIn[]): number {
  return addIns.reduce((s, a) => s + a.gramsPerKg, 0) / 1000;
}

/**
 * Splits the doughs of one formula into equal mixes that fit the bowl, and
 * hands each share its grams from the mixes in order.
 */
export function planMixes(groups: Array<{ formulaOf: string | null; formula: Formula; shares: DoughShare[] }>, bowlGrams: number, gramsPerEgg: number): MixPlan[] {
  const bowl = requirePositive('mixer.capacityGrams', bowlGrams);
  const mixes: MixPlan[] = [];
  for (const group of groups) {
    const bases = group.shares.map((s) => ({ share: s, base: s.grams / (1 + addInRatio(s.addIns)) }));
    const total = bases.reduce((s, b) => s + b.base, 0);
    if (total <= 0) continue;
    const count = Math.ceil(total / bowl - 1e-9);
    const each = total / count;
    // Every mix of a formula is the same size: scale it once.
    const scaled = scaleFormula(group.formula, each);
    const eggGrams = scaled.ingredients.filter((i) => i.kind === 'egg').reduce((s, i) => s + i.grams, 0);
    const eggs = wholeEggs(eggGrams, each, gramsPerEgg);
    let shareIndex = 0;
    let shareLeft = bases[0]?.base ?? 0;
    for (let m = 0; m < count; m++) {
      let room = each;
      const portions: MixPortion[] = [];
      while (room > 1e-9 && shareIndex < bases.length) {
        const take = Math.min(room, shareLeft);
        const { share } = bases[shareIndex]!;
        if (take > 1e-9) {
          portions.push({
            dough: share.dough,
            name: share.name,
            baseGrams: take,
            addIns: share.addIns.map((a) => ({ name: a.name, grams: (a.gramsPerKg * take) / 1000 })),
            addAt: share.addIns.length > 0 ? share.addAt ?? 'after-mix' : null,
          });
        }
        room -= take;
        shareLeft -= take;
        if (shareLeft <= 1e-9) {
          shareIndex++;
          shareLeft = bases[shareIndex]?.base ?? 0;
        }
      }
      mixes.push({
        mix: mixes.length + 1,
        formulaOf: group.formulaOf,
        doughGrams: each,
        ingredients: scaled.finalDough,
        eggs,
        starter: scaled.starter,
        roux: scaled.roux,
        portions,
      });
    }
  }
  return mixes;
}
