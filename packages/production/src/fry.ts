/**
 * Frying: oil in the pot, pieces per fry batch, batches, minutes and fat taken
 * up by the pieces.
 *
 * Batch-size model (a screening model, stated so it can be questioned):
 * - Pot area: each piece needs a circle of (cut diameter × puff factor +
 *   clearance to turn it) on the oil surface; we count pieces in real layouts
 *   inside the pot's circle (concentric rings, or a hexagonal lattice).
 * - Heat balance: oil of mass m_oil and specific heat c_oil at the start
 *   temperature T0 takes in n pieces of mass m, specific heat c_dough, at the
 *   dough temperature Td. With no burner heat during the drop, no heat lost to
 *   the air and the water that boils off ignored, the mix settles at
 *   T = (m_oil·c_oil·T0 + n·m·c_dough·Td) / (m_oil·c_oil + n·m·c_dough).
 *   We take the most pieces that keep T at or above the floor temperature.
 *   Treating the pieces as warmed right up to the oil temperature overstates
 *   what they draw in the first minute; leaving out the steam they give off
 *   understates it; the burner keeps working meanwhile. The result is a batch
 *   size to start from, not a guarantee: watch the thermometer.
 * - Oil density falls about 0.00064 g/cm³ per °C (about 0.92 g/cm³ near
 *   20 °C); the depth is measured cold, when the oil is poured.
 * - Defaults: c_oil 2.3 J/(g·K) near frying temperature (2.2–2.4 near 180 °C;
 *   about 2.0 at 25 °C), c_dough 2.7 J/(g·K) (doughs measure 2.15–3.19).
 * - Fat taken up: about 2 oz (56.7 g) per dozen rings; holes in proportion to
 *   their mass.
 * - Minutes: every batch fries two sides; between batches the oil gets
 *   `recoveryMinutes` to climb back to the start temperature.
 */
import { ProductionInputError, requireFinite, requireNonNegative, requirePositive, requireWholeNonNegative } from './errors.js';
import { fToC, ozToG, tempInBothScales } from './units.js';

export const OIL_DENSITY_AT_20C = 0.92;
export const OIL_DENSITY_CHANGE_PER_C = 0.00064;
export const OIL_SPECIFIC_HEAT_J_PER_GK = 2.3;
export const DOUGH_SPECIFIC_HEAT_J_PER_GK = 2.7;
export const FAT_ABSORBED_GRAMS_PER_DOZEN = ozToG(2);

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
  /** Settled oil temperature after a batch of `pieces`. */
  oilAfterC: number;
  warnings: string[];
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
  const cDough = requirePositive('doughSpecificHeatJPerGK', input.doughSpecificHeatJPerGK ?? DOUGH_SPECIFIC_HEAT_J_PER_GK);
  const pieceGrams = requirePositive('pieceGrams', input.pieceGrams);
  // Most n with oil·c_oil·(T0 − floor) ≥ n·m·c_dough·(floor − Td).
  const byHeat = Math.floor((oilGrams * cOil * (start - floor)) / (pieceGrams * cDough * (floor - doughTemp)) + 1e-9);
  const warnings: string[] = [];
  if (byHeat === 0) {
    warnings.push('Even one piece cools this oil below the floor temperature: use more oil, a wider pot or smaller pieces.');
  }
  const pieces = Math.max(1, Math.min(byArea, byHeat));
  const load = { oilGrams, oilStartC: start, pieceGrams, doughTempC: doughTemp, oilSpecificHeatJPerGK: cOil, doughSpecificHeatJPerGK: cDough };
  return {
    pieces,
    limitedBy: byHeat < byArea ? 'heat' : 'pot-area',
    byArea,
    byHeat,
    footprintMm,
    oilGrams,
    oilAfterC: oilTempAfterLoad({ ...load, pieces }),
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
  recoveryMinutes: number;
  fatAbsorbedGramsPerDozen?: number;
  smokePointC?: number;
}

export interface FryBatches {
  count: number;
  perBatch: number;
  batches: number;
  limitedBy: BatchLimit;
  byArea: number;
  byHeat: number;
  oilAfterC: number;
  secondsPerSide: number;
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
  oilAbsorbedGrams: number;
  warnings: string[];
}

/** Usual frying range for yeast-raised doughnuts: 350–375 °F. */
export const FRY_RANGE_C = { min: fToC(350), max: fToC(375) } as const;

function batchesFor(input: FryInput, pieces: FryPieces, field: string): { batches: FryBatches; warnings: string[] } {
  requireWholeNonNegative(`${field}.count`, pieces.count);
  requirePositive(`${field}.secondsPerSide`, pieces.secondsPerSide);
  const size = fryBatchSize({ ...input, pieceGrams: pieces.grams, pieceDiameterMm: pieces.diameterMm });
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
    },
    warnings: size.warnings,
  };
}

export function planFry(input: FryInput): FryPlan {
  const recovery = requireNonNegative('recoveryMinutes', input.recoveryMinutes);
  const fatPerDozen = requireNonNegative('fatAbsorbedGramsPerDozen', input.fatAbsorbedGramsPerDozen ?? FAT_ABSORBED_GRAMS_PER_DOZEN);
  const rings = batchesFor(input, input.rings, 'rings');
  const holes = input.holes.count > 0 ? batchesFor(input, input.holes, 'holes') : null;
  const holeBatches: FryBatches = holes?.batches ?? { ...rings.batches, count: 0, batches: 0, secondsPerSide: input.holes.secondsPerSide };
  const batches = rings.batches.batches + holeBatches.batches;
  const fryingSeconds = rings.batches.batches * 2 * input.rings.secondsPerSide + holeBatches.batches * 2 * holeBatches.secondsPerSide;
  const minutes = batches === 0 ? 0 : fryingSeconds / 60 + (batches - 1) * recovery;
  const ringEquivalents = input.rings.count + (input.holes.count * input.holes.grams) / input.rings.grams;

  const warnings = [...rings.warnings, ...(holes?.warnings ?? [])];
  if (input.oilStartC < FRY_RANGE_C.min || input.oilStartC > FRY_RANGE_C.max) {
    warnings.push(`Oil start temperature ${tempInBothScales(input.oilStartC)} is outside the usual ${tempInBothScales(FRY_RANGE_C.min)} to ${tempInBothScales(FRY_RANGE_C.max)} for yeast-raised doughnuts.`);
  }
  if (input.smokePointC !== undefined && input.oilStartC >= requirePositive('smokePointC', input.smokePointC) - 10) {
    warnings.push(`Oil start temperature ${tempInBothScales(input.oilStartC)} is within 10 °C of this oil's smoke point (${tempInBothScales(input.smokePointC)}): choose an oil with a higher smoke point or fry cooler.`);
  }
  return {
    oilLitres: oilVolumeLitres({ potDiameterMm: input.potDiameterMm, depthMm: input.oilDepthMm }),
    oilGrams: oilMassGrams({ potDiameterMm: input.potDiameterMm, depthMm: input.oilDepthMm, densityAt20C: input.oilDensityAt20C }),
    oilStartC: input.oilStartC,
    oilFloorC: input.oilFloorC,
    rings: rings.batches,
    holes: holeBatches,
    batches,
    minutes,
    oilAbsorbedGrams: (ringEquivalents * fatPerDozen) / 12,
    warnings,
  };
}
