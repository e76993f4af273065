/**
 * Dough temperature and the fermentation clock.
 *
 * Desired dough temperature (the bakers' rule): the dough comes out of the
 * mixer at about the mean of its ingredients' temperatures plus the heat the
 * mixer puts in, so with n temperatures counted (room, flour, starter, roux,
 * …, and the liquid itself)
 *   liquid = n × DDT − (room + flour + starter + …) − friction.
 * Friction enters as a temperature difference (a rise), never with the
 * 32° offset, so the rule gives the same answer in °C and in °F.
 *
 * Fermentation speed roughly doubles for each +17 °F (+9.44 °C). A dough does
 * not sit at one temperature: a bulk dough starts at the dough temperature
 * and drifts towards the room; a cut piece comes out of the fridge and warms
 * towards the proofing temperature. We follow that drift as a first-order
 * (Newton) approach, T(t) = surround + (start − surround)·e^(−t/τ), and add up
 * the fermentation done minute by minute until the reference work is done:
 *   ∫ 2^((T(t) − T_ref)/9.44 °C) dt / minutes_at_T_ref = 1.
 * With the dough already at the surround temperature this is the plain
 * doubling rule. τ (the settling time) depends on the mass and the container;
 * the defaults are our own estimates that the baker can change.
 */
import { ProductionInputError, requireFinite, requireNonNegative, requirePositive } from './errors.js';
import { fDeltaToC, fToC } from './units.js';

/** Rise in temperature that doubles the fermentation rate: 17 °F. */
export const DOUBLING_RISE_C = fDeltaToC(17);

/** Desired dough temperature for yeast-raised doughnut dough: 78–82 °F; we aim at the middle. */
export const DDT_RANGE_C = { min: fToC(78), max: fToC(82) } as const;
export const DEFAULT_DDT_C = fToC(80);
/** Mixer friction: about 20 °F for a stand mixer, about 5 °F by hand (a rise, not a temperature). */
export const STAND_MIXER_FRICTION_C = fDeltaToC(20);
export const HAND_MIX_FRICTION_C = fDeltaToC(5);

export interface DoughTemperatureSettings {
  /** Desired dough temperature out of the mixer. */
  targetC: number;
  /** Temperature rise from mixing (friction), as a difference. */
  frictionC: number;
  /** Flour temperature; default the room's. */
  flourC?: number;
  /** Ripe starter's temperature; default the room's. */
  starterC?: number;
  /** The cooled roux's temperature; default the room's. */
  rouxC?: number;
  /** Where the trays proof (a proofing box, or the room by default). */
  proofC?: number;
  /** Settling time of a bulk dough towards the room (first-order τ). Default 90 min. */
  bulkSettleMinutes?: number;
  /** Settling time of cut pieces from fridge to proofing temperature. Default 20 min. */
  proofSettleMinutes?: number;
}

export const DEFAULT_DOUGH_TEMPERATURE: Readonly<Required<Pick<DoughTemperatureSettings, 'targetC' | 'frictionC' | 'bulkSettleMinutes' | 'proofSettleMinutes'>>> = Object.freeze({
  targetC: DEFAULT_DDT_C,
  frictionC: STAND_MIXER_FRICTION_C,
  bulkSettleMinutes: 90,
  proofSettleMinutes: 20,
});

export interface TemperatureFactor {
  name: string;
  tempC: number;
}

/** liquid = n × DDT − Σ other temperatures − friction, n = other temperatures + 1 (the liquid). */
export function liquidTemperatureC(input: { targetC: number; frictionC: number; factors: TemperatureFactor[] }): number {
  const target = requireFinite('targetC', input.targetC);
  const friction = requireFinite('frictionC', input.frictionC);
  if (!Array.isArray(input.factors)) throw new ProductionInputError('factors', 'must be a list');
  const sum = input.factors.reduce((s, f, i) => s + requireFinite(`factors[${i}].tempC`, f.tempC), 0);
  return (input.factors.length + 1) * target - sum - friction;
}

/** Minutes at `tempC` for work that takes `referenceMinutes` at `referenceTempC` (+17 °F doubles the rate). */
export function fermentationMinutes(referenceMinutes: number, referenceTempC: number, tempC: number): number {
  requireNonNegative('referenceMinutes', referenceMinutes);
  requireFinite('referenceTempC', referenceTempC);
  requireFinite('tempC', tempC);
  return referenceMinutes * 2 ** ((referenceTempC - tempC) / DOUBLING_RISE_C);
}

export interface DriftingFermentation {
  /** Minutes the work takes with the dough held at `referenceTempC`. */
  referenceMinutes: number;
  referenceTempC: number;
  /** Dough temperature at the start. */
  startC: number;
  /** Temperature the dough drifts towards (room, proofing box). */
  surroundC: number;
  /** First-order settling time τ; 0 means the dough is at the surround at once. */
  settleMinutes: number;
}

/** Minutes until the fermentation work is done while the dough drifts towards its surroundings (see the module comment). */
export function driftingFermentationMinutes(f: DriftingFermentation): number {
  const ref = requireNonNegative('referenceMinutes', f.referenceMinutes);
  const refT = requireFinite('referenceTempC', f.referenceTempC);
  const start = requireFinite('startC', f.startC);
  const surround = requireFinite('surroundC', f.surroundC);
  const tau = requireNonNegative('settleMinutes', f.settleMinutes);
  if (ref === 0) return 0;
  const rate = (t: number) => 2 ** ((t - refT) / DOUBLING_RISE_C) / ref;
  if (tau === 0 || Math.abs(start - surround) < 1e-6) return 1 / rate(surround);
  const step = Math.min(1, tau / 20);
  const decay = Math.exp(-step / tau);
  let done = 0;
  let minutes = 0;
  let gap = start - surround;
  // Walk while the dough is still noticeably away from its surroundings, then finish at the surround's rate.
  while (Math.abs(gap) > 0.01) {
    const mid = surround + gap * Math.exp(-step / (2 * tau));
    const r = rate(mid);
    if (done + r * step >= 1) return minutes + (1 - done) / r;
    done += r * step;
    minutes += step;
    gap *= decay;
  }
  return minutes + (1 - done) / rate(surround);
}

/** Dough temperature after `minutes` of drift (the same first-order model). */
export function driftedTempC(startC: number, surroundC: number, settleMinutes: number, minutes: number): number {
  requirePositive('settleMinutes', settleMinutes);
  return surroundC + (startC - surroundC) * Math.exp(-minutes / settleMinutes);
}
