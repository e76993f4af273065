/**
 * Starting values for an enriched sourdough ring doughnut with a milk roux.
 * Our own numbers, chosen inside the usual published ranges for yeast-raised
 * doughnut doughs; the baker edits them. They are frozen: copy, then edit.
 */
import type { Formula } from './formula.js';
import type { GlazeRecipe } from './glaze.js';
import type { DoughVariation } from './mixes.js';
import type { Equipment, PlanBakeInput, PlanScheduleSettings, SpareAllowance } from './plan.js';
import { DEFAULT_ABSORBED_FAT_PERCENT, DEFAULT_WATER_LOSS_PERCENT } from './fry.js';
import { DOUGH_DENSITY_G_PER_CM3 } from './pieces.js';
import { DEFAULT_DDT_C, STAND_MIXER_FRICTION_C, type DoughTemperatureSettings } from './temperature.js';
import { fToC } from './units.js';

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
  // A 26 cm enamelled cast-iron pot, 17 cm deep, about 4.5 kg.
  pot: { diameterMm: 260, oilDepthMm: 65, heightMm: 170, massGrams: 4500, material: 'cast-iron' },
  // Common practice: fry at 360–375 °F; 360 °F is the lowest the oil may fall to.
  oil: { startC: fToC(375), floorC: fToC(360), densityAt20C: 0.92, specificHeatJPerGK: 2.3, smokePointC: 204, minDepthMm: 40, minFreeboardMm: 75 },
  // A home gas burner gives roughly 1.5–3 kW; about 40 % of it reaches the oil (from memory).
  burner: { watts: 2500, efficiencyPercent: 40 },
  cutter: { outerMm: 76, innerMm: 25 },
  rolling: { thicknessMm: 13, widthMm: 400, benchLengthMm: 600, gapMm: 5, scrapPercent: 30, rerolls: 1, doughDensityGPerCm3: DOUGH_DENSITY_G_PER_CM3 },
  frying: {
    ringSecondsPerSide: 70,
    holeSecondsPerSide: 45,
    recoveryMinutes: 0.5,
    windowMinutes: 150,
    puffFactor: 1.25,
    turnClearanceMm: 15,
    doughSpecificHeatJPerGK: 2.7,
    absorbedFatPercent: DEFAULT_ABSORBED_FAT_PERCENT,
    waterLossPercent: DEFAULT_WATER_LOSS_PERCENT,
  },
  // Half-sheet trays (33 × 46 cm).
  proofing: { trays: 6, ringsPerTray: 12, trayWidthMm: 330, trayLengthMm: 460, trayGapMm: 10 },
  mixer: { capacityGrams: 4000, mixes: 2 },
  fridge: { doughGrams: 9000 },
});

/**
 * Bulk fermentation of this sourdough-leavened enriched dough takes about
 * 8–12 h at room temperature (common practice, no source): 600 min at 24 °C
 * gives about 10 h in a 22 °C room from an 80 °F dough.
 */
export const DEFAULT_SCHEDULE: PlanScheduleSettings = frozen({
  durationsMinutes: {
    'build-starter': 0,
    'cook-cool-roux': 45,
    mix: 20,
    'bulk-fermentation': 600,
    'shape-and-chill': 15,
    'cold-retard': 480,
    'roll-and-cut': 5,
    'final-proof': 120,
    'heat-oil': 15,
    cool: 10,
    glaze: 5,
    pack: 10,
  },
  bulkReferenceTempC: 24,
  cutoffMarginMinutes: 60,
  rates: { rollMinutesPerSheet: 12, rerollRestMinutes: 10, glazeSecondsPerPiece: 8, packSecondsPerBox: 40 },
});

/** Desired dough temperature 80 °F (78–82 °F for yeast-raised doughnuts), stand-mixer friction 20 °F. */
export const DEFAULT_DOUGH_TEMPERATURE_SETTINGS: DoughTemperatureSettings = frozen({
  targetC: DEFAULT_DDT_C,
  frictionC: STAND_MIXER_FRICTION_C,
  bulkSettleMinutes: 90,
  proofSettleMinutes: 20,
});

/**
 * Demo flavoured doughs: lemon zest folded into a share of the base dough
 * (about 10 g of zest per kg, common practice, no source) and a brown-butter
 * dough of its own formula (the butter browned and cooled).
 */
export const DEFAULT_DOUGH_VARIATIONS: DoughVariation[] = frozen([
  { id: 'lemon-zest', name: 'Lemon zest dough', addIns: [{ name: 'Lemon zest', gramsPerKg: 10 }], addAt: 'after-mix' },
  {
    id: 'brown-butter',
    name: 'Brown butter dough',
    formula: {
      ingredients: [
        { name: 'Bread flour', percent: 100, kind: 'flour' },
        { name: 'Water', percent: 12, kind: 'water' },
        { name: 'Whole milk', percent: 40, kind: 'milk' },
        { name: 'Whole eggs', percent: 5, kind: 'egg' },
        { name: 'Browned butter', percent: 11, kind: 'butter' },
        { name: 'Sugar', percent: 10, kind: 'sugar' },
        { name: 'Fine salt', percent: 1.8, kind: 'salt' },
        { name: 'Sourdough starter', percent: 20, kind: 'starter' },
        { name: 'Roux flour', percent: 5, kind: 'roux-flour' },
      ],
      starterHydrationPercent: 100,
      rouxLiquidPerFlour: 5,
      starterFeed: { flourPerSeed: 2, extraPercent: 10, peakHours: 4 },
    },
  },
]);

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
export const DEFAULT_PLAN_SETTINGS: Pick<PlanBakeInput, 'spare' | 'formula' | 'equipment' | 'schedule' | 'glazes' | 'doughTemperature' | 'doughs'> = frozen({
  spare: DEFAULT_SPARE,
  formula: DEFAULT_FORMULA,
  equipment: DEFAULT_EQUIPMENT,
  schedule: DEFAULT_SCHEDULE,
  glazes: DEFAULT_GLAZES,
  doughTemperature: DEFAULT_DOUGH_TEMPERATURE_SETTINGS,
  doughs: DEFAULT_DOUGH_VARIATIONS,
});
