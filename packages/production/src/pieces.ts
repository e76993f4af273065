/**
 * Dough mass of one cut ring and of its centre (the hole), from the cutter and
 * the rolled thickness: ring = π/4 · (outer² − inner²) · thickness · density,
 * hole = π/4 · inner² · thickness · density.
 */
import { ProductionInputError, requireNonNegative, requirePositive } from './errors.js';

/** Dough before proof, about 1.18 g/cm³ (specific volume 0.85 mL/g). */
export const DOUGH_DENSITY_G_PER_CM3 = 1.18;

export interface PieceGeometry {
  outerMm: number;
  /** Hole cutter; 0 for a cutter without a centre. */
  innerMm: number;
  thicknessMm: number;
  densityGPerCm3: number;
}

export interface PieceMass {
  ringGrams: number;
  holeGrams: number;
}

export function discAreaMm2(diameterMm: number): number {
  return (Math.PI / 4) * diameterMm * diameterMm;
}

export function pieceMass(geometry: PieceGeometry): PieceMass {
  const outer = requirePositive('outerMm', geometry.outerMm);
  const inner = requireNonNegative('innerMm', geometry.innerMm);
  const thickness = requirePositive('thicknessMm', geometry.thicknessMm);
  const density = requirePositive('densityGPerCm3', geometry.densityGPerCm3);
  if (inner >= outer) throw new ProductionInputError('innerMm', `must be smaller than outerMm (${outer} mm)`);
  const gramsPerMm2 = (thickness * density) / 1000; // mm³ → cm³
  return {
    ringGrams: (discAreaMm2(outer) - discAreaMm2(inner)) * gramsPerMm2,
    holeGrams: discAreaMm2(inner) * gramsPerMm2,
  };
}

/**
 * The piece masses the plan uses: the geometry, unless the baker has weighed
 * a cut piece (a measured weight overrides the computed one).
 */
export function effectivePieceMass(geometry: PieceGeometry, measured?: { ringGrams?: number; holeGrams?: number }): PieceMass {
  const computed = pieceMass(geometry);
  return {
    ringGrams: measured?.ringGrams !== undefined ? requirePositive('measuredRingGrams', measured.ringGrams) : computed.ringGrams,
    holeGrams: measured?.holeGrams !== undefined ? requirePositive('measuredHoleGrams', measured.holeGrams) : computed.holeGrams,
  };
}
