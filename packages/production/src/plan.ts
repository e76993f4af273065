/**
 * planBake: from tonight's orders and the baker's settings to the whole
 * production sheet. Pure: every input, the current instant and the time zone
 * included, comes in as a parameter; instants go out as ISO-8601 strings.
 *
 * Order of work: pieces to make (orders + spare) for each dough → dough that
 * provably cuts them (so more orders never mean less dough) → mixes that fit
 * the bowl, each scaled with whole eggs, its own starter and roux → the
 * liquid temperature for the desired dough temperature → first roll and
 * re-rolls, sheet by sheet → the staged line: trays proofed in turn, fry
 * batches through the pot's heat balance, glazing behind the fryer, packing
 * → each mix's day-before steps worked back from when its dough is rolled →
 * capacity → cost → cautions and warnings.
 */
import { allergenCaution, distinctAllergens, HOME_FOOD_RULES_CAUTION, hotOilCautions } from './cautions.js';
import { capacityFromEquipment, type Capacity } from './capacity.js';
import { costBake, type BoxOffer, type CostPlan, type Prices } from './cost.js';
import { cutsFromSheet, leastDoughThatCuts, rollAndCut, sheetCutShare, sheetOfDough, type RollResult, type RollStep } from './cutting.js';
import { ProductionInputError, requireFinite, requireNonNegative, requirePositive, requireWholeNonNegative } from './errors.js';
import {
  eggEdibleGrams, scaleFormula, type EggClass, type EggCount, type Formula, type RouxPlan, type ScaledFormula, type StarterPlan,
} from './formula.js';
import { buildFryer, heatUpMinutes, oilWarnings, type Burner, type Fryer, type FryPlan, type FryTimetableEntry, type PotMaterial } from './fry.js';
import { glazeAmounts, type GlazeAmount, type GlazeNeed, type GlazeRecipe } from './glaze.js';
import { stageLine, type LineSheetInput, type StagedLine } from './line.js';
import { ADD_IN_STEP_WORDS, addInRatio, planMixes, validateVariations, type DoughShare, type DoughVariation, type MixPlan } from './mixes.js';
import { effectivePieceMass } from './pieces.js';
import { FRIDGE_MAX_C, lookForTexts, STEP_TITLES, YEAST_NO_GROWTH_C, YEAST_OPTIMUM_C, type ScheduleStep, type StepDurations } from './schedule.js';
import {
  DEFAULT_DOUGH_TEMPERATURE, driftingFermentationMinutes, fermentationMinutes, liquidTemperatureC,
  type DoughTemperatureSettings, type TemperatureFactor,
} from './temperature.js';
import { fiveMinuteMarkAtOrBefore, instantFormatter, parseInstant, readLocalTime, requireTimeZone } from './time.js';
import { tempInBothScales } from './units.js';
import { warning, type PlanWarning, type WarningCode } from './warnings.js';

export type PieceKind = 'ring' | 'hole';

/** Tonight's orders, summarised as counts by menu item (repeated ids are added up). */
export interface OrderLine {
  menuItemId: string;
  name: string;
  kind: PieceKind;
  /** Glaze recipe id, or null for plain. */
  glaze: string | null;
  quantity: number;
  /** Dough variation id (see `doughs`); absent or null for the base dough. */
  dough?: string | null;
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
  pot: {
    diameterMm: number;
    oilDepthMm: number;
    /** Inside height of the pot, for the freeboard check. */
    heightMm?: number;
    /** Empty pot; it heats and cools with the oil. */
    massGrams?: number;
    material?: PotMaterial;
  };
  oil: {
    startC: number;
    floorC: number;
    densityAt20C?: number;
    specificHeatJPerGK?: number;
    smokePointC?: number;
    /** Top up before the cold level falls below this. Default 40 mm. */
    minDepthMm?: number;
    /** Keep at least this between the hot oil (with a batch in) and the rim. Default 75 mm. */
    minFreeboardMm?: number;
  };
  /** The burner under the pot. Default 2.5 kW, 40 % of it reaching the oil. */
  burner?: Burner;
  cutter: { outerMm: number; innerMm: number };
  rolling: {
    thicknessMm: number;
    /** Width the dough is rolled to on the bench. */
    widthMm: number;
    /** Longest sheet the bench takes. Default 600 mm. */
    benchLengthMm?: number;
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
    /** Least minutes between batches (lift out, drain, load); the oil's own recovery is added when longer. */
    recoveryMinutes: number;
    /** Time the fryer is available on the bake day (for capacity). */
    windowMinutes: number;
    puffFactor?: number;
    turnClearanceMm?: number;
    doughSpecificHeatJPerGK?: number;
    /** @deprecated Ignored: fat taken up now follows the piece's weight (absorbedFatPercent). */
    fatAbsorbedGramsPerDozen?: number;
    /** Fat taken up, percent of the fried weight. Default 22 (15–25 published). */
    absorbedFatPercent?: number;
    /** Water lost in the fryer, percent of the dough. Default 10. */
    waterLossPercent?: number;
    /** Dough temperature going into the oil; default the proofing temperature. */
    doughTempC?: number;
  };
  proofing: {
    trays: number;
    /** The most rings the baker puts on a tray; a real layout on the tray size may allow fewer. */
    ringsPerTray: number;
    trayWidthMm?: number;
    trayLengthMm?: number;
    /** Room to grow between proofed pieces. Default 10 mm. */
    trayGapMm?: number;
  };
  mixer: {
    /** Dough the bowl takes in one mix. */
    capacityGrams: number;
    /** Mixes there is time for. */
    mixes: number;
  };
  fridge: { doughGrams: number };
}

/** The baker's own rates for the steps that grow with the quantity. */
export interface WorkRates {
  /** Rolling one sheet and cutting it. */
  rollMinutesPerSheet: number;
  /** Scraps pressed together rest this long before the re-roll. */
  rerollRestMinutes: number;
  glazeSecondsPerPiece: number;
  packSecondsPerBox: number;
}

export interface PlanScheduleSettings {
  /**
   * Minutes per step. Bulk fermentation, final proof and the starter's peak
   * are given at `bulkReferenceTempC` and scaled; mix and shape are per mix;
   * cold retard is the least time in the fridge; heat-oil is the least time
   * (the burner may need longer); roll-and-cut, glaze and pack are each
   * step's fixed set-up, on top of the rates. The fry step is computed.
   */
  durationsMinutes: Omit<StepDurations, 'fry'>;
  /** Temperature at which the fermentation times hold. */
  bulkReferenceTempC: number;
  cutoffMarginMinutes: number;
  rates?: WorkRates;
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
  /** Desired dough temperature and what goes into it. Default DDT 80 °F, stand-mixer friction. */
  doughTemperature?: DoughTemperatureSettings;
  /** Flavoured doughs the order lines can name. */
  doughs?: DoughVariation[];
  /** Eggs bought by this weight class. Default large. */
  eggClass?: EggClass;
  /** Boxes to pack tonight (default: a box per dozen rings and per 15 holes). */
  boxesToPack?: number;
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
  /** Share of a sheet's dough each cutter takes in a real layout (scrap allowance applied on top). */
  cutShare: { ring: number; hole: number };
}

export interface StarterSheet extends StarterPlan {
  feedAt: string;
  /** Hours from the feed to the mix, as scheduled. */
  hoursBeforeMix: number;
}

export interface DoughTemperaturePlan {
  targetC: number;
  frictionC: number;
  /** The temperatures counted besides the liquid's. */
  factors: TemperatureFactor[];
  /** The line whose temperature is set: free water, or the milk when the formula has no free water. */
  liquid: string;
  liquidTemperatureC: number;
}

export interface PlanDough extends ScaledFormula {
  /** Temperature to bring the liquid to, so the dough comes out of the mixer at the desired temperature. */
  liquidTemperatureC: number;
  temperature: DoughTemperaturePlan;
}

export interface MixSchedule extends MixPlan {
  feedStarterAt: string | null;
  cookRouxAt: string | null;
  mixAt: string;
  bulkFrom: string;
  bulkUntil: string;
  shapeAt: string;
  retardFrom: string;
  retardUntil: string;
  /** Its dough's first sheet goes on the bench. */
  rollAt: string;
  /** Its pieces' frying window. */
  fryFrom: string;
  fryUntil: string;
}

export interface VariationPlan {
  id: string | null;
  name: string;
  rings: number;
  holes: number;
  /** Dough for this flavour, add-ins included. */
  doughGrams: number;
  addIns: Array<{ name: string; grams: number }>;
  addAt: string | null;
  /** Its own formula, or the base dough. */
  ownFormula: boolean;
}

export interface LineTrayPlan {
  tray: number;
  kind: PieceKind;
  dough: string | null;
  pieces: number;
  sheet: number;
  cutAt: string;
  proofFrom: string;
  fryAt: string;
}

export interface LineSheetPlan {
  sheet: number;
  dough: string | null;
  mix: number | null;
  roll: number;
  doughGrams: number;
  rings: number;
  holes: number;
  from: string;
  until: string;
}

export interface LinePlan {
  piecesPerTray: { ring: number; hole: number };
  trays: LineTrayPlan[];
  sheets: LineSheetPlan[];
  /** Most trays proofing at once. */
  traysInUse: number;
  proofMinutes: number;
  glazeFrom: string;
  glazeUntil: string;
  packFrom: string;
  packUntil: string;
}

export interface TimelineEntry {
  step: ScheduleStep;
  title: string;
  startsAt: string;
  endsAt: string;
  /** Whole minutes, rounded up. */
  minutes: number;
  lookFor: string;
  /** The mix this step belongs to (several mixes); absent for the bake day's line. */
  mix?: number;
}

export interface Shopping {
  eggClass: EggClass;
  /** Whole eggs in the shell, all mixes. */
  eggs: number;
  /** Oil for a fresh fill and tonight's top-ups. */
  oilFreshGrams: number;
  /** Oil for the top-ups alone (oil kept from the last bake). */
  oilTopUpGrams: number;
}

export interface BakePlan {
  pieces: PiecesSummary;
  dough: PlanDough;
  roux: RouxPlan | null;
  starter: StarterSheet | null;
  mixes: MixSchedule[];
  variations: VariationPlan[];
  cuts: CutsPlan;
  fry: FryPlan;
  line: LinePlan;
  glaze: GlazeAmount[];
  timeline: TimelineEntry[];
  firstStepAt: string;
  preorderCutoffAt: string;
  bulkFermentationMinutes: number;
  finalProofMinutes: number;
  starterPeakHours: number | null;
  shopping: Shopping;
  capacity: Capacity;
  cost: CostPlan;
  /** Safety and legal cautions (hot oil, allergens, home-food rules). */
  cautions: string[];
  /** Planning warnings; none for a common bake. */
  warnings: PlanWarning[];
}

// Order lines often arrive with a shape of their own each (built by spreading a menu item, say): plain
// property reads then miss V8's inline caches on every line, and a missing `dough` is the slowest read of
// all. Reflect.get looks each field up directly, several times faster on such lines; each field is read once.
const field = Reflect.get as (o: object, key: string) => unknown;

function summariseOrders(orders: OrderLine[]): OrderLine[] {
  if (!Array.isArray(orders)) throw new ProductionInputError('orders', 'must be a list');
  const byId = new Map<string, OrderLine>();
  for (let i = 0; i < orders.length; i++) {
    const o = orders[i]!;
    // Field names are built only on failure: this loop runs once per order line.
    if (!o || typeof o !== 'object') throw new ProductionInputError(`orders[${i}]`, 'must be an order line');
    const menuItemId = field(o, 'menuItemId') as OrderLine['menuItemId'];
    const kind = field(o, 'kind') as OrderLine['kind'];
    const glaze = field(o, 'glaze') as OrderLine['glaze'];
    const quantity = field(o, 'quantity') as OrderLine['quantity'];
    const dough = (field(o, 'dough') as OrderLine['dough']) ?? null;
    if (typeof menuItemId !== 'string' || menuItemId === '') throw new ProductionInputError(`orders[${i}].menuItemId`, 'is required');
    if (kind !== 'ring' && kind !== 'hole') throw new ProductionInputError(`orders[${i}].kind`, 'must be ring or hole');
    if (glaze !== null && typeof glaze !== 'string') throw new ProductionInputError(`orders[${i}].glaze`, 'must be a glaze id or null');
    if (!Number.isInteger(quantity) || quantity < 0) requireWholeNonNegative(`orders[${i}].quantity`, quantity);
    const seen = byId.get(menuItemId);
    if (!seen) {
      byId.set(menuItemId, { menuItemId, name: field(o, 'name') as OrderLine['name'], kind, glaze, quantity, dough });
    } else if (seen.kind !== kind || seen.glaze !== glaze || seen.dough !== dough) {
      throw new ProductionInputError(`orders[${i}]`, `menu item ${menuItemId} appears with a different kind, glaze or dough`);
    } else {
      seen.quantity += quantity;
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

/** Defaults for the settings added after the first production sheet; stored settings without them still plan. */
export const DEFAULT_RATES: WorkRates = Object.freeze({ rollMinutesPerSheet: 12, rerollRestMinutes: 10, glazeSecondsPerPiece: 8, packSecondsPerBox: 40 });
export const DEFAULT_BURNER: Burner = Object.freeze({ watts: 2500, efficiencyPercent: 40 });
export const DEFAULT_POT_BODY = Object.freeze({ heightMm: 170, massGrams: 4500, material: 'cast-iron' as PotMaterial });
export const DEFAULT_TRAY = Object.freeze({ trayWidthMm: 330, trayLengthMm: 460, trayGapMm: 10 });
export const DEFAULT_BENCH_LENGTH_MM = 600;
/** When the add-ins' share of a mix changes the dough by more than this, say so. */
export const EGG_SHIFT_WARN_PERCENT = 2;
/** Hottest liquid the sheet asks for without a warning. */
export const LIQUID_MAX_C = 45;

/** Order of the steps that start at the same minute. */
const STEP_ORDER: Record<ScheduleStep, number> = {
  'build-starter': 0, 'cook-cool-roux': 1, mix: 2, 'bulk-fermentation': 3, 'shape-and-chill': 4, 'cold-retard': 5,
  'heat-oil': 6, 'roll-and-cut': 7, 'final-proof': 8, fry: 9, cool: 10, glaze: 11, pack: 12,
};

interface Lot {
  dough: string | null;
  rings: number;
  holes: number;
  /** Glaze queue per kind, in the order the pieces are glazed. */
  queue: Record<PieceKind, Array<{ glazeId: string | null; left: number }>>;
}

function keyOf(dough: string | null): string {
  return dough ?? '';
}

/** Integer shares of `total` in proportion to `weights` (largest remainders, in order). */
function apportion(total: number, weights: number[]): number[] {
  const sum = weights.reduce((s, w) => s + w, 0);
  if (sum <= 0 || total === 0) return weights.map(() => 0);
  const exact = weights.map((w) => (total * w) / sum);
  const out = exact.map((x) => Math.floor(x + 1e-9));
  let left = total - out.reduce((s, x) => s + x, 0);
  const order = exact.map((x, i) => [x - Math.floor(x + 1e-9), i] as const).sort((a, b) => b[0] - a[0] || a[1] - b[1]);
  for (let k = 0; left > 0 && k < order.length; k++, left--) out[order[k]![1]]! += 1;
  return out;
}

export function planBake(input: PlanBakeInput): BakePlan {
  requireParts(input);
  const { equipment: eq } = input;
  const zone = requireTimeZone('timeZone', input.timeZone);
  const roomTempC = requireFinite('roomTempC', input.roomTempC);
  const items = summariseOrders(input.orders);
  const variations = validateVariations(input.doughs);
  const glazeIds = new Set(input.glazes.map((g) => g.id));
  items.forEach((item) => {
    if (item.glaze !== null && !glazeIds.has(item.glaze)) {
      throw new ProductionInputError('orders', `menu item ${item.menuItemId} uses unknown glaze "${item.glaze}"`);
    }
    if (item.dough && !variations.has(item.dough)) {
      throw new ProductionInputError('orders', `menu item ${item.menuItemId} names unknown dough "${item.dough}"`);
    }
  });
  const warnings: PlanWarning[] = [];
  const warn = (code: WarningCode, message: string) => warnings.push(warning(code, message));

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

  // Lots: one per dough, pieces kept apart so each flavour's glazes land on its own pieces.
  const lots = new Map<string, Lot>();
  const lotOf = (dough: string | null): Lot => {
    let lot = lots.get(keyOf(dough));
    if (!lot) {
      lot = { dough, rings: 0, holes: 0, queue: { ring: [], hole: [] } };
      lots.set(keyOf(dough), lot);
    }
    return lot;
  };
  lotOf(null);
  for (const v of variations.values()) if (items.some((i) => i.dough === v.id && i.quantity > 0)) lotOf(v.id);
  for (const item of items) {
    if (item.quantity === 0) continue;
    const lot = lotOf(item.dough ?? null);
    if (item.kind === 'ring') lot.rings += item.quantity;
    else lot.holes += item.quantity;
    lot.queue[item.kind].push({ glazeId: item.glaze, left: item.quantity });
  }
  const baseLot = lotOf(null);
  baseLot.rings += rings.spare;
  baseLot.holes += holes.spare;
  if (rings.spare > 0) baseLot.queue.ring.push({ glazeId: spareGlaze, left: rings.spare });
  if (holes.spare > 0) baseLot.queue.hole.push({ glazeId: spareGlaze, left: holes.spare });

  // Cut shares from real layouts on the bench sheet; the scrap allowance applies on top.
  const benchLengthMm = requirePositive('rolling.benchLengthMm', eq.rolling.benchLengthMm ?? DEFAULT_BENCH_LENGTH_MM);
  const bench = (cutterMm: number) => ({ widthMm: eq.rolling.widthMm, lengthMm: benchLengthMm, cutterMm, gapMm: eq.rolling.gapMm });
  const keep = 1 - eq.rolling.scrapPercent / 100;
  const ringShareRaw = sheetCutShare(bench(eq.cutter.outerMm));
  const holeShareRaw = eq.cutter.innerMm > 0 ? sheetCutShare(bench(eq.cutter.innerMm)) : keep;
  if (ringShareRaw === 0) {
    warn('cutter_wider_than_sheet', `The ${Math.round(eq.cutter.outerMm)} mm cutter does not fit on a sheet rolled ${Math.round(eq.rolling.widthMm)} mm wide: no ring can be cut. Roll wider or use a smaller cutter; the plan below assumes the usual ${Math.round(keep * 100)} % cut.`);
  }
  const cutShare = { ring: ringShareRaw > 0 ? Math.min(keep, ringShareRaw) : keep, hole: holeShareRaw > 0 ? Math.min(keep, holeShareRaw) : keep };
  const firstSheet = { rolling: eq.rolling, cutterMm: eq.cutter.outerMm };
  const rollSettings = { ...mass, scrapPercent: eq.rolling.scrapPercent, rerolls: eq.rolling.rerolls, ringCutShare: Math.max(0.05, cutShare.ring), holeCutShare: Math.max(0.05, cutShare.hole) };

  // Dough each lot needs, and its cuts.
  const lotList = [...lots.values()];
  const lotCuts = lotList.map((lot) => {
    // The first sheet may fit fewer rings than the cut share gives (a short sheet loses more at its ends):
    // then more dough goes to the re-rolls. The least dough on a fixed grid that cuts every piece.
    const { need, rolled } = leastDoughThatCuts({ ...rollSettings, rings: lot.rings, holes: lot.holes, firstSheet });
    // Rings the cut share alone would have planned on the first roll, to say when the sheet held some back.
    const shareFirstRings = rollAndCut({ ...rollSettings, doughGrams: need.doughGrams, ringsWanted: lot.rings, extraHolesWanted: need.extraHoles }).rolls[0]?.rings ?? 0;
    return { lot, need, rolled, heldBack: shareFirstRings > (rolled.rolls[0]?.rings ?? 0) };
  });
  const baseCut = lotCuts[0]!;

  // Mixes: each formula split to fit the bowl; add-in flavours take their share of the base dough.
  const eggClass = input.eggClass ?? 'large';
  const gramsPerEgg = eggEdibleGrams(eggClass);
  const shareOf = (c: (typeof lotCuts)[number]): DoughShare => {
    const v = c.lot.dough ? variations.get(c.lot.dough) : undefined;
    return { dough: c.lot.dough, name: v?.name ?? 'Plain dough', grams: c.need.doughGrams, addIns: v?.formula ? [] : v?.addIns ?? [], addAt: v?.addIns?.length ? v.addAt ?? 'after-mix' : null };
  };
  const baseShares = lotCuts.filter((c) => !(c.lot.dough && variations.get(c.lot.dough)?.formula)).map(shareOf);
  const ownGroups = lotCuts.filter((c) => c.lot.dough && variations.get(c.lot.dough)?.formula)
    .map((c) => ({ formulaOf: c.lot.dough, formula: variations.get(c.lot.dough!)!.formula!, shares: [shareOf(c)] }));
  const mixPlans = planMixes([{ formulaOf: null, formula: input.formula, shares: baseShares }, ...ownGroups], eq.mixer.capacityGrams, gramsPerEgg);
  const baseDoughGrams = mixPlans.filter((m) => m.formulaOf === null).reduce((s, m) => s + m.doughGrams, 0);
  const scaled = scaleFormula(input.formula, baseDoughGrams);
  const baseMixes = mixPlans.filter((m) => m.formulaOf === null);
  const eggs: EggCount | null = scaled.eggs
    ? (() => {
        const count = baseMixes.reduce((s, m) => s + (m.eggs?.count ?? 0), 0);
        const massChangeGrams = count * gramsPerEgg - scaled.eggs.grams;
        return {
          ...scaled.eggs,
          count,
          gramsPerEgg,
          rule: `whole ${eggClass} eggs (about ${Math.round(gramsPerEgg)} g without the shell), rounded for each mix; or weigh ${Math.round(scaled.eggs.grams)} g of beaten egg`,
          massChangeGrams,
          doughGramsWithWholeEggs: baseDoughGrams + massChangeGrams,
        };
      })()
    : null;
  for (const m of mixPlans) {
    if (m.eggs && m.doughGrams > 0 && Math.abs(m.eggs.massChangeGrams) / m.doughGrams > EGG_SHIFT_WARN_PERCENT / 100) {
      warn('egg_rounding_shift', `Mix ${m.mix}: ${m.eggs.count} whole egg${m.eggs.count === 1 ? '' : 's'} instead of ${Math.round(m.eggs.grams)} g changes the dough by ${m.eggs.massChangeGrams > 0 ? '+' : ''}${Math.round(m.eggs.massChangeGrams)} g (${(Math.abs(m.eggs.massChangeGrams) / m.doughGrams * 100).toFixed(1)} %): weigh ${Math.round(m.eggs.grams)} g of beaten egg instead.`);
      break;
    }
  }
  const mixesByFormula = new Map<string, number>();
  for (const m of mixPlans) mixesByFormula.set(keyOf(m.formulaOf), (mixesByFormula.get(keyOf(m.formulaOf)) ?? 0) + 1);
  if (mixPlans.length > eq.mixer.mixes) {
    const total = mixPlans.reduce((s, m) => s + m.doughGrams, 0);
    warn('bowl_too_small', `Tonight's ${(total / 1000).toFixed(1)} kg of dough needs ${mixPlans.length} mixes in the ${(eq.mixer.capacityGrams / 1000).toFixed(1)} kg bowl, more than the ${eq.mixer.mixes} there is time for: the plan schedules all ${mixPlans.length}, one after another. Check the times below or take fewer orders.`);
  }

  // Desired dough temperature → the liquid's temperature.
  const dt = { ...DEFAULT_DOUGH_TEMPERATURE, ...input.doughTemperature };
  const targetC = requireFinite('doughTemperature.targetC', dt.targetC);
  const factors: TemperatureFactor[] = [
    { name: 'Room', tempC: roomTempC },
    { name: 'Flour', tempC: dt.flourC ?? roomTempC },
  ];
  if (scaled.starter) factors.push({ name: 'Starter', tempC: dt.starterC ?? roomTempC });
  if (scaled.roux) factors.push({ name: 'Milk roux', tempC: dt.rouxC ?? roomTempC });
  const liquidC = liquidTemperatureC({ targetC, frictionC: dt.frictionC, factors });
  const freeWater = scaled.finalDough.find((r) => r.kind === 'water' && r.grams > 1e-6);
  const liquidLine = freeWater ?? scaled.finalDough.find((r) => r.kind === 'milk' && r.grams > 1e-6);
  const liquidName = liquidLine?.name ?? 'Water';
  // Common practice, no source: liquid much above about 45 °C (113 °F) stresses the starter's yeast; below 2 °C it would have to be iced.
  if (baseDoughGrams > 0 && (liquidC > LIQUID_MAX_C || liquidC < 2)) {
    warn('liquid_temperature_out_of_range', liquidC > LIQUID_MAX_C
      ? `To reach ${tempInBothScales(targetC)} the ${liquidName.toLowerCase()} would have to be ${tempInBothScales(liquidC)}, hot enough to harm the starter: use the roux still warm, warm the flour, or aim a little lower.`
      : `To reach ${tempInBothScales(targetC)} the ${liquidName.toLowerCase()} would have to be ${tempInBothScales(liquidC)}, colder than a fridge gives: use chilled flour or ice, or aim a little higher.`);
  }
  const dough: PlanDough = {
    ...scaled,
    eggs,
    liquidTemperatureC: liquidC,
    temperature: { targetC, frictionC: dt.frictionC, factors, liquid: liquidName, liquidTemperatureC: liquidC },
  };
  scaled.warnings.forEach((w) => warn('formula_outside_usual_range', w));

  // Fermentation times from the dough's own temperature.
  const durations = input.schedule.durationsMinutes;
  for (const step of Object.keys(durations) as Array<keyof typeof durations>) requireNonNegative(`schedule.durationsMinutes.${step}`, durations[step]);
  const refC = requireFinite('schedule.bulkReferenceTempC', input.schedule.bulkReferenceTempC);
  const proofC = dt.proofC ?? roomTempC;
  const bulkMinutes = driftingFermentationMinutes({ referenceMinutes: durations['bulk-fermentation'], referenceTempC: refC, startC: targetC, surroundC: roomTempC, settleMinutes: dt.bulkSettleMinutes });
  const proofMinutes = driftingFermentationMinutes({ referenceMinutes: durations['final-proof'], referenceTempC: refC, startC: FRIDGE_MAX_C, surroundC: proofC, settleMinutes: dt.proofSettleMinutes });
  const peakHoursRef = input.formula.starterFeed?.peakHours ?? 4;
  const starterPeakMinutes = scaled.starter ? fermentationMinutes(peakHoursRef * 60, refC, dt.starterC ?? roomTempC) : 0;
  if (roomTempC < YEAST_NO_GROWTH_C) {
    warn('room_too_cold', `Room at ${tempInBothScales(roomTempC)}: yeast barely grows below about ${tempInBothScales(YEAST_NO_GROWTH_C)}, so the bulk time cannot be trusted.`);
  } else if (roomTempC > YEAST_OPTIMUM_C) {
    warn('room_too_warm', `Room at ${tempInBothScales(roomTempC)} is above the yeast's optimum (about ${tempInBothScales(YEAST_OPTIMUM_C)}): the bulk time is a rough guess and the dough sours fast.`);
  }

  // The pot.
  const doughInOilC = eq.frying.doughTempC ?? proofC;
  const fryBuilt = buildFryer({
    potDiameterMm: eq.pot.diameterMm,
    oilDepthMm: eq.pot.oilDepthMm,
    oilStartC: eq.oil.startC,
    oilFloorC: eq.oil.floorC,
    doughTempC: doughInOilC,
    puffFactor: eq.frying.puffFactor,
    turnClearanceMm: eq.frying.turnClearanceMm,
    oilSpecificHeatJPerGK: eq.oil.specificHeatJPerGK,
    doughSpecificHeatJPerGK: eq.frying.doughSpecificHeatJPerGK,
    oilDensityAt20C: eq.oil.densityAt20C,
    smokePointC: eq.oil.smokePointC,
    pot: { massGrams: eq.pot.massGrams ?? DEFAULT_POT_BODY.massGrams, material: eq.pot.material ?? DEFAULT_POT_BODY.material },
    burner: eq.burner ?? DEFAULT_BURNER,
    potHeightMm: eq.pot.heightMm ?? DEFAULT_POT_BODY.heightMm,
    minFreeboardMm: eq.oil.minFreeboardMm,
    minOilDepthMm: eq.oil.minDepthMm,
    kitchenC: roomTempC,
    absorbedFatPercent: eq.frying.absorbedFatPercent,
    waterLossPercent: eq.frying.waterLossPercent,
    rings: { count: 0, grams: mass.ringGrams, diameterMm: eq.cutter.outerMm, secondsPerSide: eq.frying.ringSecondsPerSide },
    holes: { count: 0, grams: mass.holeGrams, diameterMm: eq.cutter.innerMm, secondsPerSide: eq.frying.holeSecondsPerSide },
    recoveryMinutes: eq.frying.recoveryMinutes,
  });
  const { fryer } = fryBuilt;
  if (fryBuilt.ringSize.byHeat === 0 || (fryBuilt.holeSize && fryBuilt.holeSize.byHeat === 0)) {
    warn('one_piece_cools_oil', 'Even one piece cools this oil below the lowest frying temperature: use more oil, a wider pot, a stronger burner or smaller pieces.');
  }
  oilWarnings({ oilStartC: eq.oil.startC, smokePointC: eq.oil.smokePointC, oilDepthMm: eq.pot.oilDepthMm }, fryBuilt.oil).forEach((w) => warnings.push(w));

  // Sheets: each mix's share of a dough rolled on its own, then the dough's scraps re-rolled.
  const sheetMaxGrams = (eq.rolling.widthMm * benchLengthMm * eq.rolling.thicknessMm * eq.rolling.doughDensityGPerCm3) / 1000;
  const withCentres = mass.holeGrams > 0;
  const sheetsIn: LineSheetInput[] = [];
  const mixSheetIndex = new Map<number, number[]>();
  // Every dough's first roll, then the re-rolls: a dough's scraps rest while the next dough is rolled.
  const byRoll: LineSheetInput[][] = [];
  for (const c of lotCuts) {
    const portions = mixPlans.flatMap((m) => m.portions.filter((p) => p.dough === c.lot.dough).map((p) => ({ mix: m.mix, grams: p.baseGrams + p.addIns.reduce((s, a) => s + a.grams, 0) })));
    c.rolled.rolls.forEach((r: RollStep) => {
      if (r.doughGrams <= 0 || r.rings + r.extraHoles === 0) return;
      const parts = r.roll === 1 && portions.length > 0
        ? portions.flatMap((p) => {
            const n = Math.max(1, Math.ceil(p.grams / sheetMaxGrams - 1e-9));
            return Array.from({ length: n }, () => ({ mix: p.mix as number | null, grams: p.grams / n }));
          })
        : (() => {
            const n = Math.max(1, Math.ceil(r.doughGrams / sheetMaxGrams - 1e-9));
            return Array.from({ length: n }, () => ({ mix: null as number | null, grams: r.doughGrams / n }));
          })();
      const weights = parts.map((p) => p.grams);
      const ringSplit = apportion(r.rings, weights);
      const holeSplit = apportion(r.extraHoles, weights);
      parts.forEach((p, i) => {
        const ringsHere = ringSplit[i]!;
        const extra = holeSplit[i]!;
        if (ringsHere + extra === 0) return;
        (byRoll[r.roll - 1] ??= []).push({ dough: c.lot.dough, mix: p.mix, roll: r.roll, doughGrams: p.grams, rings: ringsHere, holes: (withCentres ? ringsHere : 0) + extra });
      });
    });
  }
  for (const sheet of byRoll.flat()) {
    if (sheet.mix !== null) {
      const list = mixSheetIndex.get(sheet.mix);
      if (list) list.push(sheetsIn.length);
      else mixSheetIndex.set(sheet.mix, [sheetsIn.length]);
    }
    sheetsIn.push(sheet);
  }

  // Pieces per tray from the tray and the proofed piece's footprint.
  const puff = eq.frying.puffFactor ?? 1.25;
  const trayW = eq.proofing.trayWidthMm;
  const trayL = eq.proofing.trayLengthMm;
  const trayGap = eq.proofing.trayGapMm ?? DEFAULT_TRAY.trayGapMm;
  const perTray = (d: number) => (trayW && trayL ? cutsFromSheet({ widthMm: trayW, lengthMm: trayL, cutterMm: d * puff, gapMm: trayGap }) : 0);
  // The owner's rings per tray is the most they put on one; the tray's real layout can only lower it.
  const ownerRings = requireWholeNonNegative('proofing.ringsPerTray', eq.proofing.ringsPerTray);
  const ringsPerTray = Math.max(1, trayW && trayL ? Math.min(ownerRings, perTray(eq.cutter.outerMm)) : ownerRings);
  const holesPerTray = eq.cutter.innerMm > 0
    ? Math.max(1, trayW && trayL ? perTray(eq.cutter.innerMm) : Math.floor(ringsPerTray * ((eq.cutter.outerMm * puff + trayGap) / (eq.cutter.innerMm * puff + trayGap)) ** 2))
    : 1;

  // The staged line.
  const rates = { ...DEFAULT_RATES, ...input.schedule.rates };
  requirePositive('schedule.rates.rollMinutesPerSheet', rates.rollMinutesPerSheet);
  requireNonNegative('schedule.rates.rerollRestMinutes', rates.rerollRestMinutes);
  requireNonNegative('schedule.rates.glazeSecondsPerPiece', rates.glazeSecondsPerPiece);
  requireNonNegative('schedule.rates.packSecondsPerBox', rates.packSecondsPerBox);
  const boxes = input.boxesToPack !== undefined ? requireWholeNonNegative('boxesToPack', input.boxesToPack) : Math.ceil(rings.ordered / 12) + Math.ceil(holes.ordered / 15);
  const glazeQueues = new Map(lotList.map((l) => [keyOf(l.dough), { ring: l.queue.ring.map((q) => ({ ...q })), hole: l.queue.hole.map((q) => ({ ...q })) }]));
  const batchGlazes: Array<Array<{ glazeId: string | null; pieces: number }>> = [];
  const line: StagedLine = stageLine(sheetsIn, {
    rollMinutesPerSheet: rates.rollMinutesPerSheet,
    rerollRestMinutes: rates.rerollRestMinutes,
    proofMinutes,
    trays: requireWholeNonNegative('proofing.trays', eq.proofing.trays),
    ringsPerTray,
    holesPerTray,
    coolMinutes: durations.cool,
    glazeSecondsPerPiece: rates.glazeSecondsPerPiece,
    packSecondsPerBox: rates.packSecondsPerBox,
    boxes,
  }, fryer, (index, kind, doughId, count) => {
    const queue = glazeQueues.get(keyOf(doughId))![kind];
    const head = queue[0];
    const previous = batchGlazes[index - 1];
    // Most batches repeat the last one's split: share that (read-only) list rather than build thousands.
    if (head && head.left > count && previous && previous.length === 1 && previous[0]!.glazeId === head.glazeId && previous[0]!.pieces === count) {
      head.left -= count;
      batchGlazes[index] = previous;
      return head.glazeId !== null ? count : 0;
    }
    const split: Array<{ glazeId: string | null; pieces: number }> = [];
    let left = count;
    while (left > 0 && queue.length > 0) {
      const first = queue[0]!;
      const take = Math.min(left, first.left);
      const last = split.at(-1);
      if (last && last.glazeId === first.glazeId) last.pieces += take;
      else split.push({ glazeId: first.glazeId, pieces: take });
      first.left -= take;
      left -= take;
      if (first.left === 0) queue.shift();
    }
    if (left > 0) split.push({ glazeId: null, pieces: left }); // surplus, left plain
    batchGlazes[index] = split;
    return split.reduce((s, g) => s + (g.glazeId !== null ? g.pieces : 0), 0);
  });

  // Anchor the line: packing ends as the first pickup starts.
  const pickup = readLocalTime(input.firstPickupStartsAt, zone);
  if (pickup.reading === 'nonexistent') {
    warn('nonexistent_local_time', `The first pickup time ${input.firstPickupStartsAt} does not exist in ${zone} (the clocks skip that hour that night); it is read as ${instantFormatter(zone)(pickup.millis)}. Set a time outside the skipped hour.`);
  } else if (pickup.reading === 'ambiguous') {
    const fmt = instantFormatter(zone);
    warn('ambiguous_local_time', `The first pickup time ${input.firstPickupStartsAt} happens twice in ${zone} (the clocks go back that night); it is read as the first, ${fmt(pickup.millis)}, not ${fmt(pickup.alternativeMillis ?? pickup.millis)}. Give the offset to choose.`);
  }
  const pickupMs = pickup.millis;
  const MIN = 60_000;
  const packSetup = durations.pack;
  const rollSetup = durations['roll-and-cut'];
  const B = line.batches;
  const hasPieces = B.count > 0;
  const heatMinutes = Math.max(durations['heat-oil'], heatUpMinutes(fryer));
  const lineEndRel = hasPieces ? line.packUntil + packSetup : 0;
  // The sheet reads to the minute: every line time is rounded to a whole minute. The whole line then
  // moves earlier (by under five minutes) so that frying starts on a five-minute mark; the batches keep
  // their exact minutes from there, and packing still runs to the first pickup.
  const lineMs = (rel: number) => Math.round((pickupMs + (rel - lineEndRel) * MIN) / MIN) * MIN;
  const lineShift = hasPieces ? lineMs(line.fryFrom) - fiveMinuteMarkAtOrBefore(lineMs(line.fryFrom)) : 0;
  const abs = (rel: number) => lineMs(rel) - lineShift;
  const fmt = instantFormatter(zone);
  const at = (rel: number) => fmt(abs(rel));

  const timetable: FryTimetableEntry[] = new Array(B.count);
  for (let i = 0; i < B.count; i++) {
    const tray = line.trays[B.tray[i]! - 1]!;
    timetable[i] = {
      batch: i + 1,
      at: at(B.at[i]!),
      pieces: B.pieces[i]!,
      waitForC: fryer.startC,
      kind: B.kind[i] === 0 ? 'ring' : 'hole',
      dough: tray.dough,
      tray: tray.tray,
      lowestC: B.lowestC[i]!,
      recoveryMinutes: B.recoveryMinutes[i]!,
      topUpGramsBefore: B.topUpGramsBefore[i]!,
      glazes: batchGlazes[i] ?? [],
    };
  }

  // Each mix worked back from when its dough is first rolled.
  const lineStartRel = line.sheets[0] ? line.sheets[0].from - rollSetup : 0;
  const mixMinutes = durations.mix;
  const shapeMinutes = durations['shape-and-chill'];
  const retardMin = durations['cold-retard'];
  const rouxMinutes = durations['cook-cool-roux'];
  const rollAtMs = mixPlans.map((m) => {
    const idx = mixSheetIndex.get(m.mix);
    const rel = idx && idx.length > 0 ? idx.reduce((m, i) => Math.min(m, line.sheets[i]!.from), Infinity) : lineStartRel;
    return abs(rel);
  });
  const mixStart: number[] = mixPlans.map((_, k) => rollAtMs[k]! - (retardMin + shapeMinutes + bulkMinutes + mixMinutes) * MIN);
  for (let k = mixPlans.length - 2; k >= 0; k--) mixStart[k] = Math.min(mixStart[k]!, mixStart[k + 1]! - mixMinutes * MIN);
  // Each mix's frying window, from the batches of the trays its dough filled (one pass over the batches).
  const trayMix = line.trays.map((t) => t.mix);
  const windows = new Map<number, { from: number; until: number }>();
  for (let i = 0; i < B.count; i++) {
    const mixNo = trayMix[B.tray[i]! - 1];
    if (mixNo === null || mixNo === undefined) continue;
    const until = B.at[i]! + B.fryMinutes[i]!;
    const w = windows.get(mixNo);
    if (!w) windows.set(mixNo, { from: B.at[i]!, until });
    else w.until = until;
  }
  const fryWindowOf = (mixNo: number) => windows.get(mixNo) ?? { from: line.fryFrom, until: line.fryUntil };
  // Each mix's instants, to the minute, once; the mix list and the timeline both read them.
  // Every step starts on a five-minute mark, the way a baker plans: worked back from when each mix is first
  // rolled, each start moves earlier to a mark (never later), so each step keeps at least its own minutes and
  // the cut-off only moves earlier. A mix that would still be in the bowl when the next one starts moves
  // earlier as a whole (its cold retard grows), as the unrounded plan does.
  const toMinute = (ms: number) => Math.round(ms / MIN) * MIN;
  const mark = fiveMinuteMarkAtOrBefore;
  const mixTimes = new Array<{ feed: number; roux: number; start: number; bulkFrom: number; bulkUntil: number; retardFrom: number; roll: number; window: { from: number; until: number } }>(mixPlans.length);
  for (let k = mixPlans.length - 1; k >= 0; k--) {
    const start0 = toMinute(mixStart[k]!);
    const bulkFrom0 = start0 + Math.round(mixMinutes) * MIN;
    const bulkUntil0 = toMinute(bulkFrom0 + bulkMinutes * MIN);
    let retardFrom = mark(bulkUntil0 + Math.round(shapeMinutes) * MIN);
    let bulkUntil = mark(retardFrom - Math.round(shapeMinutes) * MIN);
    let bulkFrom = mark(bulkUntil - (bulkUntil0 - bulkFrom0));
    let start = mark(bulkFrom - Math.round(mixMinutes) * MIN);
    const next = mixTimes[k + 1];
    const overlap = next ? Math.max(0, bulkFrom - next.start) : 0; // both on marks: a whole number of marks
    start -= overlap;
    bulkFrom -= overlap;
    bulkUntil -= overlap;
    retardFrom -= overlap;
    mixTimes[k] = { feed: mark(start - starterPeakMinutes * MIN), roux: mark(start - Math.round(rouxMinutes) * MIN), start, bulkFrom, bulkUntil, retardFrom, roll: rollAtMs[k]!, window: fryWindowOf(mixPlans[k]!.mix) };
  }
  const mixes: MixSchedule[] = mixPlans.map((m, k) => {
    const t = mixTimes[k]!;
    // Fields copied one by one: spreading each mix into a wider object took V8's slow path, ten times the cost.
    return {
      mix: m.mix, formulaOf: m.formulaOf, doughGrams: m.doughGrams, ingredients: m.ingredients, eggs: m.eggs, starter: m.starter, roux: m.roux, portions: m.portions,
      feedStarterAt: m.starter ? fmt(t.feed) : null,
      cookRouxAt: m.roux ? fmt(t.roux) : null,
      mixAt: fmt(t.start),
      bulkFrom: fmt(t.bulkFrom),
      bulkUntil: fmt(t.bulkUntil),
      shapeAt: fmt(t.bulkUntil),
      retardFrom: fmt(t.retardFrom),
      retardUntil: fmt(t.roll),
      rollAt: fmt(t.roll),
      fryFrom: at(t.window.from),
      fryUntil: at(t.window.until),
    };
  });

  // The timeline: each mix's steps, then the bake day's line.
  const lookFor = lookForTexts({
    oilStartC: eq.oil.startC,
    thicknessMm: eq.rolling.thicknessMm,
    rouxCookC: scaled.roux?.cookToC ?? 65,
    fridgeMaxC: FRIDGE_MAX_C,
    starterPeakHours: Math.round((starterPeakMinutes / 60) * 10) / 10,
  });
  lookFor.mix = `Bring the ${liquidName.toLowerCase()} to ${tempInBothScales(liquidC)} so the dough comes out at ${tempInBothScales(targetC)}. ${lookFor.mix}`;
  lookFor['final-proof'] = `Each tray out of the fridge in turn, so it is ready as the fryer is. ${lookFor['final-proof']}`;
  lookFor.glaze = `Each batch once cooled, while the next ones fry. ${lookFor.glaze}`;
  const timeline: TimelineEntry[] = [];
  const startMs: number[] = [];
  // Sort keys kept beside the entries, so the sort compares plain numbers (no map lookup, no optional field).
  const mixKey: number[] = [];
  const stepKey: number[] = [];
  const texts = new Map<string, string>();
  const textFor = (step: ScheduleStep, extra: string) => {
    if (!extra) return lookFor[step];
    const key = `${step}|${extra}`;
    let text = texts.get(key);
    if (text === undefined) texts.set(key, (text = `${extra} ${lookFor[step]}`));
    return text;
  };
  const entry = (step: ScheduleStep, startMsRaw: number, untilMs: number, mix?: number, extra = '') => {
    const fromMs = mark(startMsRaw);
    const minutes = Math.max(0, Math.ceil((untilMs - fromMs) / MIN - 1e-9));
    startMs.push(fromMs);
    mixKey.push(mix ?? 0);
    stepKey.push(STEP_ORDER[step]);
    const e: TimelineEntry = { step, title: STEP_TITLES[step], startsAt: fmt(fromMs), endsAt: fmt(untilMs), minutes, lookFor: textFor(step, extra) };
    if (mix !== undefined) e.mix = mix;
    timeline.push(e);
  };
  const several = mixPlans.length > 1;
  mixPlans.forEach((m, k) => {
    const t = mixTimes[k]!;
    const mixNo = several ? m.mix : undefined;
    const addIns = m.portions.filter((p) => p.addIns.length > 0);
    const addWords = (when: 'after-mix' | 'at-shaping') => addIns.filter((p) => p.addAt === when)
      .map((p) => `Weigh off ${Math.round(p.baseGrams)} g for ${p.name} and fold in ${p.addIns.map((a) => `${Math.round(a.grams)} g ${a.name.toLowerCase()}`).join(', ')} (${ADD_IN_STEP_WORDS[when]}).`).join(' ');
    if (m.starter) entry('build-starter', t.feed, t.start, mixNo, `Feed ${Math.round(m.starter.build.seedGrams)} g starter with ${Math.round(m.starter.build.flourGrams)} g flour and ${Math.round(m.starter.build.waterGrams)} g water.`);
    if (m.roux) entry('cook-cool-roux', t.roux, t.start, mixNo);
    entry('mix', t.start, t.bulkFrom, mixNo, addWords('after-mix'));
    entry('bulk-fermentation', t.bulkFrom, t.bulkUntil, mixNo);
    entry('shape-and-chill', t.bulkUntil, t.retardFrom, mixNo, addWords('at-shaping'));
    entry('cold-retard', t.retardFrom, t.roll, mixNo);
  });
  if (hasPieces) {
    entry('heat-oil', abs(line.fryFrom) - Math.ceil(heatMinutes - 1e-9) * MIN, abs(line.fryFrom));
    entry('roll-and-cut', abs(lineStartRel), abs(line.sheets.at(-1)!.until));
    entry('final-proof', abs(line.trays.reduce((m, t) => Math.min(m, t.proofFrom), Infinity)), abs(line.trays.reduce((m, t) => Math.max(m, t.fryAt), -Infinity)));
    entry('fry', abs(line.fryFrom), abs(line.fryUntil));
    entry('cool', abs(line.fryUntil), abs(line.fryUntil + durations.cool));
    entry('glaze', abs(line.glazeFrom), abs(line.glazeUntil));
    entry('pack', abs(line.packFrom), lineMs(lineEndRel));
  } else {
    entry('pack', pickupMs, pickupMs);
  }
  const order = timeline.map((_, i) => i).sort((a, b) => startMs[a]! - startMs[b]! || mixKey[a]! - mixKey[b]! || stepKey[a]! - stepKey[b]!);
  const sortedTimeline = order.map((i) => timeline[i]!);
  const firstStepMs = startMs.length > 0 ? startMs.reduce((m, x) => Math.min(m, x), Infinity) : pickupMs;
  const cutoffMs = firstStepMs - Math.ceil(requireNonNegative('schedule.cutoffMarginMinutes', input.schedule.cutoffMarginMinutes) - 1e-9) * MIN;
  const nowMs = parseInstant('now', input.now, zone);
  if (nowMs >= firstStepMs) warn('schedule_cannot_be_met', 'The first step should already have started: this schedule cannot be met.');
  else if (nowMs >= cutoffMs) warn('cutoff_passed', 'The pre-order cut-off has passed.');

  // Cuts, summed over the doughs.
  const rollsSum: RollStep[] = baseCut.rolled.rolls.map((r0, i) => {
    const all = lotCuts.map((c) => c.rolled.rolls[i]!);
    return { roll: r0.roll, doughGrams: all.reduce((s, x) => s + x.doughGrams, 0), rings: all.reduce((s, x) => s + x.rings, 0), extraHoles: all.reduce((s, x) => s + x.extraHoles, 0), scrapGrams: all.reduce((s, x) => s + x.scrapGrams, 0) };
  });
  const cutRings = lotCuts.reduce((s, c) => s + c.rolled.rings, 0);
  const cutHoles = lotCuts.reduce((s, c) => s + c.rolled.holes, 0);
  const firstRoll = rollsSum[0];
  const sheetLengthMm = firstRoll ? sheetOfDough(firstRoll.doughGrams, eq.rolling, eq.cutter.outerMm).lengthMm : 0;
  // Each dough's first sheet as rollAndCut laid it out: the same count that bounds its first-roll rings.
  const ringsThatFit = lotCuts.reduce((s, c) => s + (c.rolled.rolls[0]?.ringsThatFit ?? 0), 0);
  const firstRollHeldBack = lotCuts.some((c) => c.heldBack);
  const cuts: CutsPlan = {
    rolls: rollsSum,
    rings: cutRings,
    holes: cutHoles,
    extraHoles: lotCuts.reduce((s, c) => s + c.rolled.extraHoles, 0),
    scrapGrams: lotCuts.reduce((s, c) => s + c.rolled.scrapGrams, 0),
    short: { rings: 0, holes: 0 },
    surplus: { rings: cutRings - rings.toMake, holes: cutHoles - holes.toMake },
    firstRollSheet: { widthMm: eq.rolling.widthMm, lengthMm: sheetLengthMm, ringsThatFit },
    cutShare,
  };
  if (firstRoll && ringShareRaw > 0 && ringsThatFit > 0 && firstRollHeldBack) {
    warn('sheet_fits_fewer', `Rolled ${eq.rolling.widthMm} mm wide, the first sheet fits ${ringsThatFit} rings, fewer than the usual cut share would give: the first roll plans those ${ringsThatFit} and the rest come from re-rolled dough. Roll wider or cut closer together to re-roll less.`);
  }

  // The fry plan with the staged line's figures.
  const counted = { pieces: [0, 0], batches: [0, 0] };
  for (let i = 0; i < B.count; i++) {
    counted.pieces[B.kind[i]!]! += B.pieces[i]!;
    counted.batches[B.kind[i]!]! += 1;
  }
  const fry: FryPlan = {
    oilLitres: fryBuilt.oil.fillLitres,
    oilGrams: fryBuilt.oil.fillGrams,
    oilStartC: eq.oil.startC,
    oilFloorC: eq.oil.floorC,
    rings: { ...fryer.ring, count: counted.pieces[0]!, batches: counted.batches[0]! },
    holes: { ...fryer.hole, count: counted.pieces[1]!, batches: counted.batches[1]! },
    batches: B.count,
    minutes: hasPieces ? line.fryUntil - line.fryFrom : 0,
    oilAbsorbedGrams: line.absorbedGrams,
    heatCapacityJPerK: fryer.heatCapacityJPerK,
    burnerNetWatts: fryer.netWatts,
    heatUpMinutes: heatUpMinutes(fryer),
    oil: { ...fryBuilt.oil, absorbedGrams: line.absorbedGrams, topUpGrams: line.topUpGrams, freshFillToBuyGrams: fryBuilt.oil.fillGrams + line.topUpGrams },
    timetable,
    warnings: [],
  };

  const glaze = glazeAmounts(input.glazes, pieces.byGlaze);

  // Capacity (independent of tonight's orders), hole batches counted in the fry window.
  const cycle = (kind: PieceKind) => ({ perBatch: fryer[kind].perBatch, minutes: runBatchCycle(fryer, kind) });
  const ringCycle = cycle('ring');
  const holeCycle = withCentres ? cycle('hole') : null;
  const capacity = capacityFromEquipment({
    fryWindowMinutes: eq.frying.windowMinutes,
    piecesPerBatch: ringCycle.perBatch,
    minutesPerBatch: ringCycle.minutes,
    holeBatches: holeCycle ? { piecesPerBatch: holeCycle.perBatch, minutesPerBatch: holeCycle.minutes, holesPerRing: 1 } : undefined,
    proofingTrays: eq.proofing.trays,
    piecesPerTray: ringsPerTray,
    mixerCapacityGrams: eq.mixer.capacityGrams,
    mixes: eq.mixer.mixes,
    doughGramsPerPiece: (mass.ringGrams + mass.holeGrams) / (1 - (1 - cutShare.ring) ** (eq.rolling.rerolls + 1)),
    fridgeDoughGrams: eq.fridge.doughGrams,
  });

  // Cost per piece from the formula and the equipment only, never from tonight's count.
  const perKilo = scaleFormula(input.formula, 1000);
  const fullDayFriedGrams = capacity.pieces * (mass.ringGrams + mass.holeGrams);
  const cost = costBake({
    ingredients: perKilo.ingredients,
    doughGrams: 1000,
    mixedDoughGrams: baseDoughGrams,
    ringGrams: mass.ringGrams,
    holeGrams: mass.holeGrams,
    cutYield: 1 - (1 - cutShare.ring) ** (eq.rolling.rerolls + 1),
    fatAbsorbedGramsPerRing: fryer.ring.fatGramsPerPiece,
    oilFillGrams: fryBuilt.oil.fillGrams,
    friedGrams: fullDayFriedGrams > 0 ? fullDayFriedGrams : mass.ringGrams,
    glazes: input.glazes,
    prices: input.prices,
    boxes: input.boxes ?? [],
    // Each flavour's own dough per kilogram of base (add-ins on top), or per kilogram of its own formula.
    doughs: [...variations.values()].map((v) => {
      const listMissing = lots.has(keyOf(v.id));
      return v.formula
        ? { dough: v.id, name: v.name, ingredients: scaleFormula(v.formula, 1000).ingredients, doughGrams: 1000, listMissing }
        : {
            dough: v.id,
            name: v.name,
            ingredients: [...perKilo.ingredients, ...(v.addIns ?? []).map((a) => ({ name: a.name, grams: a.gramsPerKg, portion: false }))],
            doughGrams: 1000 * (1 + addInRatio(v.addIns ?? [])),
            listMissing,
          };
    }),
  });

  // Cautions and the remaining warnings.
  const glazesUsed = new Set(glaze.map((g) => g.glazeId));
  const doughsUsed = lotList.filter((l) => l.dough && l.rings + l.holes > 0).map((l) => variations.get(l.dough!)?.allergens);
  const allergens = distinctAllergens([
    rings.toMake + holes.toMake > 0 ? input.allergens.dough : [],
    ...doughsUsed,
    ...items.filter((i) => i.quantity > 0).map((i) => input.allergens.byMenuItem?.[i.menuItemId]),
    ...input.glazes.filter((g) => glazesUsed.has(g.id)).map((g) => g.allergens),
  ]);
  const cautions = [...hotOilCautions(eq.oil.startC, eq.oil.floorC), allergenCaution(allergens), HOME_FOOD_RULES_CAUTION];
  if (fry.oil.topUpGrams > 0) {
    cautions.push('Topping up: pour fresh oil slowly down the side of the pot between batches, never while pieces are in, and wait for the thermometer before the next batch.');
  }

  if (rings.toMake > capacity.pieces) {
    warn('over_capacity', `Tonight's ${rings.toMake} rings are more than the equipment's capacity of ${capacity.pieces} (limited by ${capacity.limitedBy}).`);
  }
  if (fry.minutes > eq.frying.windowMinutes) {
    warn('fry_longer_than_window', `Frying takes about ${Math.ceil(fry.minutes)} min, longer than the ${eq.frying.windowMinutes} min fry window.`);
  }
  const totalDough = mixPlans.reduce((s, m) => s + m.doughGrams, 0);
  if (totalDough > eq.fridge.doughGrams) {
    warn('fridge_too_small', `Tonight's ${(totalDough / 1000).toFixed(1)} kg of dough is more than the ${(eq.fridge.doughGrams / 1000).toFixed(1)} kg the fridge holds for the cold retard.`);
  }
  if (cost.missingPrices.length > 0) warn('missing_prices', `No price for: ${cost.missingPrices.join(', ')} (counted as free).`);

  const firstMix = mixes[0];
  const starter: StarterSheet | null = scaled.starter
    ? { ...scaled.starter, build: { ...scaled.starter.build, feedHoursBeforeMix: starterPeakMinutes / 60 }, feedAt: firstMix?.feedStarterAt ?? fmt(firstStepMs), hoursBeforeMix: starterPeakMinutes / 60 }
    : null;
  const variationPlans: VariationPlan[] = lotCuts.map((c) => {
    const v = c.lot.dough ? variations.get(c.lot.dough) : undefined;
    const addIns = (v && !v.formula ? v.addIns ?? [] : []);
    const ratio = addIns.reduce((s, a) => s + a.gramsPerKg, 0) / 1000;
    const base = c.need.doughGrams / (1 + ratio);
    return {
      id: c.lot.dough,
      name: v?.name ?? 'Plain dough',
      rings: c.lot.rings,
      holes: c.lot.holes,
      doughGrams: c.need.doughGrams,
      addIns: addIns.map((a) => ({ name: a.name, grams: (a.gramsPerKg * base) / 1000 })),
      addAt: addIns.length > 0 ? ADD_IN_STEP_WORDS[v?.addAt ?? 'after-mix'] : null,
      ownFormula: Boolean(v?.formula),
    };
  }).filter((v) => v.id === null || v.rings + v.holes > 0);

  return {
    pieces,
    dough,
    roux: scaled.roux,
    starter,
    mixes,
    variations: variationPlans,
    cuts,
    fry,
    line: {
      piecesPerTray: { ring: ringsPerTray, hole: holesPerTray },
      trays: line.trays.map((t) => ({ tray: t.tray, kind: t.kind, dough: t.dough, pieces: t.pieces, sheet: t.sheet, cutAt: at(t.cutAt), proofFrom: at(t.proofFrom), fryAt: at(t.fryAt) })),
      sheets: line.sheets.map((s) => ({ sheet: s.sheet, dough: s.dough, mix: s.mix, roll: s.roll, doughGrams: s.doughGrams, rings: s.rings, holes: s.holes, from: at(s.from), until: at(s.until) })),
      traysInUse: line.traysInUse,
      proofMinutes,
      glazeFrom: at(line.glazeFrom),
      glazeUntil: at(line.glazeUntil),
      packFrom: at(line.packFrom),
      packUntil: fmt(lineMs(lineEndRel)),
    },
    glaze,
    timeline: sortedTimeline,
    firstStepAt: fmt(firstStepMs),
    preorderCutoffAt: fmt(cutoffMs),
    bulkFermentationMinutes: bulkMinutes,
    finalProofMinutes: proofMinutes,
    starterPeakHours: scaled.starter ? starterPeakMinutes / 60 : null,
    shopping: {
      eggClass,
      eggs: mixPlans.reduce((s, m) => s + (m.eggs?.count ?? 0), 0),
      oilFreshGrams: fry.oil.freshFillToBuyGrams,
      oilTopUpGrams: fry.oil.topUpGrams,
    },
    capacity,
    cost,
    cautions,
    warnings,
  };
}

/** Minutes from one full batch going in to the next: both sides, then the handling time or the oil's climb back. */
function runBatchCycle(fryer: Fryer, kind: PieceKind): number {
  const k = fryer[kind];
  const load = k.perBatch * k.pieceHeatJ;
  const fryS = 2 * k.secondsPerSide;
  const endC = Math.min(fryer.startC, fryer.startC - (load - fryer.netWatts * fryS) / fryer.heatCapacityJPerK);
  const climb = fryer.netWatts > 0 ? (fryer.heatCapacityJPerK * (fryer.startC - endC)) / fryer.netWatts / 60 : 0;
  return fryS / 60 + Math.max(fryer.handlingMinutes, climb);
}
