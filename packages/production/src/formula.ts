/**
 * Formula scaling in baker's percentages.
 *
 * Convention (overall formula, as bakers' guilds lay formulas out): every
 * percentage is grams per 100 g of TOTAL flour, and total flour includes the
 * flour inside the starter and the flour cooked into the milk roux. So the
 * flour lines add up to 100 %, the water lines hold all the water (the
 * starter's too) and the milk lines hold all the milk (the roux's too).
 * Lines of kind `starter`, `roux-flour` and `roux-milk` are portions of those
 * lines, not additions: the starter's flour and water and the roux's flour
 * and milk are taken out of the flour, water and milk lines to give the final
 * dough (what goes into the mixer besides the starter and the roux).
 */
import { ProductionInputError, requireNonNegative, requirePositive } from './errors.js';
import { GRAMS_PER_OUNCE } from './units.js';

export const INGREDIENT_KINDS = [
  'flour', 'water', 'milk', 'egg', 'butter', 'sugar', 'salt',
  'starter', 'roux-flour', 'roux-milk', 'flavouring', 'other',
] as const;
export type IngredientKind = (typeof INGREDIENT_KINDS)[number];

/** Kinds that are portions of the flour, water and milk lines rather than additions. */
export const PORTION_KINDS: readonly IngredientKind[] = ['starter', 'roux-flour', 'roux-milk'];

export function isPortionKind(kind: IngredientKind): boolean {
  return PORTION_KINDS.includes(kind);
}

/** Water per gram of ingredient, USDA SR Legacy (NDB 01077, 01123, 01145, 01001). */
export const WATER_FRACTION = {
  wholeMilk: 0.8813,
  wholeEgg: 0.7615,
  butterUnsalted: 0.1794,
  butterSalted: 0.1587,
} as const;

/** Edible part of one large egg, grams (USDA SR Legacy, NDB 01123). */
export const LARGE_EGG_GRAMS = 50;

/** Shell-egg weight classes: least net weight of a dozen, ounces (USDA AMS 56). */
export const EGG_CLASS_OZ_PER_DOZEN = { medium: 21, large: 24, 'extra-large': 27, jumbo: 30 } as const;
export type EggClass = keyof typeof EGG_CLASS_OZ_PER_DOZEN;
/** Shell as a share of a whole egg's weight (USDA SR Legacy, NDB 01123: refuse 12 %). */
export const EGG_SHELL_SHARE = 0.12;

/** Edible grams of one egg of a weight class: the class's dozen weight ÷ 12, less the shell. */
export function eggEdibleGrams(eggClass: EggClass): number {
  const oz = EGG_CLASS_OZ_PER_DOZEN[eggClass];
  if (oz === undefined) throw new ProductionInputError('eggClass', `must be one of ${Object.keys(EGG_CLASS_OZ_PER_DOZEN).join(', ')}`);
  return ((oz * GRAMS_PER_OUNCE) / 12) * (1 - EGG_SHELL_SHARE);
}

export interface FormulaIngredient {
  name: string;
  /** Baker's percentage: grams per 100 g of total flour. */
  percent: number;
  kind: IngredientKind;
  /** Butter only: salted butter carries a little less water. Default unsalted. */
  salted?: boolean;
}

export interface StarterFeed {
  /** Grams of flour fed per gram of seed starter (1:2:2 at 100 % hydration → 2). Default 2. */
  flourPerSeed?: number;
  /** Starter built beyond what the dough needs, for what sticks to the jar. Default 10 %. */
  extraPercent?: number;
  /** Hours from feed to peak at room temperature. Default 4 (common practice: 4 ± 1 h). */
  peakHours?: number;
}

export interface Formula {
  ingredients: FormulaIngredient[];
  /** Water per 100 g of flour in the starter. Default 100. */
  starterHydrationPercent?: number;
  /** Grams of milk per gram of roux flour. Default 5 (1:5 flour:milk). */
  rouxLiquidPerFlour?: number;
  starterFeed?: StarterFeed;
}

export interface ScaledIngredient {
  name: string;
  kind: IngredientKind;
  /** Baker's percentage (of total flour). */
  percent: number;
  grams: number;
  /** True for starter and roux lines: already counted inside the flour, water and milk lines. */
  portion: boolean;
}

export interface StarterPlan {
  /** Starter the dough needs. */
  grams: number;
  flourGrams: number;
  waterGrams: number;
  hydrationPercent: number;
  /** Share of total flour that is fermented in the starter. */
  prefermentedFlourPercent: number;
  build: StarterBuild;
}

export interface StarterBuild {
  /** Ripe starter to take from the jar and feed. */
  seedGrams: number;
  flourGrams: number;
  waterGrams: number;
  /** seedGrams + flourGrams + waterGrams: what the jar holds at peak. */
  totalGrams: number;
  /** Seed : flour : water by weight, e.g. "1:2:2". */
  ratio: string;
  extraPercent: number;
  /** Feed this many hours before the mix, so the starter peaks at mixing time. */
  feedHoursBeforeMix: number;
  /** Usual window around the peak, hours after the feed. */
  peakWindowHours: { from: number; to: number };
}

export interface RouxPlan {
  flourGrams: number;
  milkGrams: number;
  totalGrams: number;
  /** Grams of milk per gram of flour. */
  liquidPerFlour: number;
  /** Share of total flour cooked in the roux. */
  flourPercent: number;
  /** Cook, stirring, until it thickens at about this temperature (wheat starch gelatinises). */
  cookToC: number;
}

export interface EggCount {
  /** Exact egg grams the formula asks for. */
  grams: number;
  count: number;
  gramsPerEgg: number;
  /** How the count was rounded. */
  rule: string;
  /** count × gramsPerEgg − grams: what using whole eggs adds to (or takes from) the dough. */
  massChangeGrams: number;
  doughGramsWithWholeEggs: number;
}

export interface ScaledFormula {
  doughGrams: number;
  totalFlourGrams: number;
  /** Σ of the non-portion percentages; dough = total flour × Σ / 100. */
  percentSum: number;
  /** Every formula line, in input order, scaled (starter and roux lines flagged `portion`). */
  ingredients: ScaledIngredient[];
  /** What goes into the mixer: remaining flour, water and milk, the starter, the roux, the rest. Sums to doughGrams. */
  finalDough: ScaledIngredient[];
  /** Free water (water lines, starter water included) per 100 g flour. */
  hydrationPercent: number;
  /** Free water plus the water carried by milk, egg and butter (USDA SR Legacy). */
  hydrationWithCarriedWaterPercent: number;
  starter: StarterPlan | null;
  roux: RouxPlan | null;
  eggs: EggCount | null;
  warnings: string[];
}

/** flour = dough ÷ (Σ % / 100). */
export function flourForDough(doughGrams: number, percentSum: number): number {
  requireNonNegative('doughGrams', doughGrams);
  requirePositive('percentSum', percentSum);
  return (doughGrams * 100) / percentSum;
}

/** Starter line (% of total flour, by starter mass) from the share of flour that is prefermented. */
export function starterPercentFromPrefermentedFlour(prefermentedFlourPercent: number, hydrationPercent = 100): number {
  requireNonNegative('prefermentedFlourPercent', prefermentedFlourPercent);
  requirePositive('hydrationPercent', hydrationPercent);
  return prefermentedFlourPercent * (1 + hydrationPercent / 100);
}

/** Usual ranges for yeast-raised doughnut doughs (industrial; home enriched doughs run higher in egg and butter). */
export const DOUGHNUT_RANGES = {
  salt: { min: 1.5, max: 2.2 },
  waterWithCarried: { min: 45, max: 55 },
  fat: { min: 9, max: 16 },
  sugar: { min: 5, max: 14 },
  egg: { min: 1, max: 5 },
} as const;

interface Totals {
  flour: number;
  water: number;
  milk: number;
  egg: number;
  butter: number;
  butterWater: number;
  sugar: number;
  salt: number;
}

function validateFormula(formula: Formula): void {
  if (!formula || !Array.isArray(formula.ingredients) || formula.ingredients.length === 0) {
    throw new ProductionInputError('formula.ingredients', 'needs at least one line');
  }
  formula.ingredients.forEach((line, i) => {
    const field = `formula.ingredients[${i}]`;
    if (typeof line.name !== 'string' || line.name.trim() === '') {
      throw new ProductionInputError(`${field}.name`, 'needs a name');
    }
    if (!INGREDIENT_KINDS.includes(line.kind)) {
      throw new ProductionInputError(`${field}.kind`, `must be one of ${INGREDIENT_KINDS.join(', ')}`);
    }
    requireNonNegative(`${field}.percent`, line.percent);
  });
  for (const kind of PORTION_KINDS) {
    if (formula.ingredients.filter((l) => l.kind === kind).length > 1) {
      throw new ProductionInputError('formula.ingredients', `only one ${kind} line is allowed`);
    }
  }
}

function totalsOf(lines: FormulaIngredient[]): Totals {
  const t: Totals = { flour: 0, water: 0, milk: 0, egg: 0, butter: 0, butterWater: 0, sugar: 0, salt: 0 };
  for (const l of lines) {
    if (l.kind === 'flour') t.flour += l.percent;
    else if (l.kind === 'water') t.water += l.percent;
    else if (l.kind === 'milk') t.milk += l.percent;
    else if (l.kind === 'egg') t.egg += l.percent;
    else if (l.kind === 'sugar') t.sugar += l.percent;
    else if (l.kind === 'salt') t.salt += l.percent;
    else if (l.kind === 'butter') {
      t.butter += l.percent;
      t.butterWater += l.percent * (l.salted ? WATER_FRACTION.butterSalted : WATER_FRACTION.butterUnsalted);
    }
  }
  return t;
}

function formatRatioNumber(n: number): string {
  return String(Math.round(n * 100) / 100);
}

function buildStarter(neededGrams: number, hydrationPercent: number, feed: StarterFeed | undefined): StarterBuild {
  const flourPerSeed = requirePositive('formula.starterFeed.flourPerSeed', feed?.flourPerSeed ?? 2);
  const extraPercent = requireNonNegative('formula.starterFeed.extraPercent', feed?.extraPercent ?? 10);
  const peakHours = requirePositive('formula.starterFeed.peakHours', feed?.peakHours ?? 4);
  const waterPerSeed = flourPerSeed * (hydrationPercent / 100);
  const totalGrams = neededGrams * (1 + extraPercent / 100);
  const seedGrams = totalGrams / (1 + flourPerSeed + waterPerSeed);
  return {
    seedGrams,
    flourGrams: seedGrams * flourPerSeed,
    waterGrams: seedGrams * waterPerSeed,
    totalGrams,
    ratio: `1:${formatRatioNumber(flourPerSeed)}:${formatRatioNumber(waterPerSeed)}`,
    extraPercent,
    feedHoursBeforeMix: peakHours,
    peakWindowHours: { from: Math.max(0, peakHours - 1), to: peakHours + 1 },
  };
}

/**
 * Whole eggs for the egg grams: round to the nearest whole large egg (50 g
 * edible), at least 1 when the formula has any egg; halves round up.
 */
export function wholeEggs(eggGrams: number, doughGrams: number, gramsPerEgg = LARGE_EGG_GRAMS): EggCount | null {
  requireNonNegative('eggGrams', eggGrams);
  requirePositive('gramsPerEgg', gramsPerEgg);
  if (eggGrams === 0) return null;
  const count = Math.max(1, Math.round(eggGrams / gramsPerEgg));
  const massChangeGrams = count * gramsPerEgg - eggGrams;
  return {
    grams: eggGrams,
    count,
    gramsPerEgg,
    rule: `nearest whole egg of ${Math.round(gramsPerEgg)} g (halves up), at least 1; or weigh ${Math.round(eggGrams)} g of beaten egg`,
    massChangeGrams,
    doughGramsWithWholeEggs: doughGrams + massChangeGrams,
  };
}

function rangeWarnings(t: Totals, carriedHydration: number): string[] {
  const warnings: string[] = [];
  const check = (label: string, value: number, range: { min: number; max: number }, highNote = '') => {
    if (value < range.min || value > range.max) {
      const note = value > range.max ? highNote : '';
      warnings.push(
        `${label} is ${formatRatioNumber(value)} % of the flour; yeast-raised doughnut doughs usually run ${range.min}–${range.max} %${note}.`,
      );
    }
  };
  const enriched = ' (home enriched doughs often run higher)';
  check('Salt', t.salt, DOUGHNUT_RANGES.salt);
  check('Water (with the water in milk, egg and butter)', carriedHydration, DOUGHNUT_RANGES.waterWithCarried);
  check('Fat (butter)', t.butter, DOUGHNUT_RANGES.fat, enriched);
  check('Sugar', t.sugar, DOUGHNUT_RANGES.sugar);
  check('Egg', t.egg, DOUGHNUT_RANGES.egg, enriched);
  return warnings;
}

/**
 * Scales a formula to a target dough mass. See the module comment for the
 * percentage convention. The final-dough grams add up to `doughGrams`
 * (unrounded; round for display only); 0 g gives an all-zero sheet. Throws ProductionInputError when the
 * starter or roux would need more flour, water or milk than the formula has.
 */
export function scaleFormula(formula: Formula, doughGrams: number): ScaledFormula {
  requireNonNegative('doughGrams', doughGrams);
  validateFormula(formula);
  const starterHydration = requirePositive('formula.starterHydrationPercent', formula.starterHydrationPercent ?? 100);
  const rouxRatio = requirePositive('formula.rouxLiquidPerFlour', formula.rouxLiquidPerFlour ?? 5);

  const lines = formula.ingredients;
  const t = totalsOf(lines);
  if (Math.abs(t.flour - 100) > 0.01) {
    throw new ProductionInputError('formula.ingredients', `the flour lines must add up to 100 % (they add up to ${formatRatioNumber(t.flour)} %)`);
  }

  const starterLine = lines.find((l) => l.kind === 'starter');
  const rouxFlourLine = lines.find((l) => l.kind === 'roux-flour');
  const rouxMilkLine = lines.find((l) => l.kind === 'roux-milk');
  if (rouxMilkLine && !rouxFlourLine) {
    throw new ProductionInputError('formula.ingredients', 'a roux-milk line needs a roux-flour line');
  }
  if (rouxMilkLine && rouxFlourLine && formula.rouxLiquidPerFlour !== undefined && rouxFlourLine.percent > 0) {
    const given = rouxMilkLine.percent / rouxFlourLine.percent;
    if (Math.abs(given - formula.rouxLiquidPerFlour) > 1e-6) {
      throw new ProductionInputError('formula.rouxLiquidPerFlour', `disagrees with the roux lines (${formatRatioNumber(given)} g milk per g flour)`);
    }
  }

  const starterPct = starterLine?.percent ?? 0;
  const starterFlourPct = starterPct / (1 + starterHydration / 100);
  const starterWaterPct = starterPct - starterFlourPct;
  const rouxFlourPct = rouxFlourLine?.percent ?? 0;
  const rouxMilkPct = rouxMilkLine ? rouxMilkLine.percent : rouxFlourPct * rouxRatio;

  if (starterFlourPct + rouxFlourPct > 100 + 1e-9) {
    throw new ProductionInputError('formula.ingredients', 'the starter and the roux would need more flour than the formula has');
  }
  if (starterWaterPct > t.water + 1e-9) {
    throw new ProductionInputError(
      'formula.ingredients',
      `the starter carries ${formatRatioNumber(starterWaterPct)} % water but the water lines add up to ${formatRatioNumber(t.water)} %; the water lines must include the starter's water`,
    );
  }
  if (rouxMilkPct > t.milk + 1e-9) {
    throw new ProductionInputError(
      'formula.ingredients',
      `the roux needs ${formatRatioNumber(rouxMilkPct)} % milk but the milk lines add up to ${formatRatioNumber(t.milk)} %; the milk lines must include the roux's milk`,
    );
  }

  const percentSum = lines.filter((l) => !isPortionKind(l.kind)).reduce((s, l) => s + l.percent, 0);
  const totalFlourGrams = flourForDough(doughGrams, percentSum);
  const grams = (percent: number) => (percent * totalFlourGrams) / 100;
  const row = (name: string, kind: IngredientKind, percent: number, portion: boolean): ScaledIngredient => ({
    name, kind, percent, grams: grams(percent), portion,
  });

  const ingredients = lines.map((l) => row(l.name, l.kind, l.percent, isPortionKind(l.kind)));

  // Share of each flour / water / milk line left for the final dough (taken proportionally).
  const keep = {
    flour: 1 - (starterFlourPct + rouxFlourPct) / t.flour,
    water: t.water > 0 ? 1 - starterWaterPct / t.water : 1,
    milk: t.milk > 0 ? 1 - rouxMilkPct / t.milk : 1,
  };
  const finalDough: ScaledIngredient[] = [];
  for (const l of lines) {
    if (l.kind === 'flour' || l.kind === 'water' || l.kind === 'milk') {
      finalDough.push(row(l.name, l.kind, l.percent * keep[l.kind], false));
    } else if (l.kind === 'starter') {
      finalDough.push(row(l.name, 'starter', starterPct, false));
    } else if (l.kind === 'roux-flour') {
      finalDough.push(row(l.name, 'roux-flour', rouxFlourPct, false));
      finalDough.push(row(rouxMilkLine?.name ?? 'Milk (in the roux)', 'roux-milk', rouxMilkPct, false));
    } else if (l.kind !== 'roux-milk') {
      finalDough.push(row(l.name, l.kind, l.percent, false));
    }
  }

  const hydrationPercent = t.water;
  const hydrationWithCarriedWaterPercent =
    t.water + t.milk * WATER_FRACTION.wholeMilk + t.egg * WATER_FRACTION.wholeEgg + t.butterWater;

  const starter: StarterPlan | null = starterLine
    ? {
        grams: grams(starterPct),
        flourGrams: grams(starterFlourPct),
        waterGrams: grams(starterWaterPct),
        hydrationPercent: starterHydration,
        prefermentedFlourPercent: starterFlourPct,
        build: buildStarter(grams(starterPct), starterHydration, formula.starterFeed),
      }
    : null;

  const roux: RouxPlan | null = rouxFlourLine
    ? {
        flourGrams: grams(rouxFlourPct),
        milkGrams: grams(rouxMilkPct),
        totalGrams: grams(rouxFlourPct + rouxMilkPct),
        liquidPerFlour: rouxFlourPct > 0 ? rouxMilkPct / rouxFlourPct : rouxRatio,
        flourPercent: rouxFlourPct,
        cookToC: 65,
      }
    : null;

  return {
    doughGrams,
    totalFlourGrams,
    percentSum,
    ingredients,
    finalDough: finalDough.filter((r) => r.grams > 1e-9),
    hydrationPercent,
    hydrationWithCarriedWaterPercent,
    starter,
    roux,
    eggs: wholeEggs(grams(t.egg), doughGrams),
    warnings: rangeWarnings(t, hydrationWithCarriedWaterPercent),
  };
}

/** Fat per gram of ingredient, USDA SR Legacy (NDB 01077 milk, 01123 egg, 01145/01001 butter, 20083 bread flour). */
export const FAT_FRACTION = { wholeMilk: 0.0325, wholeEgg: 0.0951, butter: 0.8111, breadFlour: 0.0166 } as const;

/** Share of the dough's mass that is fat, from the flour, milk, egg and butter lines (other lines counted fat-free). */
export function doughFatShare(formula: Formula): number {
  validateFormula(formula);
  let fat = 0;
  let sum = 0;
  for (const l of formula.ingredients) {
    if (isPortionKind(l.kind)) continue;
    sum += l.percent;
    if (l.kind === 'flour') fat += l.percent * FAT_FRACTION.breadFlour;
    else if (l.kind === 'milk') fat += l.percent * FAT_FRACTION.wholeMilk;
    else if (l.kind === 'egg') fat += l.percent * FAT_FRACTION.wholeEgg;
    else if (l.kind === 'butter') fat += l.percent * FAT_FRACTION.butter;
  }
  return sum > 0 ? fat / sum : 0;
}
