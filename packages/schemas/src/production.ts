import { z } from 'zod';
import type { BakePlan, Capacity } from '@fryline/production';

// Forms and the API validate the baker's settings with these schemas; the
// maths itself lives in @fryline/production and re-checks what it is given.

const positive = (label: string, max: number) =>
  z.number({ error: `${label} must be a number` }).positive(`${label} must be more than 0`).max(max, `${label} is too large`);
const nonNegative = (label: string, max: number) =>
  z.number({ error: `${label} must be a number` }).min(0, `${label} can't be negative`).max(max, `${label} is too large`);
const whole = (label: string, min: number, max: number) =>
  z.number({ error: `${label} must be a number` }).int(`${label} must be a whole number`).min(min, `${label} must be at least ${min}`).max(max, `${label} is too large`);

export const potMaterials = ['cast-iron', 'carbon-steel', 'stainless-steel', 'aluminium', 'copper'] as const;

export const ingredientKinds = [
  'flour', 'water', 'milk', 'egg', 'butter', 'sugar', 'salt', 'starter', 'roux-flour', 'roux-milk', 'flavouring', 'other',
] as const;

export const formulaIngredientSchema = z.strictObject({
  name: z.string().trim().min(1, 'Name the ingredient').max(60),
  percent: nonNegative('Percent', 500),
  kind: z.enum(ingredientKinds),
  salted: z.boolean().optional(),
});

/** Baker's percentages: the flour lines make 100 %. */
function flourAddsUp(f: { ingredients: Array<{ kind: string; percent: number }> }): boolean {
  return Math.abs(f.ingredients.filter((i) => i.kind === 'flour').reduce((s, i) => s + i.percent, 0) - 100) < 1e-9;
}
const FLOUR_ADDS_UP = { message: 'The flour lines must add up to 100 %', path: ['ingredients'] };

export const formulaSchema = z
  .strictObject({
    ingredients: z.array(formulaIngredientSchema).min(1, 'A formula needs ingredients').max(30),
    starterHydrationPercent: positive('Starter hydration', 300).default(100),
    rouxLiquidPerFlour: positive('Roux liquid per flour', 20).default(5),
    starterFeed: z
      .strictObject({
        flourPerSeed: positive('Flour per part of seed starter', 20),
        extraPercent: nonNegative('Extra starter', 100),
        peakHours: positive('Hours to peak', 24),
      })
      .optional(),
  })
  .refine(flourAddsUp, FLOUR_ADDS_UP);
export type FormulaInput = z.infer<typeof formulaSchema>;

export const saveFormulaSchema = z.strictObject({
  formula: formulaSchema,
  note: z.string().trim().max(200).default(''),
});

export const equipmentSchema = z.strictObject({
  pot: z.strictObject({
    diameterMm: positive('Pot diameter', 1000),
    oilDepthMm: positive('Oil depth', 300),
    heightMm: positive('Pot height', 1000).optional(),
    massGrams: nonNegative('Pot mass', 50_000).optional(),
    material: z.enum(potMaterials).optional(),
  }).refine((p) => p.heightMm === undefined || p.oilDepthMm < p.heightMm, { message: 'The oil must be shallower than the pot', path: ['oilDepthMm'] }),
  oil: z.strictObject({
    startC: positive('Oil start temperature', 230),
    floorC: positive('Lowest oil temperature', 230),
    densityAt20C: positive('Oil density', 2).optional(),
    specificHeatJPerGK: positive('Oil specific heat', 10).optional(),
    smokePointC: positive('Smoke point', 300).optional(),
    minDepthMm: positive('Least oil depth', 300).optional(),
    minFreeboardMm: nonNegative('Room above the hot oil', 500).optional(),
  }).refine((o) => o.floorC < o.startC, { message: 'The lowest temperature must be below the start temperature', path: ['floorC'] }),
  burner: z.strictObject({
    watts: positive('Burner power', 20_000),
    efficiencyPercent: positive('Share reaching the oil', 100).optional(),
  }).optional(),
  cutter: z.strictObject({ outerMm: positive('Cutter outside', 200), innerMm: nonNegative('Cutter hole', 100) })
    .refine((c) => c.innerMm < c.outerMm, { message: 'The hole must be smaller than the cutter', path: ['innerMm'] }),
  rolling: z.strictObject({
    thicknessMm: positive('Thickness', 60),
    widthMm: positive('Bench width', 3000),
    benchLengthMm: positive('Bench length', 5000).optional(),
    gapMm: nonNegative('Gap', 50),
    scrapPercent: nonNegative('Scrap', 90),
    rerolls: whole('Re-rolls', 0, 5),
    doughDensityGPerCm3: positive('Dough density', 3),
    measuredRingGrams: positive('Weighed ring', 500).optional(),
    measuredHoleGrams: positive('Weighed hole', 200).optional(),
  }),
  frying: z.strictObject({
    ringSecondsPerSide: positive('Seconds per side (rings)', 600),
    holeSecondsPerSide: positive('Seconds per side (holes)', 600),
    recoveryMinutes: nonNegative('Recovery minutes', 60),
    windowMinutes: positive('Frying window', 24 * 60),
    puffFactor: positive('Puff factor', 3).optional(),
    turnClearanceMm: nonNegative('Turning room', 100).optional(),
    doughSpecificHeatJPerGK: positive('Dough specific heat', 10).optional(),
    fatAbsorbedGramsPerDozen: nonNegative('Fat absorbed', 500).optional(),
    absorbedFatPercent: nonNegative('Fat taken up (% of fried weight)', 60).optional(),
    waterLossPercent: nonNegative('Water lost in the fryer', 50).optional(),
    doughTempC: z.number().min(-5).max(45).optional(),
  }),
  proofing: z.strictObject({
    trays: whole('Trays', 1, 500),
    ringsPerTray: whole('Rings per tray', 1, 500),
    trayWidthMm: positive('Tray width', 2000).optional(),
    trayLengthMm: positive('Tray length', 2000).optional(),
    trayGapMm: nonNegative('Room between pieces', 100).optional(),
  }),
  mixer: z.strictObject({ capacityGrams: positive('Bowl capacity', 100_000), mixes: whole('Mixes', 1, 200) }),
  fridge: z.strictObject({ doughGrams: positive('Fridge space', 1_000_000) }),
});
export type EquipmentInput = z.infer<typeof equipmentSchema>;

export const scheduleStepIds = [
  'build-starter', 'cook-cool-roux', 'mix', 'bulk-fermentation', 'shape-and-chill', 'cold-retard',
  'roll-and-cut', 'final-proof', 'heat-oil', 'cool', 'glaze', 'pack',
] as const;

export const scheduleSchema = z.strictObject({
  durationsMinutes: z.strictObject(Object.fromEntries(scheduleStepIds.map((s) => [s, whole(`Minutes for ${s}`, 0, 48 * 60)])) as Record<(typeof scheduleStepIds)[number], z.ZodNumber>),
  bulkReferenceTempC: z.number().min(5).max(40),
  cutoffMarginMinutes: whole('Cut-off margin', 0, 7 * 24 * 60),
  /** The baker's own rates for the steps that grow with the quantity. */
  rates: z.strictObject({
    rollMinutesPerSheet: positive('Minutes to roll and cut a sheet', 120),
    rerollRestMinutes: nonNegative('Rest before the re-roll', 240),
    glazeSecondsPerPiece: nonNegative('Seconds to glaze a piece', 600),
    packSecondsPerBox: nonNegative('Seconds to pack a box', 1200),
  }).optional(),
});

export const spareSchema = z.strictObject({
  percent: nonNegative('Spare percent', 100),
  minimumRings: whole('Spare rings', 0, 500).optional(),
  minimumHoles: whole('Spare holes', 0, 500).optional(),
  glazeId: z.string().nullable().optional(),
});

export const glazeRecipeSchema = z.strictObject({
  id: z.string().regex(/^[a-z0-9-]{2,40}$/, 'Use lower-case letters, digits and dashes'),
  name: z.string().trim().min(1).max(60),
  gramsPerRing: nonNegative('Grams per ring', 200),
  gramsPerHole: nonNegative('Grams per hole', 100),
  parts: z.array(z.strictObject({ name: z.string().trim().min(1).max(60), parts: positive('Parts', 10_000) })).min(1).max(10),
  extraPercent: nonNegative('Extra', 200).optional(),
  allergens: z.array(z.string()).optional(),
});

export const pricesSchema = z.strictObject({
  centsPerKg: z.record(z.string(), whole('Price per kg (cents)', 0, 1_000_000)),
  fryingOilCentsPerKg: whole('Oil price per kg (cents)', 0, 1_000_000),
  oilBakesPerFill: whole('Bake days per oil fill', 1, 50).optional(),
});

export const addInSteps = ['after-mix', 'at-shaping'] as const;
export const eggClasses = ['medium', 'large', 'extra-large', 'jumbo'] as const;
const temperatureC = (label: string, min: number, max: number) =>
  z.number({ error: `${label} must be a number` }).min(min, `${label} must be at least ${min} °C`).max(max, `${label} must be at most ${max} °C`);

/** A flavoured dough: the base dough with add-ins, or a formula of its own; the menu's flavours that take it. */
export const doughVariationSchema = z.strictObject({
  id: z.string().regex(/^[a-z0-9-]{2,40}$/, 'Use lower-case letters, digits and dashes'),
  name: z.string().trim().min(1, 'Name the dough').max(60),
  /** Menu flavours (as written on the menu items) made with this dough. */
  flavours: z.array(z.string().trim().min(1).max(60)).max(20),
  addIns: z.array(z.strictObject({ name: z.string().trim().min(1, 'Name the add-in').max(60), gramsPerKg: nonNegative('Grams per kg of dough', 500) })).max(10).optional(),
  addAt: z.enum(addInSteps).optional(),
  /** Its own formula; the maths fills in the usual starter and roux figures when they are left out. */
  formula: z.strictObject({
    ingredients: z.array(formulaIngredientSchema).min(1, 'A formula needs ingredients').max(30),
    starterHydrationPercent: positive('Starter hydration', 300).optional(),
    rouxLiquidPerFlour: positive('Roux liquid per flour', 20).optional(),
    starterFeed: z.strictObject({ flourPerSeed: positive('Flour per part of seed starter', 20), extraPercent: nonNegative('Extra starter', 100), peakHours: positive('Hours to peak', 24) }).optional(),
  }).refine(flourAddsUp, FLOUR_ADDS_UP).optional(),
}).refine((v) => !(v.formula && v.addIns && v.addIns.length > 0), { message: 'Give add-ins or a formula of its own, not both', path: ['addIns'] });
export type DoughVariationInput = z.infer<typeof doughVariationSchema>;

/** The dough's temperature targets, its flavoured versions and the eggs bought. */
export const doughSettingsSchema = z.strictObject({
  temperature: z.strictObject({
    targetC: temperatureC('Desired dough temperature', 15, 35),
    frictionC: nonNegative('Mixer friction (temperature rise)', 30),
    flourC: temperatureC('Flour temperature', -5, 45).optional(),
    starterC: temperatureC('Starter temperature', 0, 45).optional(),
    rouxC: temperatureC('Roux temperature', 0, 70).optional(),
    proofC: temperatureC('Proofing temperature', 5, 45).optional(),
    bulkSettleMinutes: nonNegative('Bulk dough settling time', 600).optional(),
    proofSettleMinutes: nonNegative('Pieces settling time', 300).optional(),
  }),
  variations: z.array(doughVariationSchema).max(20),
  eggClass: z.enum(eggClasses),
}).refine((d) => new Set(d.variations.map((v) => v.id)).size === d.variations.length, { message: 'Each dough needs its own id', path: ['variations'] })
  .refine((d) => {
    const flavours = d.variations.flatMap((v) => v.flavours.map((f) => f.toLowerCase()));
    return new Set(flavours).size === flavours.length;
  }, { message: 'A flavour can name only one dough', path: ['variations'] });
export type DoughSettingsInput = z.infer<typeof doughSettingsSchema>;

export const productionSettingsSchema = z.strictObject({
  equipment: equipmentSchema,
  schedule: scheduleSchema,
  spare: spareSchema,
  glazes: z.array(glazeRecipeSchema).max(30),
  prices: pricesSchema,
  roomTempC: z.number().min(5).max(40),
  /** Absent in settings saved before it existed: the defaults apply. */
  dough: doughSettingsSchema.optional(),
});
export type ProductionSettingsInput = z.infer<typeof productionSettingsSchema>;

export const capacityOverrideSchema = z.strictObject({
  rings: whole('Rings', 0, 10_000),
  holes: whole('Holes', 0, 10_000),
  /** Needed to go above what the equipment allows. */
  acceptAboveEquipment: z.boolean().default(false),
});

/** What the production sheet route says about the numbers it worked out. */
export const planMetaSchema = z.object({
  bakeDay: z.object({
    id: z.string(), date: z.string(), place: z.string(), timeZone: z.string(), cutoffAt: z.string(),
    capacity: z.object({ rings: z.number().int(), holes: z.number().int() }),
  }),
  ordersCounted: z.number().int(),
  paidOrders: z.number().int(),
  heldOrders: z.number().int(),
  computedAt: z.string(),
  formula: z.object({ id: z.string().nullable(), version: z.number().int(), note: z.string() }),
  latestFormulaVersion: z.number().int(),
  menu: z.array(z.object({ id: z.string(), name: z.string(), kind: z.string(), glaze: z.string(), glazeRecipeId: z.string().nullable() })),
});
export type PlanMeta = z.infer<typeof planMetaSchema>;

/**
 * The bake maths' own result types are TypeScript from packages/production,
 * carried rather than re-validated, except the fields the sheet's readers
 * rely on: the liquid temperature, the mixes, the fry timetable, the fat
 * taken up and the warnings as data.
 */
const planShapeSchema = z.object({
  dough: z.object({ liquidTemperatureC: z.number() }),
  mixes: z.array(z.object({ doughGrams: z.number(), ingredients: z.array(z.object({ name: z.string(), grams: z.number() })), eggs: z.object({ count: z.number().int() }).nullable() })),
  fry: z.object({
    timetable: z.array(z.object({ batch: z.number().int(), at: z.string(), pieces: z.number().int(), waitForC: z.number() })),
    oilAbsorbedGrams: z.number(),
  }),
  warnings: z.array(z.object({ code: z.string(), message: z.string() })),
});
export const bakePlanSchema = z.custom<BakePlan>((v) => typeof v === 'object' && v !== null && planShapeSchema.safeParse(v).success, 'Not a production plan');
export const equipmentCapacitySchema = z.custom<Capacity>((v) => typeof v === 'object' && v !== null);

/** `GET /api/bake-days/:id/plan`: the sheet, and what it was worked out from. */
export const planResponseSchema = z.object({ plan: bakePlanSchema, meta: planMetaSchema });
export type PlanResponse = z.infer<typeof planResponseSchema>;

/** The saved production settings, and when they were last saved (null: never, the defaults). */
export const productionSettingsViewSchema = z.object({
  equipment: z.custom<EquipmentInput>(),
  schedule: z.custom<z.infer<typeof scheduleSchema>>(),
  spare: z.custom<z.infer<typeof spareSchema>>(),
  glazes: z.custom<Array<z.infer<typeof glazeRecipeSchema>>>(),
  prices: z.custom<z.infer<typeof pricesSchema>>(),
  roomTempC: z.number(),
  dough: z.custom<DoughSettingsInput>(),
  updatedAt: z.string().nullable(),
});
export type ProductionSettingsView = z.infer<typeof productionSettingsViewSchema>;

export const formulaVersionViewSchema = z.object({
  id: z.string(),
  version: z.number().int(),
  note: z.string(),
  createdAt: z.string(),
  formula: z.custom<FormulaInput>(),
});
export type FormulaVersionView = z.infer<typeof formulaVersionViewSchema>;

export const formulaListSchema = z.object({
  /** The newest version (id null and version 0: the built-in starting formula, never saved). */
  current: z.object({ id: z.string().nullable(), version: z.number().int(), formula: z.custom<FormulaInput>(), note: z.string(), createdAt: z.string().nullable() }),
  /** Newest first. */
  versions: z.array(formulaVersionViewSchema),
});
export type FormulaList = z.infer<typeof formulaListSchema>;

export const pinFormulaSchema = z.strictObject({ formulaVersionId: z.uuid() });

/** What setting a bake day's capacity answers. */
export const capacityResultSchema = z.object({
  rings: z.number().int(),
  holes: z.number().int(),
  remaining: z.object({ rings: z.number().int(), holes: z.number().int() }),
  derived: equipmentCapacitySchema,
});
export type CapacityResult = z.infer<typeof capacityResultSchema>;
