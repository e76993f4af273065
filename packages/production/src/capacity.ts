/**
 * Bake-day capacity from the equipment: the fewest rings any one piece of kit
 * allows. A ring's centre becomes a doughnut hole; the holes fry in batches
 * of their own, so the fryer's figure counts the hole batches that go with
 * the rings in the same window.
 */
import { ProductionInputError, requireNonNegative, requirePositive, requireWholeNonNegative } from './errors.js';

export interface CapacityInput {
  fryWindowMinutes: number;
  piecesPerBatch: number;
  /** Frying both sides plus the oil's recovery before the next batch. */
  minutesPerBatch: number;
  /** The ring centres fried as holes in their own batches, in the same window. */
  holeBatches?: { piecesPerBatch: number; minutesPerBatch: number; holesPerRing: number };
  proofingTrays: number;
  piecesPerTray: number;
  /** Dough one mix can hold. */
  mixerCapacityGrams: number;
  /** Mixes there is time for. */
  mixes: number;
  /** Dough each ring takes, its share of the scrap included. */
  doughGramsPerPiece: number;
  /** Dough the fridge can hold during the cold retard. */
  fridgeDoughGrams: number;
}

export type CapacityLimit = 'fry' | 'proofing-trays' | 'mixer' | 'fridge';

export interface CapacityCandidate {
  limit: CapacityLimit;
  pieces: number;
}

export interface Capacity {
  pieces: number;
  limitedBy: CapacityLimit;
  candidates: CapacityCandidate[];
}

/** Most rings n with ⌈n/r⌉ ring batches and ⌈n·h/hb⌉ hole batches inside the window. */
function fryCapacity(window: number, perBatch: number, minutesPerBatch: number, holes: CapacityInput['holeBatches']): number {
  if (!holes || holes.holesPerRing === 0) return Math.floor(window / minutesPerBatch + 1e-9) * perBatch;
  const holeBatch = requireWholeNonNegative('holeBatches.piecesPerBatch', holes.piecesPerBatch);
  const holeMinutes = requirePositive('holeBatches.minutesPerBatch', holes.minutesPerBatch);
  const perRing = requireNonNegative('holeBatches.holesPerRing', holes.holesPerRing);
  if (perBatch === 0 || holeBatch === 0) return 0;
  const time = (n: number) => Math.ceil(n / perBatch - 1e-9) * minutesPerBatch + Math.ceil((n * perRing) / holeBatch - 1e-9) * holeMinutes;
  let n = Math.floor(window / (minutesPerBatch / perBatch + (holeMinutes * perRing) / holeBatch)) + perBatch;
  while (n > 0 && time(n) > window + 1e-9) n--;
  return n;
}

/**
 * min(whole fry batches in the window × pieces per batch, trays × pieces per
 * tray, mixer grams × mixes ÷ grams per piece, fridge grams ÷ grams per
 * piece), each rounded down to whole pieces; ties go to the first listed.
 */
export function capacityFromEquipment(input: CapacityInput): Capacity {
  const window = requireNonNegative('fryWindowMinutes', input.fryWindowMinutes);
  const perBatch = requireWholeNonNegative('piecesPerBatch', input.piecesPerBatch);
  const minutesPerBatch = requirePositive('minutesPerBatch', input.minutesPerBatch);
  const gramsPerPiece = requirePositive('doughGramsPerPiece', input.doughGramsPerPiece);
  const down = (x: number) => Math.floor(x + 1e-9);
  const candidates: CapacityCandidate[] = [
    { limit: 'fry', pieces: fryCapacity(window, perBatch, minutesPerBatch, input.holeBatches) },
    {
      limit: 'proofing-trays',
      pieces: requireWholeNonNegative('proofingTrays', input.proofingTrays) * requireWholeNonNegative('piecesPerTray', input.piecesPerTray),
    },
    {
      limit: 'mixer',
      pieces: down((requireNonNegative('mixerCapacityGrams', input.mixerCapacityGrams) * requireWholeNonNegative('mixes', input.mixes)) / gramsPerPiece),
    },
    { limit: 'fridge', pieces: down(requireNonNegative('fridgeDoughGrams', input.fridgeDoughGrams) / gramsPerPiece) },
  ];
  const lowest = candidates.reduce((min, c) => (c.pieces < min.pieces ? c : min));
  return { pieces: lowest.pieces, limitedBy: lowest.limit, candidates };
}

export interface CapacityOverride {
  /** The capacity that applies: the owner's figure. */
  pieces: number;
  derivedPieces: number;
  /** Set when the owner's figure is above what the equipment allows. */
  warning: string | null;
}

/** The owner may set a lower capacity; a higher one is kept but warned about. */
export function checkCapacityOverride(derived: Capacity, overridePieces: number): CapacityOverride {
  requireWholeNonNegative('overridePieces', overridePieces);
  if (!derived || typeof derived.pieces !== 'number') throw new ProductionInputError('derived', 'needs a capacity');
  const warning = overridePieces > derived.pieces
    ? `The capacity set (${overridePieces}) is above what the equipment allows (${derived.pieces}, limited by ${derived.limitedBy}).`
    : null;
  return { pieces: overridePieces, derivedPieces: derived.pieces, warning };
}
