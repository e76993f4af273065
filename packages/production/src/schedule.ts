/**
 * The bake schedule, worked backwards from the start of the first pickup
 * window. Steps run one after another; every duration is the baker's, except
 * bulk fermentation, which is given at a reference room temperature and
 * scaled: fermentation roughly doubles in speed for each +17 °F (+9.44 °C).
 */
import { ProductionInputError, requireFinite, requireNonNegative } from './errors.js';
import { fermentationMinutes } from './temperature.js';
import { fiveMinuteMarkAtOrBefore, formatInstant, parseInstant, requireTimeZone } from './time.js';
import { fToC, tempInBothScales } from './units.js';

export const SCHEDULE_STEPS = [
  'build-starter', 'cook-cool-roux', 'mix', 'bulk-fermentation', 'shape-and-chill', 'cold-retard',
  'roll-and-cut', 'final-proof', 'heat-oil', 'fry', 'cool', 'glaze', 'pack',
] as const;
export type ScheduleStep = (typeof SCHEDULE_STEPS)[number];

export const STEP_TITLES: Record<ScheduleStep, string> = {
  'build-starter': 'Build the starter',
  'cook-cool-roux': 'Cook and cool the milk roux',
  mix: 'Mix to windowpane',
  'bulk-fermentation': 'Bulk fermentation',
  'shape-and-chill': 'Shape and into the fridge',
  'cold-retard': 'Cold retard',
  'roll-and-cut': 'Roll and cut',
  'final-proof': 'Final proof',
  'heat-oil': 'Heat the oil',
  fry: 'Fry',
  cool: 'Cool',
  glaze: 'Glaze',
  pack: 'Pack',
};

/** Minutes per step; bulk fermentation at the reference temperature. */
export type StepDurations = Record<ScheduleStep, number>;

export { DOUBLING_RISE_C, fermentationMinutes } from './temperature.js';

/** A fridge holds food at or below 40 °F. */
export const FRIDGE_MAX_C = fToC(40);

export interface LookForContext {
  oilStartC: number;
  thicknessMm: number;
  rouxCookC: number;
  fridgeMaxC: number;
  starterPeakHours: number;
}

export const DEFAULT_LOOK_FOR_CONTEXT: LookForContext = {
  oilStartC: 190,
  thicknessMm: 13,
  rouxCookC: 65,
  fridgeMaxC: FRIDGE_MAX_C,
  starterPeakHours: 4,
};

/** What the baker checks at the end of each step. */
export function lookForTexts(ctx: LookForContext = DEFAULT_LOOK_FOR_CONTEXT): Record<ScheduleStep, string> {
  return {
    'build-starter': `Domed, bubbly and about doubled, smelling pleasantly sour: peak is about ${ctx.starterPeakHours} ± 1 h after the feed.`,
    'cook-cool-roux': `Whisk over low heat until it thickens like pudding and the whisk leaves trails, about ${tempInBothScales(ctx.rouxCookC)}; cover and cool to room temperature.`,
    mix: 'Windowpane: a piece stretched between the fingers goes thin enough to see light through without tearing.',
    'bulk-fermentation': 'Risen by about half, airy and domed, with bubbles at the sides; watch the dough, not the clock.',
    'shape-and-chill': `Pressed into a flat, covered slab and into a fridge at or below ${tempInBothScales(ctx.fridgeMaxC)}.`,
    'cold-retard': 'Firm, cold and slightly risen; easy to roll without sticking.',
    'roll-and-cut': `Rolled evenly to ${ctx.thicknessMm} mm; cuts are clean, pieces on floured or papered trays with room to grow.`,
    'final-proof': 'Puffy and light; a gentle fingertip dent springs back slowly and not all the way.',
    'heat-oil': `Thermometer steady at ${tempInBothScales(ctx.oilStartC)}; lid and a metal tray at hand; stay with the pot.`,
    fry: 'Deep golden on each side with a pale ring round the middle; let the oil come back to temperature between batches.',
    cool: 'Cool enough to handle on a rack; glaze while still slightly warm.',
    glaze: 'An even, set coat that no longer runs.',
    pack: 'Boxes match the orders; labels and allergen notes on; keep out of the sun.',
  };
}

export interface ScheduleInput {
  /** Start of the first pickup window, ISO-8601 (without an offset it is read in `timeZone`). */
  firstPickupStartsAt: string;
  /** The bake day's IANA time zone, e.g. America/New_York. */
  timeZone: string;
  durationsMinutes: StepDurations;
  roomTempC: number;
  /** Room temperature at which `durationsMinutes['bulk-fermentation']` holds. */
  bulkReferenceTempC: number;
  /** Pre-orders close this long before the first step starts. */
  cutoffMarginMinutes: number;
  /** The current instant, ISO-8601; used only to warn about a passed cut-off. */
  now?: string;
  lookFor?: Partial<Record<ScheduleStep, string>>;
}

export interface TimelineStep {
  step: ScheduleStep;
  title: string;
  startsAt: string;
  endsAt: string;
  /** Whole minutes from start to end: the step's own (rounded up), plus up to 4 when its start moves to a mark. */
  minutes: number;
  lookFor: string;
}

export interface Schedule {
  timeline: TimelineStep[];
  firstStepAt: string;
  preorderCutoffAt: string;
  /** Bulk fermentation at tonight's room temperature. */
  bulkFermentationMinutes: number;
  warnings: string[];
}

const MINUTE_MS = 60_000;

/** Rounds a duration up to whole minutes (float noise below a nanominute ignored). */
function wholeMinutesUp(minutes: number): number {
  return Math.max(0, Math.ceil(minutes - 1e-9));
}

/** Yeast stops growing near 8 °C; its optimum is about 28 °C. */
export const YEAST_NO_GROWTH_C = 8;
export const YEAST_OPTIMUM_C = 28;

export function buildSchedule(input: ScheduleInput): Schedule {
  const zone = requireTimeZone('timeZone', input.timeZone);
  const pickupMs = parseInstant('firstPickupStartsAt', input.firstPickupStartsAt, zone);
  const roomTempC = requireFinite('roomTempC', input.roomTempC);
  const margin = requireNonNegative('cutoffMarginMinutes', input.cutoffMarginMinutes);
  if (!input.durationsMinutes) throw new ProductionInputError('durationsMinutes', 'is required');
  for (const step of SCHEDULE_STEPS) requireNonNegative(`durationsMinutes.${step}`, input.durationsMinutes[step]);

  const bulk = fermentationMinutes(input.durationsMinutes['bulk-fermentation'], input.bulkReferenceTempC, roomTempC);
  const minutesOf = (step: ScheduleStep) => wholeMinutesUp(step === 'bulk-fermentation' ? bulk : input.durationsMinutes[step]);
  const lookFor = { ...lookForTexts(), ...input.lookFor };

  // Work backwards in absolute time from the pickup start. Each step starts on the five-minute mark at or
  // before its latest start and runs until the next one starts, so it keeps at least its own minutes.
  let endMs = pickupMs;
  const reversed: TimelineStep[] = [];
  for (const step of [...SCHEDULE_STEPS].reverse()) {
    const startMs = fiveMinuteMarkAtOrBefore(endMs - minutesOf(step) * MINUTE_MS);
    const minutes = (endMs - startMs) / MINUTE_MS;
    reversed.push({
      step,
      title: STEP_TITLES[step],
      startsAt: formatInstant(startMs, zone),
      endsAt: formatInstant(endMs, zone),
      minutes,
      lookFor: lookFor[step],
    });
    endMs = startMs;
  }
  const firstStepMs = endMs;
  const cutoffMs = firstStepMs - wholeMinutesUp(margin) * MINUTE_MS;

  const warnings: string[] = [];
  if (roomTempC < YEAST_NO_GROWTH_C) {
    warnings.push(`Room at ${tempInBothScales(roomTempC)}: yeast barely grows below about ${YEAST_NO_GROWTH_C} °C, so the bulk time cannot be trusted.`);
  } else if (roomTempC > YEAST_OPTIMUM_C) {
    warnings.push(`Room at ${tempInBothScales(roomTempC)} is above the yeast's optimum (about ${YEAST_OPTIMUM_C} °C): the bulk time is a rough guess and the dough sours fast.`);
  }
  if (input.now !== undefined) {
    const nowMs = parseInstant('now', input.now, zone);
    if (nowMs >= firstStepMs) warnings.push('The first step should already have started: this schedule cannot be met.');
    else if (nowMs >= cutoffMs) warnings.push('The pre-order cut-off has passed.');
  }
  return {
    timeline: reversed.reverse(),
    firstStepAt: formatInstant(firstStepMs, zone),
    preorderCutoffAt: formatInstant(cutoffMs, zone),
    bulkFermentationMinutes: bulk,
    warnings,
  };
}
