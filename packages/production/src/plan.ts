/**
 * planBake: from tonight's orders and the baker's settings to the whole
 * production sheet. Pure: every input, the current instant and the time zone
 * included, comes in as a parameter; instants go out as ISO-8601 strings.
 *
 * Order of work: pieces to make (orders + spare) → dough that provably cuts
 * them (so more orders never mean less dough) → formula grams, starter and
 * roux → first roll and re-rolls → fry batches → glaze → schedule backwards
 * from the first pickup → capacity → cost → cautions.
 */
import { allergenCaution, distinctAllergens, HOME_FOOD_RULES_CAUTION, hotOilCautions } from './cautions.js';
import { capacityFromEquipment, type Capacity } from './capacity.js';
import { costBake, type BoxOffer, type CostPlan, type Prices } from './cost.js';
import { cutsFromSheet, doughForPieces, rollAndCut, type RollResult } from './cutting.js';
import { ProductionInputError, requireFinite, requireNonNegative, requireWholeNonNegative } from './errors.js';
import { scaleFormula, type Formula, type RouxPlan, type ScaledFormula, type StarterPlan } from './formula.js';
import { FAT_ABSORBED_GRAMS_PER_DOZEN, planFry, type FryPlan } from './fry.js';
import { glazeAmounts, type GlazeAmount, type GlazeNeed, type GlazeRecipe } from './glaze.js';
import { effectivePieceMass } from './pieces.js';
import { buildSchedule, FRIDGE_MAX_C, lookForTexts, type StepDurations, type TimelineStep } from './schedule.js';

export type PieceKind = 'ring' | 'hole';

/** Tonight's orders, summarised as counts by menu item (repeated ids are added up). */
export interface OrderLine {
  menuItemId: string;
  name: string;
  kind: PieceKind;
  /** Glaze recipe id, or null for plain. */
  glaze: string | null;
  quantity: number;
}

export interface SpareAllowance {
  /** Extra pieces on top of the orders, percent of each kind, rounded up. */
  percent: number;
  /** At least this many spare rings when any ring is ordered. Default 0. */
  minimumRings?: number;
  /** At least this many spare holes when any hole is ordered. Default 0. */
  minimumHoles?: number;
  /** Glaze for the spare pieces; null or absent leaves them plain. */
  glazeId?: string | null;
}

export interface Equipment {
  pot: { diameterMm: number; oilDepthMm: number };
  oil: { startC: number; floorC: number; densityAt20C?: number; specificHeatJPerGK?: number; smokePointC?: number };
  cutter: { outerMm: number; innerMm: number };
  rolling: {
    thicknessMm: number;
    /** Width the dough is rolled to on the bench. */
    widthMm: number;
    gapMm: number;
    scrapPercent: number;
    rerolls: number;
    doughDensityGPerCm3: number;
    /** A weighed cut piece overrides the computed mass. */
    measuredRingGrams?: number;
    measuredHoleGrams?: number;
  };
  frying: {
    ringSecondsPerSide: number;
    holeSecondsPerSide: number;
    recoveryMinutes: number;
    /** Time the fryer is available on the bake day (for capacity). */
    windowMinutes: number;
    puffFactor?: number;
    turnClearanceMm?: number;
    doughSpecificHeatJPerGK?: number;
    fatAbsorbedGramsPerDozen?: number;
    /** Dough temperature going into the oil; default the room temperature. */
    doughTempC?: number;
  };
  proofing: { trays: number; ringsPerTray: number };
  mixer: { capacityGrams: number; mixes: number };
  fridge: { doughGrams: number };
}

export interface PlanScheduleSettings {
  /** Minutes per step; the fry step is computed from the fry plan. */
  durationsMinutes: Omit<StepDurations, 'fry'>;
  bulkReferenceTempC: number;
  cutoffMarginMinutes: number;
}

export interface AllergenList {
  /** Allergens of the dough itself (and of the frying oil, if any). */
  dough: string[];
  byMenuItem?: Record<string, string[]>;
}

export interface PlanBakeInput {
  orders: OrderLine[];
  spare: SpareAllowance;
  formula: Formula;
  equipment: Equipment;
  schedule: PlanScheduleSettings;
  roomTempC: number;
  /** Start of the first pickup window, ISO-8601. */
  firstPickupStartsAt: string;
  /** The bake day's IANA time zone. */
  timeZone: string;
  /** The current instant, ISO-8601. */
  now: string;
  prices: Prices;
  glazes: GlazeRecipe[];
  boxes?: BoxOffer[];
  allergens: AllergenList;
}

export interface PieceCounts {
  ordered: number;
  spare: number;
  toMake: number;
}

export interface PiecesSummary {
  ringGrams: number;
  holeGrams: number;
  pieceMassSource: { ring: 'measured' | 'computed'; hole: 'measured' | 'computed' };
  rings: PieceCounts;
  holes: PieceCounts;
  byMenuItem: OrderLine[];
  /** Pieces per glaze, spare included (plain pieces are not listed). */
  byGlaze: GlazeNeed[];
}

export interface CutsPlan extends RollResult {
  /** Cut beyond the pieces to make (sold as surplus). */
  surplus: { rings: number; holes: number };
  /** The first roll as one sheet at the bench width, and how many rings a real layout fits in it. */
  firstRollSheet: { widthMm: number; lengthMm: number; ringsThatFit: number };
}

export interface StarterSheet extends StarterPlan {
  feedAt: string;
  /** Hours from the feed to the mix, as scheduled. */
  hoursBeforeMix: number;
}

export interface BakePlan {
  pieces: PiecesSummary;
  dough: ScaledFormula;
  roux: RouxPlan | null;
  starter: StarterSheet | null;
  cuts: CutsPlan;
  fry: FryPlan;
  glaze: GlazeAmount[];
  timeline: TimelineStep[];
  firstStepAt: string;
  preorderCutoffAt: string;
  bulkFermentationMinutes: number;
  capacity: Capacity;
  cost: CostPlan;
  /** Safety and legal cautions (hot oil, allergens, home-food rules). */
  cautions: string[];
  /** Planning notes: ranges, timing, capacity. */
  warnings: string[];
}

function summariseOrders(orders: OrderLine[]): OrderLine[] {
  if (!Array.isArray(orders)) throw new ProductionInputError('orders', 'must be a list');
  const byId = new Map<string, OrderLine>();
  for (let i = 0; i < orders.length; i++) {
    const o = orders[i]!;
    // Field names are built only on failure: this loop runs once per order line.
    if (!o || typeof o !== 'object') throw new ProductionInputError(`orders[${i}]`, 'must be an order line');
    if (typeof o.menuItemId !== 'string' || o.menuItemId === '') throw new ProductionInputError(`orders[${i}].menuItemId`, 'is required');
    if (o.kind !== 'ring' && o.kind !== 'hole') throw new ProductionInputError(`orders[${i}].kind`, 'must be ring or hole');
    if (o.glaze !== null && typeof o.glaze !== 'string') throw new ProductionInputError(`orders[${i}].glaze`, 'must be a glaze id or null');
    if (!Number.isInteger(o.quantity) || o.quantity < 0) requireWholeNonNegative(`orders[${i}].quantity`, o.quantity);
    const seen = byId.get(o.menuItemId);
    if (!seen) {
      byId.set(o.menuItemId, { menuItemId: o.menuItemId, name: o.name, kind: o.kind, glaze: o.glaze, quantity: o.quantity });
    } else if (seen.kind !== o.kind || seen.glaze !== o.glaze) {
      throw new ProductionInputError(`orders[${i}]`, `menu item ${o.menuItemId} appears with a different kind or glaze`);
    } else {
      seen.quantity += o.quantity;
    }
  }
  return [...byId.values()];
}

function spareFor(ordered: number, percent: number, minimum: number): number {
  if (ordered === 0) return 0;
  return Math.max(minimum, Math.ceil((ordered * percent) / 100 - 1e-9));
}

function glazeNeeds(items: OrderLine[], spareGlaze: string | null, spare: { rings: number; holes: number }): GlazeNeed[] {
  const needs = new Map<string, GlazeNeed>();
  const add = (glazeId: string | null, rings: number, holes: number) => {
    if (glazeId === null) return;
    const n = needs.get(glazeId) ?? { glazeId, rings: 0, holes: 0 };
    n.rings += rings;
    n.holes += holes;
    needs.set(glazeId, n);
  };
  for (const item of items) add(item.glaze, item.kind === 'ring' ? item.quantity : 0, item.kind === 'hole' ? item.quantity : 0);
  add(spareGlaze, spare.rings, spare.holes);
  return [...needs.values()];
}

const EQUIPMENT_GROUPS = ['pot', 'oil', 'cutter', 'rolling', 'frying', 'proofing', 'mixer', 'fridge'] as const;

function requireParts(input: PlanBakeInput): void {
  if (!input || typeof input !== 'object') throw new ProductionInputError('input', 'is required');
  for (const part of ['spare', 'formula', 'equipment', 'schedule', 'prices', 'allergens'] as const) {
    if (!input[part] || typeof input[part] !== 'object') throw new ProductionInputError(part, 'is required');
  }
  for (const group of EQUIPMENT_GROUPS) {
    if (!input.equipment[group] || typeof input.equipment[group] !== 'object') throw new ProductionInputError(`equipment.${group}`, 'is required');
  }
  if (!Array.isArray(input.glazes)) throw new ProductionInputError('glazes', 'must be a list (it may be empty)');
  if (!Array.isArray(input.allergens.dough)) throw new ProductionInputError('allergens.dough', 'must be a list');
}

export function planBake(input: PlanBakeInput): BakePlan {
  requireParts(input);
  const { equipment: eq } = input;
  const roomTempC = requireFinite('roomTempC', input.roomTempC);
  const items = summariseOrders(input.orders);
  const glazeIds = new Set(input.glazes.map((g) => g.id));
  items.forEach((item) => {
    if (item.glaze !== null && !glazeIds.has(item.glaze)) {
      throw new ProductionInputError('orders', `menu item ${item.menuItemId} uses unknown glaze "${item.glaze}"`);
    }
  });

  // Pieces to make.
  const sparePct = requireNonNegative('spare.percent', input.spare.percent);
  const ringsOrdered = items.filter((i) => i.kind === 'ring').reduce((s, i) => s + i.quantity, 0);
  const holesOrdered = items.filter((i) => i.kind === 'hole').reduce((s, i) => s + i.quantity, 0);
  const rings: PieceCounts = { ordered: ringsOrdered, spare: spareFor(ringsOrdered, sparePct, requireWholeNonNegative('spare.minimumRings', input.spare.minimumRings ?? 0)), toMake: 0 };
  const holes: PieceCounts = { ordered: holesOrdered, spare: spareFor(holesOrdered, sparePct, requireWholeNonNegative('spare.minimumHoles', input.spare.minimumHoles ?? 0)), toMake: 0 };
  rings.toMake = rings.ordered + rings.spare;
  holes.toMake = holes.ordered + holes.spare;
  const spareGlaze = input.spare.glazeId ?? null;
  if (spareGlaze !== null && !glazeIds.has(spareGlaze)) throw new ProductionInputError('spare.glazeId', `unknown glaze "${spareGlaze}"`);

  const measured = { ringGrams: eq.rolling.measuredRingGrams, holeGrams: eq.rolling.measuredHoleGrams };
  const mass = effectivePieceMass(
    { outerMm: eq.cutter.outerMm, innerMm: eq.cutter.innerMm, thicknessMm: eq.rolling.thicknessMm, densityGPerCm3: eq.rolling.doughDensityGPerCm3 },
    measured,
  );
  const pieces: PiecesSummary = {
    ...mass,
    pieceMassSource: {
      ring: measured.ringGrams !== undefined ? 'measured' : 'computed',
      hole: measured.holeGrams !== undefined ? 'measured' : 'computed',
    },
    rings,
    holes,
    byMenuItem: items,
    byGlaze: glazeNeeds(items, spareGlaze, { rings: rings.spare, holes: holes.spare }),
  };

  // Dough, formula, cuts.
  const rollSettings = { ...mass, scrapPercent: eq.rolling.scrapPercent, rerolls: eq.rolling.rerolls };
  const need = doughForPieces({ ...rollSettings, rings: rings.toMake, holes: holes.toMake });
  const dough = scaleFormula(input.formula, need.doughGrams);
  const rolled = rollAndCut({ ...rollSettings, doughGrams: need.doughGrams, ringsWanted: rings.toMake, extraHolesWanted: need.extraHoles });
  if (rolled.short.rings > 0 || rolled.short.holes > 0) {
    throw new Error('internal: the planned dough did not cut every piece'); // doughForPieces guarantees it
  }
  const firstRoll = rolled.rolls[0];
  const sheetLengthMm = firstRoll && firstRoll.doughGrams > 0
    ? (firstRoll.doughGrams * 1000) / (eq.rolling.doughDensityGPerCm3 * eq.rolling.thicknessMm * eq.rolling.widthMm)
    : 0;
  const ringsThatFit = sheetLengthMm > 0
    ? cutsFromSheet({ widthMm: eq.rolling.widthMm, lengthMm: sheetLengthMm, cutterMm: eq.cutter.outerMm, gapMm: eq.rolling.gapMm })
    : 0;
  const cuts: CutsPlan = {
    ...rolled,
    surplus: { rings: rolled.rings - rings.toMake, holes: rolled.holes - holes.toMake },
    firstRollSheet: { widthMm: eq.rolling.widthMm, lengthMm: sheetLengthMm, ringsThatFit },
  };

  // Fry.
  const doughTempC = eq.frying.doughTempC ?? roomTempC;
  const fatPerDozen = eq.frying.fatAbsorbedGramsPerDozen ?? FAT_ABSORBED_GRAMS_PER_DOZEN;
  const fry = planFry({
    potDiameterMm: eq.pot.diameterMm,
    oilDepthMm: eq.pot.oilDepthMm,
    oilStartC: eq.oil.startC,
    oilFloorC: eq.oil.floorC,
    doughTempC,
    puffFactor: eq.frying.puffFactor,
    turnClearanceMm: eq.frying.turnClearanceMm,
    oilSpecificHeatJPerGK: eq.oil.specificHeatJPerGK,
    doughSpecificHeatJPerGK: eq.frying.doughSpecificHeatJPerGK,
    oilDensityAt20C: eq.oil.densityAt20C,
    smokePointC: eq.oil.smokePointC,
    rings: { count: cuts.rings, grams: mass.ringGrams, diameterMm: eq.cutter.outerMm, secondsPerSide: eq.frying.ringSecondsPerSide },
    holes: { count: cuts.holes, grams: mass.holeGrams, diameterMm: eq.cutter.innerMm, secondsPerSide: eq.frying.holeSecondsPerSide },
    recoveryMinutes: eq.frying.recoveryMinutes,
    fatAbsorbedGramsPerDozen: fatPerDozen,
  });

  const glaze = glazeAmounts(input.glazes, pieces.byGlaze);

  // Schedule.
  const starterPeakHours = dough.starter?.build.feedHoursBeforeMix ?? 4;
  const schedule = buildSchedule({
    firstPickupStartsAt: input.firstPickupStartsAt,
    timeZone: input.timeZone,
    durationsMinutes: { ...input.schedule.durationsMinutes, fry: fry.minutes },
    roomTempC,
    bulkReferenceTempC: input.schedule.bulkReferenceTempC,
    cutoffMarginMinutes: input.schedule.cutoffMarginMinutes,
    now: input.now,
    lookFor: lookForTexts({
      oilStartC: eq.oil.startC,
      thicknessMm: eq.rolling.thicknessMm,
      rouxCookC: dough.roux?.cookToC ?? 65,
      fridgeMaxC: FRIDGE_MAX_C,
      starterPeakHours,
    }),
  });
  const minutesOf = (step: TimelineStep['step']) => schedule.timeline.find((s) => s.step === step)?.minutes ?? 0;
  const starter: StarterSheet | null = dough.starter
    ? {
        ...dough.starter,
        feedAt: schedule.timeline[0]?.startsAt ?? schedule.firstStepAt,
        hoursBeforeMix: (minutesOf('build-starter') + minutesOf('cook-cool-roux')) / 60,
      }
    : null;

  // Capacity (independent of tonight's orders).
  const ringBatchMinutes = (2 * eq.frying.ringSecondsPerSide) / 60 + eq.frying.recoveryMinutes;
  const capacity = capacityFromEquipment({
    fryWindowMinutes: eq.frying.windowMinutes,
    piecesPerBatch: fry.rings.perBatch,
    minutesPerBatch: ringBatchMinutes,
    proofingTrays: eq.proofing.trays,
    piecesPerTray: eq.proofing.ringsPerTray,
    mixerCapacityGrams: eq.mixer.capacityGrams,
    mixes: eq.mixer.mixes,
    doughGramsPerPiece: (mass.ringGrams + mass.holeGrams) / need.bestYield,
    fridgeDoughGrams: eq.fridge.doughGrams,
  });

  // Cost.
  const cutGrams = cuts.rings * mass.ringGrams + cuts.holes * mass.holeGrams;
  const cost = costBake({
    ingredients: dough.ingredients,
    doughGrams: dough.doughGrams,
    ringGrams: mass.ringGrams,
    holeGrams: mass.holeGrams,
    cutYield: need.doughGrams > 0 ? cutGrams / need.doughGrams : need.bestYield,
    fatAbsorbedGramsPerRing: fatPerDozen / 12,
    oilFillGrams: fry.oilGrams,
    friedGrams: cutGrams,
    glazes: input.glazes,
    prices: input.prices,
    boxes: input.boxes ?? [],
  });

  // Cautions and warnings.
  const glazesUsed = new Set(glaze.map((g) => g.glazeId));
  const allergens = distinctAllergens([
    rings.toMake + holes.toMake > 0 ? input.allergens.dough : [],
    ...items.filter((i) => i.quantity > 0).map((i) => input.allergens.byMenuItem?.[i.menuItemId]),
    ...input.glazes.filter((g) => glazesUsed.has(g.id)).map((g) => g.allergens),
  ]);
  const cautions = [...hotOilCautions(eq.oil.startC, eq.oil.floorC), allergenCaution(allergens), HOME_FOOD_RULES_CAUTION];

  const warnings = [...dough.warnings, ...fry.warnings, ...schedule.warnings];
  if (starter) {
    const { from, to } = starter.build.peakWindowHours;
    if (starter.hoursBeforeMix < from || starter.hoursBeforeMix > to) {
      warnings.push(`The starter is fed ${starter.hoursBeforeMix.toFixed(1)} h before the mix; it peaks about ${from}–${to} h after a feed. Adjust the starter or roux step.`);
    }
  }
  if (rings.toMake > capacity.pieces) {
    warnings.push(`Tonight's ${rings.toMake} rings are more than the equipment's capacity of ${capacity.pieces} (limited by ${capacity.limitedBy}).`);
  }
  if (fry.minutes > eq.frying.windowMinutes) {
    warnings.push(`Frying takes about ${Math.ceil(fry.minutes)} min, longer than the ${eq.frying.windowMinutes} min fry window.`);
  }
  if (firstRoll && firstRoll.rings > ringsThatFit && ringsThatFit > 0) {
    warnings.push(`Rolled ${eq.rolling.widthMm} mm wide, the first sheet fits about ${ringsThatFit} rings, not the ${firstRoll.rings} planned: cut closer together or expect more re-rolled dough.`);
  }
  if (cost.missingPrices.length > 0) warnings.push(`No price for: ${cost.missingPrices.join(', ')} (counted as free).`);

  return {
    pieces,
    dough,
    roux: dough.roux,
    starter,
    cuts,
    fry,
    glaze,
    timeline: schedule.timeline,
    firstStepAt: schedule.firstStepAt,
    preorderCutoffAt: schedule.preorderCutoffAt,
    bulkFermentationMinutes: schedule.bulkFermentationMinutes,
    capacity,
    cost,
    cautions,
    warnings,
  };
}
