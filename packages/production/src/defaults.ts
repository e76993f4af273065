/**
 * Starting values for an enriched sourdough ring doughnut with a milk roux.
 * Our own numbers, chosen inside the usual published ranges for yeast-raised
 * doughnut doughs; the baker edits them. They are frozen: copy, then edit.
 */
import type { Formula } from './formula.js';
import type { GlazeRecipe } from './glaze.js';
import type { Equipment, PlanBakeInput, PlanScheduleSettings, SpareAllowance } from './plan.js';
import { FAT_ABSORBED_GRAMS_PER_DOZEN } from './fry.js';
import { DOUGH_DENSITY_G_PER_CM3 } from './pieces.js';

/**
 * Overall formula, % of total flour. The starter line (20 %: 10 % of the
 * flour prefermented at 100 % hydration) and the roux line (5 % of the flour,
 * cooked in 5 × its weight of milk) are portions of the flour, water and milk
 * lines. Water with what milk, egg and butter carry ≈ 51 %.
 */
/** Freezes a plain-data default all the way down, so no caller can change it for the others. */
function frozen<T>(value: T): T {
  if (value !== null && typeof value === 'object') {
    Object.values(value).forEach((v) => frozen(v));
    Object.freeze(value);
  }
  return value;
}

export const DEFAULT_FORMULA: Formula = frozen({
  ingredients: [
    { name: 'Bread flour', percent: 100, kind: 'flour' },
    { name: 'Water', percent: 10, kind: 'water' },
    { name: 'Whole milk', percent: 40, kind: 'milk' },
    { name: 'Whole eggs', percent: 5, kind: 'egg' },
    { name: 'Unsalted butter', percent: 12, kind: 'butter' },
    { name: 'Sugar', percent: 10, kind: 'sugar' },
    { name: 'Fine salt', percent: 1.8, kind: 'salt' },
    { name: 'Vanilla extract', percent: 0.5, kind: 'flavouring' },
    { name: 'Sourdough starter', percent: 20, kind: 'starter' },
    { name: 'Roux flour', percent: 5, kind: 'roux-flour' },
  ],
  starterHydrationPercent: 100,
  rouxLiquidPerFlour: 5,
  starterFeed: { flourPerSeed: 2, extraPercent: 10, peakHours: 4 },
});

export const DEFAULT_EQUIPMENT: Equipment = frozen({
  pot: { diameterMm: 260, oilDepthMm: 75 },
  oil: { startC: 190, floorC: 177, densityAt20C: 0.92, specificHeatJPerGK: 2.3, smokePointC: 204 },
  cutter: { outerMm: 76, innerMm: 25 },
  rolling: { thicknessMm: 13, widthMm: 400, gapMm: 5, scrapPercent: 30, rerolls: 1, doughDensityGPerCm3: DOUGH_DENSITY_G_PER_CM3 },
  frying: {
    ringSecondsPerSide: 70,
    holeSecondsPerSide: 45,
    recoveryMinutes: 1.5,
    windowMinutes: 150,
    puffFactor: 1.25,
    turnClearanceMm: 15,
    doughSpecificHeatJPerGK: 2.7,
    fatAbsorbedGramsPerDozen: FAT_ABSORBED_GRAMS_PER_DOZEN,
  },
  proofing: { trays: 6, ringsPerTray: 12 },
  mixer: { capacityGrams: 4000, mixes: 2 },
  fridge: { doughGrams: 9000 },
});

export const DEFAULT_SCHEDULE: PlanScheduleSettings = frozen({
  durationsMinutes: {
    'build-starter': 210,
    'cook-cool-roux': 45,
    mix: 20,
    'bulk-fermentation': 240,
    'shape-and-chill': 15,
    'cold-retard': 600,
    'roll-and-cut': 30,
    'final-proof': 150,
    'heat-oil': 25,
    cool: 10,
    glaze: 20,
    pack: 20,
  },
  bulkReferenceTempC: 24,
  cutoffMarginMinutes: 60,
});

export const DEFAULT_SPARE: SpareAllowance = frozen({ percent: 5, minimumRings: 2, minimumHoles: 0, glazeId: null });

export const DEFAULT_GLAZES: GlazeRecipe[] = frozen([
  {
    id: 'vanilla-milk-glaze',
    name: 'Vanilla milk glaze',
    gramsPerRing: 14,
    gramsPerHole: 4,
    parts: [
      { name: 'Icing sugar', parts: 80 },
      { name: 'Whole milk', parts: 18 },
      { name: 'Vanilla extract', parts: 2 },
    ],
    extraPercent: 15,
    allergens: ['milk'],
  },
  {
    id: 'cinnamon-sugar',
    name: 'Cinnamon sugar',
    gramsPerRing: 8,
    gramsPerHole: 3,
    parts: [
      { name: 'Sugar', parts: 95 },
      { name: 'Ground cinnamon', parts: 5 },
    ],
    extraPercent: 25,
  },
]);

export const DEFAULT_DOUGH_ALLERGENS: string[] = frozen(['wheat', 'milk', 'eggs']);

/** The baker's side of planBake's input: spread it, then add orders, dates, prices and allergens. */
export const DEFAULT_PLAN_SETTINGS: Pick<PlanBakeInput, 'spare' | 'formula' | 'equipment' | 'schedule' | 'glazes'> = frozen({
  spare: DEFAULT_SPARE,
  formula: DEFAULT_FORMULA,
  equipment: DEFAULT_EQUIPMENT,
  schedule: DEFAULT_SCHEDULE,
  glazes: DEFAULT_GLAZES,
});
