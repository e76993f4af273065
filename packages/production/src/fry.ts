/**
 * Frying: oil in the pot, pieces per fry batch, the heat each batch draws,
 * the oil's recovery, the fat the pieces take up and the oil to buy.
 *
 * Batch-size and heat model (a screening model, stated so it can be questioned):
 * - Pot area: each piece needs a circle of (cut diameter × puff factor +
 *   clearance to turn it) on the oil surface; we count pieces in real layouts
 *   inside the pot's circle (concentric rings, or a hexagonal lattice).
 * - Heat store: the oil and the pot heat and cool together, C = m_oil·c_oil +
 *   m_pot·c_pot (J/K).
 * - What a piece draws: its crumb and surface come up to about 100 °C (they
 *   cannot pass it while water is boiling off) and the water it loses leaves
 *   as steam: Q = m·c_dough·(100 − T_dough) + m·water_lost·2257 J/g (latent
 *   heat of water at 100 °C, steam tables). The oil a piece takes up goes in
 *   at oil temperature and changes nothing.
 * - When: most of it in the first minute, while the surface dries; we take
 *   the whole draw over the first side. Meanwhile the burner puts in its net
 *   power P (its rating × the share that reaches the oil). Lowest
 *   temperature of a batch of n from T0: T0 − max(0, n·Q − P·t_side)/C; we
 *   take the most pieces that keep it at or above the floor.
 * - Recovery: after both sides the oil sits at T0 − (n·Q − P·t_fry)/C (never
 *   above T0: the burner is turned down); it climbs back at P/C, and the
 *   next batch goes in when the thermometer reads the start temperature
 *   again, never sooner than the handling time (lift out, drain, load).
 * - Heating up: C·(T0 − T_room)/P.
 * - Oil density falls about 0.00064 g/cm³ per °C (about 0.92 g/cm³ near
 *   20 °C); the depth is measured cold, when the oil is poured. Hot, the same
 *   oil stands higher; floating pieces add their own weight of oil in volume.
 * - Fat taken up: a share of the fried piece's weight (15–25 % published;
 *   22 % by default, what a glazed yeast doughnut's fat content needs), so it
 *   grows with the piece: fat = f·m·(1 − water_lost)/(1 − f).
 * - Defaults: c_oil 2.3 J/(g·K) near frying temperature (2.2–2.4 near 180 °C;
 *   about 2.0 at 25 °C), c_dough 2.7 J/(g·K) (doughs measure 2.15–3.19).
 * The result is a plan to start from, not a guarantee: watch the thermometer.
 */
import { ProductionInputError, requireFinite, requireInRange, requireNonNegative, requirePositive, requireWholeNonNegative } from './errors.js';
import { discAreaMm2 } from './pieces.js';
import { fToC, ozToG, tempInBothScales } from './units.js';
import { warning, type PlanWarning, type WarningCode } from './warnings.js';

export const OIL_DENSITY_AT_20C = 0.92;
export const OIL_DENSITY_CHANGE_PER_C = 0.00064;
export const OIL_SPECIFIC_HEAT_J_PER_GK = 2.3;
export const DOUGH_SPECIFIC_HEAT_J_PER_GK = 2.7;
/** The low published figure (2 oz a dozen); kept for reference, no longer used by the plan. */
export const FAT_ABSORBED_GRAMS_PER_DOZEN = ozToG(2);
/** Latent heat of vaporisation of water at 100 °C, J/g (steam tables). */
export const WATER_LATENT_HEAT_J_PER_G = 2257;
export const WATER_BOILS_C = 100;
/** Fat taken up, share of the fried weight: 15–25 % published for doughnuts; 22 % default. */
export const ABSORBED_FAT_RANGE_PERCENT = { min: 15, max: 25 } as const;
export const DEFAULT_ABSORBED_FAT_PERCENT = 22;
/** Water a piece loses in the fryer, share of its dough mass (about 10 %). */
export const DEFAULT_WATER_LOSS_PERCENT = 10;

/** Specific heat of pot metals, J/(g·K) (engineering tables, from memory). */
export const POT_MATERIALS = {
  'cast-iron': 0.45,
  'carbon-steel': 0.49,
  'stainless-steel': 0.5,
  aluminium: 0.9,
  copper: 0.385,
} as const;
export type PotMaterial = keyof typeof POT_MATERIALS;

export interface PotFill {
  potDiameterMm: number;
  /** Oil depth, measured when poured (cold). */
  depthMm: number;
}

export function oilVolumeLitres(pot: PotFill): number {
  const d = requirePositive('potDiameterMm', pot.potDiameterMm);
  const depth = requirePositive('depthMm', pot.depthMm);
  return ((Math.PI / 4) * d * d * depth) / 1e6;
}

/** Oil density at a temperature, g/cm³, from its density at 20 °C. */
export function oilDensity(tempC: number, densityAt20C = OIL_DENSITY_AT_20C): number {
  requireFinite('tempC', tempC);
  requirePositive('densityAt20C', densityAt20C);
  return densityAt20C - OIL_DENSITY_CHANGE_PER_C * (tempC - 20);
}

/** Mass of the oil poured to `depthMm` at `fillTempC` (default 20 °C). */
export function oilMassGrams(pot: PotFill & { fillTempC?: number; densityAt20C?: number }): number {
  return oilVolumeLitres(pot) * 1000 * oilDensity(pot.fillTempC ?? 20, pot.densityAt20C);
}

/** Pieces on a ring of radius ρ whose centres stay 2r apart: ⌊π / asin(r/ρ)⌋. */
function onRing(ringRadius: number, r: number): number {
  return Math.floor(Math.PI / Math.asin(Math.min(1, r / ringRadius)) + 1e-9);
}

function concentricCount(R: number, r: number): number {
  let count = 0;
  let rho = R - r;
  while (rho >= r - 1e-9) {
    count += onRing(Math.max(rho, r), r);
    rho -= 2 * r;
  }
  return rho >= -1e-9 ? count + 1 : count; // room left for one at the centre
}

function latticeCount(R: number, r: number, offsetX: number, offsetY: number): number {
  const limit = (R - r) ** 2 + 1e-9;
  const dy = Math.sqrt(3) * r;
  const rows = Math.ceil(R / dy) + 1;
  const cols = Math.ceil(R / (2 * r)) + 1;
  let count = 0;
  for (let j = -rows; j <= rows; j++) {
    const y = j * dy + offsetY;
    const shift = (j & 1) === 0 ? 0 : r;
    for (let i = -cols - 1; i <= cols; i++) {
      const x = i * 2 * r + shift + offsetX;
      if (x * x + y * y <= limit) count++;
    }
  }
  return count;
}

/**
 * Pieces whose footprints (circles of `footprintMm`) fit on the oil surface of
 * a round pot: the best of concentric rings and three hexagonal lattices.
 */
export function piecesInPot(input: { potDiameterMm: number; footprintMm: number }): number {
  const R = requirePositive('potDiameterMm', input.potDiameterMm) / 2;
  const r = requirePositive('footprintMm', input.footprintMm) / 2;
  if (r > R + 1e-9) return 0;
  return Math.max(
    concentricCount(R, r),
    latticeCount(R, r, 0, 0),
    latticeCount(R, r, r, 0),
    latticeCount(R, r, r, r / Math.sqrt(3)),
  );
}

export interface HeatLoad {
  oilGrams: number;
  oilStartC: number;
  pieces: number;
  pieceGrams: number;
  doughTempC: number;
  oilSpecificHeatJPerGK?: number;
  doughSpecificHeatJPerGK?: number;
}

/** Oil temperature once `pieces` pieces have taken up heat (see the model above). */
export function oilTempAfterLoad(load: HeatLoad): number {
  const oilHeat = requirePositive('oilGrams', load.oilGrams) * requirePositive('oilSpecificHeatJPerGK', load.oilSpecificHeatJPerGK ?? OIL_SPECIFIC_HEAT_J_PER_GK);
  const doughHeat = requireNonNegative('pieces', load.pieces) * requirePositive('pieceGrams', load.pieceGrams)
    * requirePositive('doughSpecificHeatJPerGK', load.doughSpecificHeatJPerGK ?? DOUGH_SPECIFIC_HEAT_J_PER_GK);
  return (oilHeat * requireFinite('oilStartC', load.oilStartC) + doughHeat * requireFinite('doughTempC', load.doughTempC)) / (oilHeat + doughHeat);
}

/** Heat drawn by one piece in the fryer: up to about 100 °C, plus the water it loses as steam (see the module comment). */
export function pieceHeatJ(input: { grams: number; doughTempC: number; doughSpecificHeatJPerGK?: number; waterLossPercent?: number }): number {
  const grams = requirePositive('pieceGrams', input.grams);
  const c = requirePositive('doughSpecificHeatJPerGK', input.doughSpecificHeatJPerGK ?? DOUGH_SPECIFIC_HEAT_J_PER_GK);
  const loss = requireInRange('waterLossPercent', input.waterLossPercent ?? DEFAULT_WATER_LOSS_PERCENT, 0, 50) / 100;
  const td = requireFinite('doughTempC', input.doughTempC);
  return grams * c * Math.max(0, WATER_BOILS_C - td) + grams * loss * WATER_LATENT_HEAT_J_PER_G;
}

/** Fat a piece takes up when it is `absorbedPercent` of the fried weight: f·m·(1 − loss)/(1 − f). */
export function absorbedFatGrams(input: { grams: number; absorbedPercent?: number; waterLossPercent?: number }): number {
  const grams = requireNonNegative('pieceGrams', input.grams);
  const f = requireInRange('absorbedFatPercent', input.absorbedPercent ?? DEFAULT_ABSORBED_FAT_PERCENT, 0, 60) / 100;
  const loss = requireInRange('waterLossPercent', input.waterLossPercent ?? DEFAULT_WATER_LOSS_PERCENT, 0, 50) / 100;
  return (f * grams * (1 - loss)) / (1 - f);
}

/** A fried piece: dough less the water lost plus the fat taken up. */
export function friedPieceGrams(input: { grams: number; absorbedPercent?: number; waterLossPercent?: number }): number {
  const loss = (input.waterLossPercent ?? DEFAULT_WATER_LOSS_PERCENT) / 100;
  return input.grams * (1 - loss) + absorbedFatGrams(input);
}

export interface Burner {
  /** The burner's rated power, W. */
  watts: number;
  /** Share of it that ends up in the oil (the rest heats the kitchen). Default 40 %. */
  efficiencyPercent?: number;
}

export interface PotBody {
  /** Mass of the empty pot. */
  massGrams: number;
  material?: PotMaterial;
  /** Overrides the material's specific heat. */
  specificHeatJPerGK?: number;
}

export interface BatchInput {
  potDiameterMm: number;
  oilDepthMm: number;
  oilStartC: number;
  oilFloorC: number;
  pieceGrams: number;
  /** Cut diameter of the piece. */
  pieceDiameterMm: number;
  doughTempC: number;
  /** Growth of the piece's diameter from cutting to frying (proof and oven spring in the oil). Default 1.25. */
  puffFactor?: number;
  /** Clear space around each piece to turn it. Default 15 mm. */
  turnClearanceMm?: number;
  oilSpecificHeatJPerGK?: number;
  doughSpecificHeatJPerGK?: number;
  oilDensityAt20C?: number;
  /** The pot heats and cools with the oil. Default: none counted. */
  pot?: PotBody;
  /** Default: none counted (the oil alone carries the batch). */
  burner?: Burner;
  /** Seconds of the first side, over which the batch draws its heat. Default 60. */
  firstSideSeconds?: number;
  waterLossPercent?: number;
}

export type BatchLimit = 'pot-area' | 'heat';

export interface BatchSize {
  /** Pieces per fry batch (at least 1). */
  pieces: number;
  limitedBy: BatchLimit;
  byArea: number;
  byHeat: number;
  footprintMm: number;
  oilGrams: number;
  /** Lowest oil temperature during a batch of `pieces`, from the start temperature. */
  oilAfterC: number;
  /** Heat one piece draws, J. */
  pieceHeatJ: number;
  /** Oil and pot together, J/K. */
  heatCapacityJPerK: number;
  /** Burner power reaching the oil, W. */
  netWatts: number;
  warnings: string[];
}

export function potHeatCapacityJPerK(pot: PotBody | undefined): number {
  if (!pot) return 0;
  const c = pot.specificHeatJPerGK ?? POT_MATERIALS[pot.material ?? 'cast-iron'];
  if (c === undefined) throw new ProductionInputError('pot.material', `must be one of ${Object.keys(POT_MATERIALS).join(', ')}`);
  return requireNonNegative('pot.massGrams', pot.massGrams) * requirePositive('pot.specificHeatJPerGK', c);
}

export function burnerNetWatts(burner: Burner | undefined): number {
  if (!burner) return 0;
  return requireNonNegative('burner.watts', burner.watts) * (requireInRange('burner.efficiencyPercent', burner.efficiencyPercent ?? 40, 0, 100) / 100);
}

/** Lowest oil temperature while a batch draws `loadJ` over `seconds`, from `startC`. */
export function batchLowestC(input: { startC: number; loadJ: number; netWatts: number; seconds: number; heatCapacityJPerK: number }): number {
  return input.startC - Math.max(0, input.loadJ - input.netWatts * input.seconds) / input.heatCapacityJPerK;
}

export function fryBatchSize(input: BatchInput): BatchSize {
  const start = requireFinite('oilStartC', input.oilStartC);
  const floor = requireFinite('oilFloorC', input.oilFloorC);
  const doughTemp = requireFinite('doughTempC', input.doughTempC);
  if (floor >= start) throw new ProductionInputError('oilFloorC', 'must be below the start temperature');
  if (doughTemp >= floor) throw new ProductionInputError('doughTempC', 'must be below the oil floor temperature');
  const puff = requirePositive('puffFactor', input.puffFactor ?? 1.25);
  const clearance = requireNonNegative('turnClearanceMm', input.turnClearanceMm ?? 15);
  const footprintMm = requirePositive('pieceDiameterMm', input.pieceDiameterMm) * puff + clearance;
  const byArea = piecesInPot({ potDiameterMm: input.potDiameterMm, footprintMm });
  if (byArea === 0) {
    throw new ProductionInputError('potDiameterMm', `the pot is too small for one piece (${Math.round(footprintMm)} mm across with room to turn)`);
  }
  const oilGrams = oilMassGrams({ potDiameterMm: input.potDiameterMm, depthMm: input.oilDepthMm, densityAt20C: input.oilDensityAt20C });
  const cOil = requirePositive('oilSpecificHeatJPerGK', input.oilSpecificHeatJPerGK ?? OIL_SPECIFIC_HEAT_J_PER_GK);
  const heatCapacityJPerK = oilGrams * cOil + potHeatCapacityJPerK(input.pot);
  const netWatts = burnerNetWatts(input.burner);
  const seconds = requirePositive('firstSideSeconds', input.firstSideSeconds ?? 60);
  const q = pieceHeatJ({ grams: input.pieceGrams, doughTempC: doughTemp, doughSpecificHeatJPerGK: input.doughSpecificHeatJPerGK, waterLossPercent: input.waterLossPercent });
  // Most n with n·Q − P·t ≤ C·(T0 − floor).
  const byHeat = Math.floor((heatCapacityJPerK * (start - floor) + netWatts * seconds) / q + 1e-9);
  const warnings: string[] = [];
  if (byHeat === 0) {
    warnings.push('Even one piece cools this oil below the floor temperature: use more oil, a wider pot, a stronger burner or smaller pieces.');
  }
  const pieces = Math.max(1, Math.min(byArea, byHeat));
  return {
    pieces,
    limitedBy: byHeat < byArea ? 'heat' : 'pot-area',
    byArea,
    byHeat,
    footprintMm,
    oilGrams,
    oilAfterC: batchLowestC({ startC: start, loadJ: pieces * q, netWatts, seconds, heatCapacityJPerK }),
    pieceHeatJ: q,
    heatCapacityJPerK,
    netWatts,
    warnings,
  };
}

export interface FryPieces {
  count: number;
  grams: number;
  diameterMm: number;
  secondsPerSide: number;
}

export interface FryInput extends Omit<BatchInput, 'pieceGrams' | 'pieceDiameterMm'> {
  rings: FryPieces;
  holes: FryPieces;
  /** Least time between batches: lift out, drain, load. The oil's own recovery is added when longer. */
  recoveryMinutes: number;
  /** Fat taken up, percent of the fried weight (15–25 % published). Default 22. */
  absorbedFatPercent?: number;
  /** @deprecated The low 2-oz-a-dozen figure; ignored (fat now follows the piece's weight). */
  fatAbsorbedGramsPerDozen?: number;
  smokePointC?: number;
  /** Height of the pot's side, for the freeboard check. */
  potHeightMm?: number;
  /** Hot oil with a batch in must stay at least this far below the rim. Default 75 mm (about 3 in). */
  minFreeboardMm?: number;
  /** Top up before the oil falls below this depth (cold). Default 40 mm. */
  minOilDepthMm?: number;
  /** Kitchen temperature: the oil starts there and top-up oil comes in at it. Default 20 °C. */
  kitchenC?: number;
}

export interface FryBatches {
  count: number;
  perBatch: number;
  batches: number;
  limitedBy: BatchLimit;
  byArea: number;
  byHeat: number;
  /** Lowest oil temperature in a full batch. */
  oilAfterC: number;
  secondsPerSide: number;
  /** Heat one piece draws, J. */
  pieceHeatJ: number;
  /** Fat one piece takes up, g. */
  fatGramsPerPiece: number;
  /** One fried piece (before glaze), g. */
  friedGrams: number;
}

export interface OilPlan {
  /** Oil to pour to the fill depth (cold). */
  fillLitres: number;
  fillGrams: number;
  /** Taken up by tonight's pieces. */
  absorbedGrams: number;
  /** Oil to have beside the pot for the top-ups. */
  topUpGrams: number;
  /** A fresh fill plus the top-ups. */
  freshFillToBuyGrams: number;
  /** Depth of the hot oil with a full ring batch in it. */
  hotDepthWithBatchMm: number;
  /** Rim height above that, when the pot's height is known. */
  freeboardMm: number | null;
  minFreeboardMm: number;
  /** Top up when the cold level has fallen to this depth. */
  minDepthMm: number;
  /** Oil the pot can lose before a top-up. */
  topUpEveryGrams: number;
}

export interface FryTimetableEntry {
  /** 1, 2, … in frying order. */
  batch: number;
  /** When the batch goes in (ISO-8601 with offset). */
  at: string;
  pieces: number;
  /** The thermometer reading to wait for before the batch goes in. */
  waitForC: number;
  kind: 'ring' | 'hole';
  /** Dough variation id; null for the base dough. */
  dough: string | null;
  /** Which proofing tray the pieces come from. */
  tray: number;
  /** Lowest the oil should fall during this batch. */
  lowestC: number;
  /** Minutes the oil needs after it before the next batch (handling included). */
  recoveryMinutes: number;
  /** Oil to add to the pot just before this batch (0 for none). */
  topUpGramsBefore: number;
  /** Glazes for this batch's pieces once cooled. */
  glazes: Array<{ glazeId: string | null; pieces: number }>;
}

export interface FryPlan {
  oilLitres: number;
  oilGrams: number;
  oilStartC: number;
  oilFloorC: number;
  rings: FryBatches;
  holes: FryBatches;
  batches: number;
  /** Frying time including recovery between batches. */
  minutes: number;
  /** Fat taken up by tonight's pieces (15–25 % of the fried weight). */
  oilAbsorbedGrams: number;
  /** Oil and pot together, J/K. */
  heatCapacityJPerK: number;
  /** Burner power reaching the oil, W. */
  burnerNetWatts: number;
  /** Minutes to bring the oil from the kitchen's temperature to the start temperature. */
  heatUpMinutes: number;
  oil: OilPlan;
  /** Batch by batch, in frying order (filled in by planBake from the staged line). */
  timetable: FryTimetableEntry[];
  warnings: string[];
}

/** Usual frying range for yeast-raised doughnuts: 350–375 °F. */
export const FRY_RANGE_C = { min: fToC(350), max: fToC(375) } as const;
/** Common practice: many bakers keep the oil between 360 °F and 375 °F. */
export const COMMON_FRY_RANGE_C = { min: fToC(360), max: fToC(375) } as const;

/** The batch-by-batch physics for one pot, shared by planFry and the staged line. */
export interface Fryer {
  startC: number;
  floorC: number;
  heatCapacityJPerK: number;
  netWatts: number;
  handlingMinutes: number;
  oilSpecificHeatJPerGK: number;
  kitchenC: number;
  ring: FryBatches;
  hole: FryBatches;
  /** Oil the pot can lose before a top-up. */
  topUpEveryGrams: number;
}

export interface BatchRun {
  lowestC: number;
  fryMinutes: number;
  /** Oil temperature when the batch comes out. */
  endC: number;
}

/** One batch of `pieces` of a kind, dropped in at the start temperature. */
export function runBatch(fryer: Fryer, kind: 'ring' | 'hole', pieces: number): BatchRun {
  const k = fryer[kind];
  const load = pieces * k.pieceHeatJ;
  const fryS = 2 * k.secondsPerSide;
  const lowestC = batchLowestC({ startC: fryer.startC, loadJ: load, netWatts: fryer.netWatts, seconds: Math.min(60, k.secondsPerSide), heatCapacityJPerK: fryer.heatCapacityJPerK });
  const endC = Math.min(fryer.startC, fryer.startC - (load - fryer.netWatts * fryS) / fryer.heatCapacityJPerK);
  return { lowestC, fryMinutes: fryS / 60, endC };
}

/** Minutes for the oil to climb from `fromC` to the start temperature, at least the handling time. */
export function recoveryMinutesFrom(fryer: Fryer, fromC: number): number {
  const climb = fryer.netWatts > 0 ? (fryer.heatCapacityJPerK * Math.max(0, fryer.startC - fromC)) / fryer.netWatts / 60 : (fromC < fryer.startC - 1e-9 ? Infinity : 0);
  return Math.max(fryer.handlingMinutes, climb);
}

/** Oil temperature right after `grams` of kitchen-warm oil are poured in. */
export function afterTopUpC(fryer: Fryer, fromC: number, grams: number): number {
  const added = grams * fryer.oilSpecificHeatJPerGK;
  return (fryer.heatCapacityJPerK * fromC + added * fryer.kitchenC) / (fryer.heatCapacityJPerK + added);
}

function kindBatches(input: FryInput, pieces: FryPieces, field: string, absorbed: number, loss: number): { batches: FryBatches; size: BatchSize } {
  requireWholeNonNegative(`${field}.count`, pieces.count);
  requirePositive(`${field}.secondsPerSide`, pieces.secondsPerSide);
  const size = fryBatchSize({ ...input, pieceGrams: pieces.grams, pieceDiameterMm: pieces.diameterMm, firstSideSeconds: Math.min(60, pieces.secondsPerSide) });
  const fat = absorbedFatGrams({ grams: pieces.grams, absorbedPercent: absorbed, waterLossPercent: loss });
  return {
    batches: {
      count: pieces.count,
      perBatch: size.pieces,
      batches: Math.ceil(pieces.count / size.pieces),
      limitedBy: size.limitedBy,
      byArea: size.byArea,
      byHeat: size.byHeat,
      oilAfterC: size.oilAfterC,
      secondsPerSide: pieces.secondsPerSide,
      pieceHeatJ: size.pieceHeatJ,
      fatGramsPerPiece: fat,
      friedGrams: pieces.grams * (1 - loss / 100) + fat,
    },
    size,
  };
}

/** The pot's physics for a bake (no clock times): batch sizes per kind, heat store, burner, oil logistics. */
export function buildFryer(input: FryInput): { fryer: Fryer; ringSize: BatchSize; holeSize: BatchSize | null; oil: Omit<OilPlan, 'absorbedGrams' | 'topUpGrams' | 'freshFillToBuyGrams'>; warnings: string[] } {
  const handling = requireNonNegative('recoveryMinutes', input.recoveryMinutes);
  const absorbed = requireInRange('absorbedFatPercent', input.absorbedFatPercent ?? DEFAULT_ABSORBED_FAT_PERCENT, 0, 60);
  const loss = requireInRange('waterLossPercent', input.waterLossPercent ?? DEFAULT_WATER_LOSS_PERCENT, 0, 50);
  const kitchenC = requireFinite('kitchenC', input.kitchenC ?? 20);
  const rings = kindBatches(input, input.rings, 'rings', absorbed, loss);
  const holes = input.holes.grams > 0 && input.holes.diameterMm > 0 ? kindBatches(input, input.holes, 'holes', absorbed, loss) : null;
  const holeBatches: FryBatches = holes?.batches ?? { ...rings.batches, count: 0, batches: 0, secondsPerSide: input.holes.secondsPerSide, fatGramsPerPiece: 0, friedGrams: 0 };
  if (!holes && input.holes.count > 0) throw new ProductionInputError('holes.grams', 'holes need a hole cutter');

  const warnings = [...rings.size.warnings, ...(holes?.size.warnings ?? [])];
  const area = discAreaMm2(input.potDiameterMm);
  const fillGrams = rings.size.oilGrams;
  const densityAt20 = input.oilDensityAt20C ?? OIL_DENSITY_AT_20C;
  const hotDensity = oilDensity(input.oilStartC, densityAt20);
  const hotDepthMm = (fillGrams / hotDensity) * 1000 / area;
  const batchDisplacementMm = ((rings.batches.perBatch * input.rings.grams) / hotDensity) * 1000 / area;
  const hotDepthWithBatchMm = hotDepthMm + batchDisplacementMm;
  const minFreeboardMm = requireNonNegative('minFreeboardMm', input.minFreeboardMm ?? 75);
  const minDepthMm = requirePositive('minOilDepthMm', input.minOilDepthMm ?? 40);
  const freeboardMm = input.potHeightMm !== undefined ? requirePositive('potHeightMm', input.potHeightMm) - hotDepthWithBatchMm : null;
  const topUpEveryGrams = Math.max(0, ((input.oilDepthMm - minDepthMm) * area) / 1000 * oilDensity(kitchenC, densityAt20));

  const fryer: Fryer = {
    startC: input.oilStartC,
    floorC: input.oilFloorC,
    heatCapacityJPerK: rings.size.heatCapacityJPerK,
    netWatts: rings.size.netWatts,
    handlingMinutes: handling,
    oilSpecificHeatJPerGK: input.oilSpecificHeatJPerGK ?? OIL_SPECIFIC_HEAT_J_PER_GK,
    kitchenC,
    ring: rings.batches,
    hole: holeBatches,
    topUpEveryGrams,
  };
  return {
    fryer,
    ringSize: rings.size,
    holeSize: holes?.size ?? null,
    oil: {
      fillLitres: oilVolumeLitres({ potDiameterMm: input.potDiameterMm, depthMm: input.oilDepthMm }),
      fillGrams,
      hotDepthWithBatchMm,
      freeboardMm,
      minFreeboardMm,
      minDepthMm,
      topUpEveryGrams,
    },
    warnings,
  };
}

export interface BatchStep {
  kind: 'ring' | 'hole';
  pieces: number;
}

export interface BatchRunDetail extends BatchRun {
  /** Minutes from the start of the batch before the next may go in. */
  recoveryMinutes: number;
  topUpGramsBefore: number;
}

/**
 * Runs batches in order through the pot: each goes in at the start
 * temperature; oil lost to the pieces is topped up (kitchen-cold) before a
 * batch once the level has fallen to the minimum, and the climb back is part
 * of the recovery.
 */
export function runBatches(fryer: Fryer, steps: BatchStep[]): { runs: BatchRunDetail[]; absorbedGrams: number; topUpGrams: number } {
  const runs: BatchRunDetail[] = [];
  let lost = 0;
  let absorbedGrams = 0;
  let topUpGrams = 0;
  let pendingTopUp = 0;
  for (let i = 0; i < steps.length; i++) {
    const step = steps[i]!;
    const run = runBatch(fryer, step.kind, step.pieces);
    const fat = step.pieces * fryer[step.kind].fatGramsPerPiece;
    absorbedGrams += fat;
    lost += fat;
    const detail: BatchRunDetail = { ...run, recoveryMinutes: 0, topUpGramsBefore: pendingTopUp };
    pendingTopUp = 0;
    let outC = run.endC;
    const nextIsLast = i === steps.length - 1;
    if (!nextIsLast && fryer.topUpEveryGrams > 0 && lost + fat >= fryer.topUpEveryGrams) {
      // Top up before the next batch, so its pieces never meet a shallow pot.
      pendingTopUp = lost;
      topUpGrams += lost;
      outC = afterTopUpC(fryer, outC, lost);
      lost = 0;
    }
    detail.recoveryMinutes = nextIsLast ? 0 : recoveryMinutesFrom(fryer, outC);
    runs.push(detail);
  }
  return { runs, absorbedGrams, topUpGrams };
}

export function planFry(input: FryInput): FryPlan {
  const built = buildFryer(input);
  const { fryer } = built;
  const steps: BatchStep[] = [];
  const push = (kind: 'ring' | 'hole', count: number) => {
    const per = fryer[kind].perBatch;
    for (let left = count; left > 0; left -= per) steps.push({ kind, pieces: Math.min(per, left) });
  };
  push('ring', input.rings.count);
  push('hole', input.holes.count);
  const { runs, absorbedGrams, topUpGrams } = runBatches(fryer, steps);
  const minutes = runs.reduce((s, r) => s + r.fryMinutes + r.recoveryMinutes, 0);
  const rings = { ...fryer.ring, count: input.rings.count, batches: Math.ceil(input.rings.count / fryer.ring.perBatch) };
  const holes = { ...fryer.hole, count: input.holes.count, batches: input.holes.count > 0 ? Math.ceil(input.holes.count / fryer.hole.perBatch) : 0 };
  const warnings = [...built.warnings, ...oilWarnings(input, built.oil).map((w) => w.message)];
  return {
    oilLitres: built.oil.fillLitres,
    oilGrams: built.oil.fillGrams,
    oilStartC: input.oilStartC,
    oilFloorC: input.oilFloorC,
    rings,
    holes,
    batches: steps.length,
    minutes,
    oilAbsorbedGrams: absorbedGrams,
    heatCapacityJPerK: fryer.heatCapacityJPerK,
    burnerNetWatts: fryer.netWatts,
    heatUpMinutes: heatUpMinutes(fryer),
    oil: { ...built.oil, absorbedGrams, topUpGrams, freshFillToBuyGrams: built.oil.fillGrams + topUpGrams },
    timetable: [],
    warnings,
  };
}

/** Minutes from kitchen temperature to the start temperature at the burner's net power. */
export function heatUpMinutes(fryer: Fryer): number {
  if (fryer.netWatts <= 0) return 0;
  return (fryer.heatCapacityJPerK * Math.max(0, fryer.startC - fryer.kitchenC)) / fryer.netWatts / 60;
}

/** Range, smoke-point, depth and freeboard checks. */
export function oilWarnings(input: Pick<FryInput, 'oilStartC' | 'smokePointC' | 'oilDepthMm'>, oil: Pick<OilPlan, 'freeboardMm' | 'minFreeboardMm' | 'minDepthMm' | 'hotDepthWithBatchMm'>): PlanWarning[] {
  const warnings: PlanWarning[] = [];
  const push = (code: WarningCode, message: string) => warnings.push(warning(code, message));
  if (input.oilStartC < FRY_RANGE_C.min - 1e-9 || input.oilStartC > FRY_RANGE_C.max + 1e-9) {
    push('oil_outside_usual_range', `Oil start temperature ${tempInBothScales(input.oilStartC)} is outside the usual ${tempInBothScales(FRY_RANGE_C.min)} to ${tempInBothScales(FRY_RANGE_C.max)} for yeast-raised doughnuts.`);
  }
  if (input.smokePointC !== undefined && input.oilStartC >= requirePositive('smokePointC', input.smokePointC) - 10) {
    push('oil_near_smoke_point', `Oil start temperature ${tempInBothScales(input.oilStartC)} is within 10 °C (18 °F) of this oil's smoke point (${tempInBothScales(input.smokePointC)}): choose an oil with a higher smoke point or fry cooler.`);
  }
  if (input.oilDepthMm < oil.minDepthMm) {
    push('oil_too_shallow', `${Math.round(input.oilDepthMm)} mm of oil is too shallow for the pieces to float free: pour at least ${Math.round(oil.minDepthMm)} mm.`);
  }
  if (oil.freeboardMm !== null && oil.freeboardMm < oil.minFreeboardMm) {
    push('freeboard_too_small', `Hot, with a batch in, the oil stands about ${Math.round(oil.hotDepthWithBatchMm)} mm deep, leaving ${Math.round(Math.max(0, oil.freeboardMm))} mm to the rim; keep at least ${Math.round(oil.minFreeboardMm)} mm so it cannot foam over: pour less oil or use a deeper pot.`);
  }
  return warnings;
}
