import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ProductionInputError } from './errors.js';
import { buildSchedule, fermentationMinutes, SCHEDULE_STEPS, type ScheduleInput, type StepDurations } from './schedule.js';
import { fToC } from './units.js';

// A sequential schedule of our own (buildSchedule runs steps one after another).
const durations: StepDurations = {
  'build-starter': 210, 'cook-cool-roux': 45, mix: 20, 'bulk-fermentation': 240, 'shape-and-chill': 15, 'cold-retard': 600,
  'roll-and-cut': 30, 'final-proof': 150, 'heat-oil': 25, fry: 90, cool: 10, glaze: 20, pack: 20,
};
const totalMinutes = Object.values(durations).reduce((s, m) => s + m, 0); // 1475 min = 24 h 35 min

const input = (over: Partial<ScheduleInput>): ScheduleInput => ({
  firstPickupStartsAt: '2026-11-01T09:00',
  timeZone: 'America/New_York',
  durationsMinutes: durations,
  roomTempC: 24,
  bulkReferenceTempC: 24,
  cutoffMarginMinutes: 60,
  ...over,
});

const ms = (iso: string) => Date.parse(iso);

describe('fermentation temperature rule (Forno Bravo: rate doubles per +17 °F)', () => {
  it('2 h at 80 °F ≈ 4 h at 63 °F', () => {
    expect(fermentationMinutes(120, fToC(80), fToC(63))).toBeCloseTo(240, 9);
    expect(fermentationMinutes(240, fToC(63), fToC(80))).toBeCloseTo(120, 9);
  });

  it('stretches bulk fermentation in a cool room', () => {
    const s = buildSchedule(input({ roomTempC: fToC(63), bulkReferenceTempC: fToC(80), durationsMinutes: { ...durations, 'bulk-fermentation': 120 } }));
    expect(s.timeline.find((t) => t.step === 'bulk-fermentation')!.minutes).toBe(240);
  });
});

describe('daylight-saving changes keep real elapsed time (IANA tz database)', () => {
  it('America/New_York, clocks back at 2026-11-01 02:00: the first step starts 24 h 35 min before 09:00 EST, at 09:25 EDT', () => {
    const s = buildSchedule(input({}));
    expect(totalMinutes).toBe(1475);
    expect(s.timeline.at(-1)!.endsAt).toBe('2026-11-01T09:00:00-05:00');
    expect(s.firstStepAt).toBe('2026-10-31T09:25:00-04:00');
    const retard = s.timeline.find((t) => t.step === 'cold-retard')!;
    expect(retard.startsAt).toBe('2026-10-31T18:15:00-04:00');
    expect(retard.endsAt).toBe('2026-11-01T03:15:00-05:00'); // 9 h on the wall clock, 10 h elapsed
    for (const step of s.timeline) expect(ms(step.endsAt) - ms(step.startsAt)).toBe(step.minutes * 60_000);
    expect(ms(s.timeline.at(-1)!.endsAt) - ms(s.firstStepAt)).toBe(1475 * 60_000);
  });

  it('Europe/London, clocks back at 2026-10-25 02:00 BST: 09:00 GMT pickup → first step 09:25 BST the day before', () => {
    const s = buildSchedule(input({ timeZone: 'Europe/London', firstPickupStartsAt: '2026-10-25T09:00' }));
    expect(s.timeline.at(-1)!.endsAt).toBe('2026-10-25T09:00:00+00:00');
    expect(s.firstStepAt).toBe('2026-10-24T09:25:00+01:00');
    expect(s.preorderCutoffAt).toBe('2026-10-24T08:25:00+01:00');
    for (const step of s.timeline) expect(ms(step.endsAt) - ms(step.startsAt)).toBe(step.minutes * 60_000);
  });

  it('America/New_York, clocks forward at 2026-03-08 02:00: the first step starts at 07:25 EST', () => {
    const s = buildSchedule(input({ firstPickupStartsAt: '2026-03-08T09:00' }));
    expect(s.timeline.at(-1)!.endsAt).toBe('2026-03-08T09:00:00-04:00');
    expect(s.firstStepAt).toBe('2026-03-07T07:25:00-05:00');
  });

  it('an instant with an offset is the same instant whatever zone it is shown in', () => {
    const s = buildSchedule(input({ firstPickupStartsAt: '2026-11-01T14:00:00Z' }));
    expect(s.timeline.at(-1)!.endsAt).toBe('2026-11-01T09:00:00-05:00');
  });
});

/** The local clock's minute of an ISO instant with its offset, "…T01:40:00-06:00" → 40 (and its seconds). */
const clockMinute = (iso: string) => ({ minute: Number(iso.slice(14, 16)), second: Number(iso.slice(17, 19)) });

describe('steps start on five-minute marks (common practice, no source: bakers plan to round times)', () => {
  // Durations of our own with odd minutes; the pickup is 09:00 CST on the night America/Chicago repeats
  // 01:00–02:00 (2026-11-01, IANA tz database: CDT −05:00 until 02:00, then CST −06:00).
  const odd: StepDurations = { ...durations, pack: 23, 'roll-and-cut': 117, mix: 22 };
  const chicago = buildSchedule(input({ timeZone: 'America/Chicago', durationsMinutes: odd }));

  it('worked by hand: starts move back to the mark, and a step in the repeated hour keeps its own offset', () => {
    const startOf = (step: string) => chicago.timeline.find((t) => t.step === step)!.startsAt;
    expect(startOf('pack')).toBe('2026-11-01T08:35:00-06:00'); // latest start 08:37
    expect(startOf('final-proof')).toBe('2026-11-01T03:40:00-06:00');
    // 03:40 CST less 117 min is 01:43 CST, the second 1 am: the mark is 01:40 CST, not 01:40 CDT an hour earlier.
    expect(startOf('roll-and-cut')).toBe('2026-11-01T01:40:00-06:00');
    // Cold retard 600 min back from 01:40 CST (07:40 UTC) is 21:40 UTC, 16:40 CDT: 9 h on the wall clock, 10 h elapsed.
    expect(startOf('cold-retard')).toBe('2026-10-31T16:40:00-05:00');
    expect(startOf('mix')).toBe('2026-10-31T12:00:00-05:00'); // latest start 12:03
    expect(chicago.firstStepAt).toBe('2026-10-31T07:45:00-05:00');
    expect(chicago.preorderCutoffAt).toBe('2026-10-31T06:45:00-05:00');
    // Without marks the 1567 min would start at 15:00 UTC less 26 h 7 min = 07:53 CDT: the start only moved earlier.
    const total = Object.values(odd).reduce((a, b) => a + b, 0);
    expect(total).toBe(1567);
    expect(ms(chicago.firstStepAt)).toBeLessThanOrEqual(ms('2026-11-01T09:00:00-06:00') - total * 60_000);
    expect(chicago.timeline.at(-1)!.endsAt).toBe('2026-11-01T09:00:00-06:00');
  });

  it('every step starts on a mark of the local clock, keeps at least its own minutes and never starts later than it must', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('America/Chicago', 'Asia/Kathmandu', 'Pacific/Chatham', 'Australia/Lord_Howe', 'Europe/London'),
        fc.integer({ min: Date.UTC(2026, 0, 1), max: Date.UTC(2027, 0, 1) }),
        fc.array(fc.integer({ min: 0, max: 900 }), { minLength: SCHEDULE_STEPS.length, maxLength: SCHEDULE_STEPS.length }),
        (timeZone, pickupMs, minutes) => {
          const d = Object.fromEntries(SCHEDULE_STEPS.map((step, i) => [step, minutes[i]!])) as StepDurations;
          const pickup = Math.floor(pickupMs / 60_000) * 60_000;
          const s = buildSchedule(input({ timeZone, firstPickupStartsAt: new Date(pickup).toISOString(), durationsMinutes: d }));
          let latestEnd = pickup; // the latest each step may end, worked back without marks
          for (let i = s.timeline.length - 1; i >= 0; i--) {
            const step = s.timeline[i]!;
            expect(clockMinute(step.startsAt).minute % 5).toBe(0);
            expect(clockMinute(step.startsAt).second).toBe(0);
            expect(step.minutes).toBeGreaterThanOrEqual(d[step.step]);
            expect(step.minutes).toBeLessThan(d[step.step] + 5 * (s.timeline.length - i));
            expect(ms(step.startsAt)).toBeLessThanOrEqual(latestEnd - d[step.step] * 60_000);
            latestEnd = ms(step.startsAt);
          }
          expect(ms(s.preorderCutoffAt)).toBeLessThanOrEqual(pickup - (Object.values(d).reduce((a, b) => a + b, 0) + 60) * 60_000);
        },
      ),
    );
  });
});

describe('schedule content', () => {
  it('lists the thirteen steps in order, each with what to look for', () => {
    const s = buildSchedule(input({}));
    expect(s.timeline.map((t) => t.step)).toEqual([...SCHEDULE_STEPS]);
    expect(s.timeline.every((t) => t.lookFor.length > 0)).toBe(true);
    expect(s.timeline.find((t) => t.step === 'cook-cool-roux')!.lookFor).toContain('65 °C (149 °F)'); // Wikipedia "Water roux"; NIST 149 °F = 65.00 °C
    expect(s.timeline.find((t) => t.step === 'shape-and-chill')!.lookFor).toContain('4 °C (40 °F)'); // U.S. FDA fridge at or below 40 °F
  });

  it('warns when the cut-off has passed or the room is too cold for yeast (Appl. Environ. Microbiol. 1998: no growth at 8 °C)', () => {
    const late = buildSchedule(input({ now: '2026-10-31T09:00:00-04:00' }));
    expect(late.warnings).toContain('The pre-order cut-off has passed.');
    const cold = buildSchedule(input({ roomTempC: 6 }));
    expect(cold.warnings.some((w) => w.includes('yeast barely grows'))).toBe(true);
  });

  it('refuses an unknown time zone or a bad date without computing anything', () => {
    expect(() => buildSchedule(input({ timeZone: 'Mars/Olympus_Mons' }))).toThrow(ProductionInputError);
    expect(() => buildSchedule(input({ firstPickupStartsAt: 'next Saturday' }))).toThrow(/ISO-8601/);
    expect(() => buildSchedule(input({ durationsMinutes: { ...durations, mix: -5 } }))).toThrow(/durationsMinutes.mix/);
  });
});

describe('properties (fast-check)', () => {
  const zones = ['America/New_York', 'Europe/London', 'Australia/Lord_Howe', 'America/Los_Angeles', 'Asia/Kolkata', 'Pacific/Chatham'];
  it('steps never overlap, keep their durations and end at or before the first pickup', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...zones),
        fc.integer({ min: Date.UTC(2026, 0, 1), max: Date.UTC(2027, 0, 1) }),
        fc.array(fc.integer({ min: 0, max: 900 }), { minLength: SCHEDULE_STEPS.length, maxLength: SCHEDULE_STEPS.length }),
        fc.double({ min: 2, max: 35, noNaN: true }),
        (timeZone, pickupMs, minutes, roomTempC) => {
          const d = Object.fromEntries(SCHEDULE_STEPS.map((step, i) => [step, minutes[i]!])) as StepDurations;
          const pickup = new Date(Math.floor(pickupMs / 60_000) * 60_000).toISOString();
          const s = buildSchedule(input({ timeZone, firstPickupStartsAt: pickup, durationsMinutes: d, roomTempC }));
          for (let i = 0; i < s.timeline.length; i++) {
            const step = s.timeline[i]!;
            expect(ms(step.endsAt) - ms(step.startsAt)).toBe(step.minutes * 60_000);
            const next = s.timeline[i + 1];
            if (next) expect(ms(step.endsAt)).toBeLessThanOrEqual(ms(next.startsAt));
          }
          expect(ms(s.timeline.at(-1)!.endsAt)).toBeLessThanOrEqual(ms(pickup));
          expect(ms(s.preorderCutoffAt)).toBeLessThanOrEqual(ms(s.firstStepAt));
        },
      ),
    );
  });
});
