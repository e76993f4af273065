import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEFAULT_DOUGH_ALLERGENS, DEFAULT_EQUIPMENT, DEFAULT_PLAN_SETTINGS, DEFAULT_SCHEDULE } from './defaults.js';
import { ProductionInputError } from './errors.js';
import { planBake, type OrderLine, type PlanBakeInput } from './plan.js';
import { fToC, inToMm } from './units.js';

// Fictional menu of our own.
const MENU: Array<Omit<OrderLine, 'quantity'>> = [
  { menuItemId: 'm-vanilla', name: 'Vanilla milk ring', kind: 'ring', glaze: 'vanilla-milk-glaze' },
  { menuItemId: 'm-cinnamon', name: 'Cinnamon sugar ring', kind: 'ring', glaze: 'cinnamon-sugar' },
  { menuItemId: 'm-plain', name: 'Plain ring', kind: 'ring', glaze: null },
  { menuItemId: 'm-holes', name: 'Cinnamon holes', kind: 'hole', glaze: 'cinnamon-sugar' },
  { menuItemId: 'm-pistachio', name: 'Pistachio glazed holes', kind: 'hole', glaze: 'vanilla-milk-glaze' },
];

const baseInput = (orders: OrderLine[]): PlanBakeInput => ({
  orders,
  ...DEFAULT_PLAN_SETTINGS,
  roomTempC: 22,
  firstPickupStartsAt: '2026-06-13T08:30',
  timeZone: 'America/Chicago',
  now: '2026-06-10T12:00:00-05:00',
  prices: {
    centsPerKg: { 'Bread flour': 190, Water: 0, 'Whole milk': 110, 'Whole eggs': 650, 'Unsalted butter': 1100, Sugar: 160, 'Fine salt': 90, 'Vanilla extract': 9000, 'Icing sugar': 320, 'Ground cinnamon': 2800 },
    fryingOilCentsPerKg: 380,
    oilBakesPerFill: 3,
  },
  boxes: [
    { id: 'dozen-vanilla', name: 'Dozen, vanilla', rings: 12, holes: 0, glazeId: 'vanilla-milk-glaze', priceCents: 3200, packagingCents: 90 },
    { id: 'holes-bag', name: 'Bag of holes', rings: 0, holes: 15, glazeId: 'cinnamon-sugar', priceCents: 900, packagingCents: 20 },
  ],
  allergens: { dough: DEFAULT_DOUGH_ALLERGENS, byMenuItem: { 'm-pistachio': ['tree nuts'] } },
});

const order = (i: number, quantity: number): OrderLine => ({ ...MENU[i % MENU.length]!, quantity });
const saturday = [order(0, 30), order(1, 18), order(2, 6), order(3, 45)];

describe('planBake', () => {
  const plan = planBake(baseInput(saturday));

  it('makes the orders plus the spare allowance, and cuts at least that many', () => {
    expect(plan.pieces.rings).toEqual({ ordered: 54, spare: 3, toMake: 57 }); // 5 % of 54 = 2.7 → 3
    expect(plan.pieces.holes).toEqual({ ordered: 45, spare: 3, toMake: 48 });
    expect(plan.cuts.rings).toBeGreaterThanOrEqual(57);
    expect(plan.cuts.holes).toBeGreaterThanOrEqual(48);
    expect(plan.cuts.rolls).toHaveLength(DEFAULT_EQUIPMENT.rolling.rerolls + 1);
  });

  it('mixes dough whose final-dough grams add up to the target, with whole eggs per mix (USDA AMS 56: large eggs 24 oz a dozen, less 12 % shell per USDA SR Legacy 01123)', () => {
    const total = plan.dough.finalDough.reduce((s, r) => s + r.grams, 0);
    expect(total).toBeCloseTo(plan.dough.doughGrams, 6);
    const edible = ((24 * 28.349523125) / 12) * 0.88;
    for (const mix of plan.mixes) {
      expect(mix.ingredients.reduce((s, r) => s + r.grams, 0)).toBeCloseTo(mix.doughGrams, 6);
      expect(mix.eggs!.count).toBe(Math.max(1, Math.round(mix.eggs!.grams / edible)));
    }
    expect(plan.shopping.eggs).toBe(plan.mixes.reduce((s, m) => s + m.eggs!.count, 0));
    expect(plan.roux!.milkGrams).toBeCloseTo(plan.roux!.flourGrams * 5, 9); // 1:5 roux, common practice
    expect(plan.starter!.hoursBeforeMix).toBeGreaterThanOrEqual(3); // starter peak 4 ± 1 h, common practice
    expect(plan.starter!.hoursBeforeMix).toBeLessThanOrEqual(5.5);
  });

  it('glazes the ordered pieces of each glaze', () => {
    const cinnamon = plan.glaze.find((g) => g.glazeId === 'cinnamon-sugar')!;
    expect(cinnamon).toMatchObject({ rings: 18, holes: 45 });
    expect(plan.glaze.find((g) => g.glazeId === 'vanilla-milk-glaze')).toMatchObject({ rings: 30, holes: 0 });
  });

  it('gives a timeline of ISO instants with offsets that ends at the first pickup', () => {
    const iso = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}[+-]\d{2}:\d{2}$/;
    for (const step of plan.timeline) {
      expect(step.startsAt).toMatch(iso);
      expect(step.endsAt).toMatch(iso);
    }
    expect(plan.timeline.at(-1)!.endsAt).toBe('2026-06-13T08:30:00-05:00');
    const fry = plan.timeline.find((s) => s.step === 'fry')!;
    expect(Math.abs(fry.minutes - plan.fry.minutes)).toBeLessThanOrEqual(1); // the sheet reads to the minute
    expect(Date.parse(plan.preorderCutoffAt)).toBe(Date.parse(plan.firstStepAt) - DEFAULT_SCHEDULE.cutoffMarginMinutes * 60_000);
  });

  it('prices pieces and boxes in whole cents', () => {
    for (const p of plan.cost.perPiece) {
      expect(Number.isInteger(p.ringCents)).toBe(true);
      expect(Number.isInteger(p.holeCents)).toBe(true);
    }
    const dozen = plan.cost.boxes.find((b) => b.id === 'dozen-vanilla')!;
    expect(dozen.marginCents).toBe(dozen.priceCents - dozen.costCents);
    expect(plan.cost.missingPrices).toEqual([]);
  });

  it('shows the hot-oil cautions (NFPA "Cooking oil"; USDA FSIS "Deep Fat Frying and Food Safety")', () => {
    const text = plan.cautions.join('\n');
    expect(text).toMatch(/stay with the pot/i);
    expect(text).toMatch(/lid/i);
    expect(text).toMatch(/never put water on burning oil/i);
    expect(text).toMatch(/turn off the heat/i);
    expect(text).toMatch(/children/i);
    expect(text).toMatch(/thermometer/i);
  });

  it('lists tonight\'s allergens from the lists passed in (U.S. FDA major allergens)', () => {
    expect(plan.cautions.find((c) => c.startsWith('Allergens'))).toContain('wheat, milk, eggs');
    const withPistachio = planBake(baseInput([...saturday, order(4, 12)]));
    expect(withPistachio.cautions.find((c) => c.startsWith('Allergens'))).toContain('tree nuts');
    expect(plan.cautions.find((c) => c.startsWith('Allergens'))).not.toContain('tree nuts');
  });

  it('defers to local rules for home-made food and claims no compliance (Harvard FLPC, "Cottage Food Laws in the United States", 2018)', () => {
    const rule = plan.cautions.find((c) => c.includes('home-made food'))!;
    expect(rule).toMatch(/differ by state and town/);
    expect(rule).toMatch(/does not make a bake compliant/);
  });

  it('passes the fry check: 26 cm pot, 2 in oil at 375 °F, 3 in rings → 2–5 a batch, oil ≥ 350 °F (common practice, no source)', () => {
    const p = planBake({
      ...baseInput(saturday),
      roomTempC: 24,
      equipment: {
        ...DEFAULT_EQUIPMENT,
        pot: { diameterMm: 260, oilDepthMm: inToMm(2) },
        oil: { ...DEFAULT_EQUIPMENT.oil, startC: fToC(375), floorC: fToC(350) },
        cutter: { outerMm: inToMm(3), innerMm: DEFAULT_EQUIPMENT.cutter.innerMm },
      },
    });
    expect(p.fry.rings.perBatch).toBeGreaterThanOrEqual(2);
    expect(p.fry.rings.perBatch).toBeLessThanOrEqual(5);
    expect(p.fry.rings.oilAfterC).toBeGreaterThanOrEqual(fToC(350));
  });

  it('warns when tonight\'s rings exceed the equipment capacity', () => {
    const busy = planBake(baseInput([order(0, 400)]));
    expect(busy.warnings.map((w) => w.code)).toContain('over_capacity');
    expect(busy.capacity.pieces).toBe(plan.capacity.pieces); // capacity does not depend on the orders
  });

  it('uses a weighed piece instead of the computed one', () => {
    const weighed = planBake({ ...baseInput(saturday), equipment: { ...DEFAULT_EQUIPMENT, rolling: { ...DEFAULT_EQUIPMENT.rolling, measuredRingGrams: 70 } } });
    expect(weighed.pieces.ringGrams).toBe(70);
    expect(weighed.pieces.pieceMassSource.ring).toBe('measured');
    expect(weighed.dough.doughGrams).toBeGreaterThan(plan.dough.doughGrams);
  });

  it('plans an empty bake day without dough', () => {
    const empty = planBake(baseInput([]));
    expect(empty.dough.doughGrams).toBe(0);
    expect(empty.fry.batches).toBe(0);
    expect(empty.mixes).toEqual([]);
    expect(empty.fry.timetable).toEqual([]);
    expect(empty.timeline.filter((s) => s.step !== 'pack')).toEqual([]);
  });

  it('refuses bad input with a clear error and leaves the input untouched', () => {
    const bad = baseInput([...saturday, { ...MENU[0]!, quantity: -2 }]);
    const before = structuredClone(bad);
    expect(() => planBake(bad)).toThrow(ProductionInputError);
    expect(() => planBake(bad)).toThrow(/orders\[4\]\.quantity/);
    expect(bad).toEqual(before);
    expect(() => planBake({ ...baseInput(saturday), timeZone: 'Nowhere/Special' })).toThrow(/IANA/);
    expect(() => planBake(baseInput([{ ...MENU[0]!, glaze: 'mystery', quantity: 1 }]))).toThrow(/unknown glaze/);
    const { fridge: _fridge, ...noFridge } = DEFAULT_EQUIPMENT;
    expect(() => planBake({ ...baseInput(saturday), equipment: noFridge as never })).toThrow(/equipment\.fridge/);
  });

  it('does not change its input when it succeeds', () => {
    const input = baseInput(saturday);
    const before = structuredClone(input);
    planBake(input);
    expect(input).toEqual(before);
  });
});

describe('properties (fast-check)', () => {
  const ordersArb = fc.array(fc.tuple(fc.nat({ max: MENU.length - 1 }), fc.integer({ min: 0, max: 60 })), { maxLength: 40 });

  it('more orders never mean less dough', () => {
    fc.assert(
      fc.property(ordersArb, fc.nat({ max: MENU.length - 1 }), fc.integer({ min: 1, max: 60 }), (lines, extraItem, extraQty) => {
        const orders = lines.map(([i, q]) => order(i, q));
        const before = planBake(baseInput(orders));
        const after = planBake(baseInput([...orders, order(extraItem, extraQty)]));
        expect(after.dough.doughGrams).toBeGreaterThanOrEqual(before.dough.doughGrams);
        expect(after.cuts.rings).toBeGreaterThanOrEqual(after.pieces.rings.toMake);
        expect(after.cuts.holes).toBeGreaterThanOrEqual(after.pieces.holes.toMake);
      }),
      // A fixed seed keeps CI reproducible; FC_SEED=random (with FC_RUNS=3000) explores further.
      process.env.FC_SEED === 'random'
        ? { numRuns: Number(process.env.FC_RUNS ?? 100) }
        : { numRuns: Number(process.env.FC_RUNS ?? 100), seed: 20261202 },
    );
  }, 60_000);

  it('one more ring in place of an extra hole never plans less dough (order sets random runs once found)', () => {
    // Each pair: an order set, then the same with one more vanilla ring. Both once planned about 80 g
    // less dough for the larger order, when the dough was stepped up from an estimate that allowed more
    // for one extra hole than for a ring.
    const sets = [
      [[3, 49], [0, 48]],
      [[3, 49], [0, 16], [0, 32]],
      [[0, 42], [3, 45], [0, 59], [3, 57]],
    ];
    for (const set of sets) {
      const orders = set.map(([i, q]) => order(i!, q!));
      const before = planBake(baseInput(orders));
      const after = planBake(baseInput([...orders, order(0, 1)]));
      expect(after.dough.doughGrams, JSON.stringify(set)).toBeGreaterThanOrEqual(before.dough.doughGrams);
      expect(after.cuts.short).toEqual({ rings: 0, holes: 0 });
    }
  });
});

const plan = planBake(baseInput(saturday));
const codes = (p: ReturnType<typeof planBake>) => p.warnings.map((w) => w.code);
const withEquipment = (orders: OrderLine[], change: (e: typeof DEFAULT_EQUIPMENT) => Partial<typeof DEFAULT_EQUIPMENT>): PlanBakeInput => {
  const input = baseInput(orders);
  return { ...input, equipment: { ...DEFAULT_EQUIPMENT, ...change(DEFAULT_EQUIPMENT) } };
};
const minutesBetween = (a: string, b: string) => (Date.parse(b) - Date.parse(a)) / 60_000;

describe('warnings as data', () => {
  it('none for a common bake (common practice, no source: a weekend pop-up with our demo kit)', () => {
    expect(planBake(baseInput(saturday)).warnings).toEqual([]);
  });

  it('every warning is { code, message } with a sentence', () => {
    const busy = planBake(baseInput([order(0, 400)]));
    expect(busy.warnings.length).toBeGreaterThan(0);
    for (const w of busy.warnings) {
      expect(Object.keys(w).sort()).toEqual(['code', 'message']);
      expect(w.message.length).toBeGreaterThan(20);
    }
  });

  it('cutter_wider_than_sheet: a 120 mm cutter on a 100 mm sheet cannot cut a ring', () => {
    const p = planBake(withEquipment(saturday, (e) => ({ cutter: { outerMm: 120, innerMm: 30 }, rolling: { ...e.rolling, widthMm: 100 } })));
    expect(codes(p)).toContain('cutter_wider_than_sheet');
    expect(p.cuts.firstRollSheet.ringsThatFit).toBe(0);
  });

  it('the first roll never plans more rings than its own sheet fits, and the note and warning say the same count (hand-worked layout in cutting.test.ts)', () => {
    // A narrow bench and little scrap make the first sheet the limit; the sheet's count comes from one layout.
    const tight = (orders: OrderLine[]) => withEquipment(orders, (e) => ({ rolling: { ...e.rolling, widthMm: 250, scrapPercent: 10 } }));
    let warned = 0;
    for (const rings of [6, 12, 20, 21, 30, 45, 60]) {
      const p = planBake(tight([order(0, rings)]));
      const first = p.cuts.rolls[0]!;
      expect(first.rings).toBeLessThanOrEqual(p.cuts.firstRollSheet.ringsThatFit);
      const w = p.warnings.find((x) => x.code === 'sheet_fits_fewer');
      if (w) {
        warned++;
        expect(first.rings).toBe(p.cuts.firstRollSheet.ringsThatFit);
        expect(w.message).toContain(`fits ${first.rings} rings`);
      }
      expect(p.cuts.rings).toBeGreaterThanOrEqual(p.pieces.rings.toMake);
    }
    expect(warned).toBeGreaterThan(0);
  });

  it('egg_rounding_shift: two rings need a sliver of egg, and one whole egg moves the dough by more than 2 %', () => {
    const p = planBake(baseInput([order(2, 2)]));
    expect(codes(p)).toContain('egg_rounding_shift');
    expect(codes(planBake(baseInput(saturday)))).not.toContain('egg_rounding_shift');
  });

  it('bowl_too_small: a 4.5 kg dough and a 4 kg bowl with time for one mix', () => {
    const p = planBake(withEquipment([order(2, 58)], () => ({ mixer: { capacityGrams: 4000, mixes: 1 } })));
    expect(p.mixes.reduce((s, m) => s + m.doughGrams, 0)).toBeGreaterThan(4000);
    expect(p.mixes).toHaveLength(2);
    expect(codes(p)).toContain('bowl_too_small');
  });

  it('nonexistent_local_time: America/Chicago skips 02:00–03:00 on 2027-03-14 (IANA tz database)', () => {
    const p = planBake({ ...baseInput(saturday), firstPickupStartsAt: '2027-03-14T02:30', now: '2027-03-01T12:00:00-06:00' });
    expect(codes(p)).toContain('nonexistent_local_time');
    expect(codes(planBake({ ...baseInput(saturday), firstPickupStartsAt: '2027-03-14T03:30', now: '2027-03-01T12:00:00-06:00' }))).not.toContain('nonexistent_local_time');
  });

  it('ambiguous_local_time: America/Chicago repeats 01:00–02:00 on 2026-11-01 (IANA tz database); read as the first, CDT', () => {
    const p = planBake({ ...baseInput(saturday), firstPickupStartsAt: '2026-11-01T01:30', now: '2026-10-20T12:00:00-05:00' });
    expect(codes(p)).toContain('ambiguous_local_time');
    expect(p.timeline.at(-1)!.endsAt).toBe('2026-11-01T01:30:00-05:00');
    const withOffset = planBake({ ...baseInput(saturday), firstPickupStartsAt: '2026-11-01T01:30:00-06:00', now: '2026-10-20T12:00:00-05:00' });
    expect(codes(withOffset)).not.toContain('ambiguous_local_time');
    expect(withOffset.timeline.at(-1)!.endsAt).toBe('2026-11-01T01:30:00-06:00');
  });

  it('across the 2026-11-01 fall-back the cold retard lasts its real elapsed time (IANA tz database: 02:00 CDT → 01:00 CST)', () => {
    const p = planBake({ ...baseInput(saturday), firstPickupStartsAt: '2026-11-01T09:00', now: '2026-10-20T12:00:00-05:00' });
    for (const step of p.timeline) expect(Math.abs(minutesBetween(step.startsAt, step.endsAt) - step.minutes)).toBeLessThanOrEqual(1);
    const retard = p.timeline.find((s) => s.step === 'cold-retard')!;
    expect(retard.startsAt).toMatch(/-05:00$/);
    expect(retard.endsAt).toMatch(/-06:00$/);
    expect(minutesBetween(retard.startsAt, retard.endsAt)).toBeGreaterThanOrEqual(DEFAULT_SCHEDULE.durationsMinutes['cold-retard']);
  });
});

describe('schedule steps start on five-minute marks (common practice, no source: bakers plan to round times)', () => {
  // Odd minutes of our own, so no step falls on a mark by itself; pickup on the night America/Chicago repeats
  // 01:00–02:00 (2026-11-01, IANA tz database).
  const odd = { ...DEFAULT_SCHEDULE, durationsMinutes: { ...DEFAULT_SCHEDULE.durationsMinutes, mix: 17, 'shape-and-chill': 13, 'cook-cool-roux': 41, pack: 19, 'roll-and-cut': 23 } };
  const inputs = [
    { ...baseInput(saturday), schedule: odd, firstPickupStartsAt: '2026-11-01T09:00', now: '2026-10-20T12:00:00-05:00' },
    { ...baseInput([order(0, 150), order(1, 90), order(3, 120)]), schedule: odd, firstPickupStartsAt: '2026-11-01T02:30', now: '2026-10-20T12:00:00-05:00' },
  ];
  const onMark = (iso: string) => Number(iso.slice(14, 16)) % 5 === 0 && iso.slice(17, 19) === '00';
  it.each(inputs.map((x, i) => [i, x] as const))('case %i: every step starts on a mark and keeps at least its own minutes; the fry timetable keeps its minutes', (_, input) => {
    const p = planBake(input);
    const own = odd.durationsMinutes;
    for (const step of p.timeline) {
      expect(onMark(step.startsAt), `${step.step} at ${step.startsAt}`).toBe(true);
      expect(Math.abs(minutesBetween(step.startsAt, step.endsAt) - step.minutes)).toBeLessThanOrEqual(1);
      if (step.step === 'mix' || step.step === 'shape-and-chill' || step.step === 'cook-cool-roux' || step.step === 'pack' || step.step === 'heat-oil') {
        expect(minutesBetween(step.startsAt, step.endsAt)).toBeGreaterThanOrEqual(own[step.step]);
      }
    }
    expect(onMark(p.firstStepAt) && onMark(p.preorderCutoffAt)).toBe(true);
    // The mixes list and the schedule give the same starts.
    const mixSteps = p.timeline.filter((s) => s.step === 'mix');
    expect(mixSteps.map((s) => s.startsAt)).toEqual(p.mixes.map((m) => m.mixAt));
    // Frying starts on a mark with the first batch; the batches keep their own minutes and stay in the fry step.
    const fry = p.timeline.find((s) => s.step === 'fry')!;
    const batches = p.fry.timetable.map((b) => Date.parse(b.at));
    expect(p.fry.timetable[0]!.at).toBe(fry.startsAt);
    expect(batches.some((t) => new Date(t).getUTCMinutes() % 5 !== 0)).toBe(true);
    for (let i = 1; i < batches.length; i++) expect(batches[i]!).toBeGreaterThan(batches[i - 1]!);
    expect(batches.at(-1)!).toBeLessThan(Date.parse(fry.endsAt));
    expect(Math.abs(fry.minutes - p.fry.minutes)).toBeLessThanOrEqual(1);
    expect(p.timeline.at(-1)!.endsAt).toBe(input.firstPickupStartsAt === '2026-11-01T09:00' ? '2026-11-01T09:00:00-06:00' : '2026-11-01T02:30:00-06:00');
  });

  it('a pickup 4 min later moves the cut-off later by 0 to 5 min, never earlier (marks only take a start back to the mark before it)', () => {
    const a = planBake(inputs[0]!);
    const b = planBake({ ...inputs[0]!, firstPickupStartsAt: '2026-11-01T09:04' });
    expect(Date.parse(b.preorderCutoffAt)).toBeGreaterThanOrEqual(Date.parse(a.preorderCutoffAt));
    expect(minutesBetween(a.preorderCutoffAt, b.preorderCutoffAt)).toBeLessThanOrEqual(5);
  });
});

describe('desired dough temperature on the sheet (King Arthur Baking rule)', () => {
  it('liquid = DDT × 5 − room − flour − starter − roux − friction, all at room temperature by default', () => {
    const d = plan.dough.temperature;
    expect(d.factors.map((f) => f.name)).toEqual(['Room', 'Flour', 'Starter', 'Milk roux']);
    expect(plan.dough.liquidTemperatureC).toBeCloseTo(5 * d.targetC - 4 * 22 - d.frictionC, 9);
    expect(d.liquid).toBe('Whole milk'); // the starter takes all the free water, so the milk sets the temperature
    expect(plan.timeline.find((s) => s.step === 'mix')!.lookFor).toContain('Bring the whole milk to');
  });

  it('a warmer flour asks for cooler milk, degree for degree', () => {
    const warm = planBake({ ...baseInput(saturday), doughTemperature: { ...DEFAULT_PLAN_SETTINGS.doughTemperature!, flourC: 25 } });
    expect(warm.dough.liquidTemperatureC).toBeCloseTo(plan.dough.liquidTemperatureC - 3, 9);
  });

  it('bulk fermentation of this dough takes 8–12 h in a 22 °C room (common practice, no source)', () => {
    expect(plan.bulkFermentationMinutes).toBeGreaterThanOrEqual(8 * 60);
    expect(plan.bulkFermentationMinutes).toBeLessThanOrEqual(12 * 60);
  });

  it('a warm room shortens bulk, final proof and the starter\'s peak; a cool one lengthens them (Forno Bravo +17 °F rule)', () => {
    const cool = planBake({ ...baseInput(saturday), roomTempC: 18 });
    const warm = planBake({ ...baseInput(saturday), roomTempC: 26 });
    expect(warm.bulkFermentationMinutes).toBeLessThan(cool.bulkFermentationMinutes);
    expect(warm.finalProofMinutes).toBeLessThan(cool.finalProofMinutes);
    expect(warm.starterPeakHours!).toBeLessThan(cool.starterPeakHours!);
    // The starter sits at room temperature: its peak follows the rule exactly, 8 °C = 14.4 °F apart.
    expect(cool.starterPeakHours! / warm.starterPeakHours!).toBeCloseTo(2 ** (14.4 / 17), 9);
  });
});

describe('several mixes', () => {
  const big = planBake(baseInput([order(0, 60), order(2, 60), order(3, 40)]));

  it('splits the dough into equal mixes that fit the bowl, each with its own starter, roux and whole eggs', () => {
    expect(big.mixes.length).toBeGreaterThan(1);
    const sum = big.mixes.reduce((s, m) => s + m.doughGrams, 0);
    expect(sum).toBeCloseTo(big.dough.doughGrams, 6);
    for (const m of big.mixes) {
      expect(m.doughGrams).toBeLessThanOrEqual(DEFAULT_EQUIPMENT.mixer.capacityGrams + 1e-9);
      expect(m.starter!.grams).toBeCloseTo(big.dough.starter!.grams / big.mixes.length, 6);
      expect(m.roux).not.toBeNull();
      expect(Number.isInteger(m.eggs!.count)).toBe(true);
      expect(m.feedStarterAt).not.toBeNull();
    }
  });

  it('staggers each mix by at least the mixing time, and each mix\'s steps follow each other', () => {
    for (let i = 1; i < big.mixes.length; i++) {
      expect(minutesBetween(big.mixes[i - 1]!.mixAt, big.mixes[i]!.mixAt)).toBeGreaterThanOrEqual(DEFAULT_SCHEDULE.durationsMinutes.mix);
      expect(Date.parse(big.mixes[i]!.rollAt)).toBeGreaterThanOrEqual(Date.parse(big.mixes[i - 1]!.rollAt));
    }
    for (const m of big.mixes) {
      const seq = [m.feedStarterAt!, m.mixAt, m.bulkFrom, m.bulkUntil, m.retardFrom, m.retardUntil, m.fryFrom, m.fryUntil].map(Date.parse);
      for (let i = 1; i < seq.length; i++) expect(seq[i]!).toBeGreaterThanOrEqual(seq[i - 1]!);
      expect(minutesBetween(m.retardFrom, m.retardUntil)).toBeGreaterThanOrEqual(DEFAULT_SCHEDULE.durationsMinutes['cold-retard'] - 1);
    }
  });
});

describe('steps for what the formula does not have', () => {
  it('a formula with no starter and no roux schedules neither, and its cut-off moves later by at least the starter\'s peak', () => {
    const plain = planBake({
      ...baseInput(saturday),
      formula: {
        ingredients: [
          { name: 'Bread flour', percent: 100, kind: 'flour' },
          { name: 'Whole milk', percent: 55, kind: 'milk' },
          { name: 'Whole eggs', percent: 5, kind: 'egg' },
          { name: 'Unsalted butter', percent: 12, kind: 'butter' },
          { name: 'Sugar', percent: 10, kind: 'sugar' },
          { name: 'Fine salt', percent: 1.8, kind: 'salt' },
          { name: 'Instant yeast', percent: 1, kind: 'other' },
        ],
      },
    });
    const steps = plain.timeline.map((s) => s.step);
    expect(steps).not.toContain('build-starter');
    expect(steps).not.toContain('cook-cool-roux');
    expect(plain.starter).toBeNull();
    expect(plain.dough.temperature.factors.map((f) => f.name)).toEqual(['Room', 'Flour']);
    expect(minutesBetween(plan.preorderCutoffAt, plain.preorderCutoffAt)).toBeGreaterThanOrEqual(plan.starterPeakHours! * 60 - 1);
  });
});

describe('the staged line', () => {
  it('proofs trays in turn: each tray\'s proof ends as its first batch goes in, and no more trays proof at once than there are', () => {
    const p = planBake(baseInput([order(0, 90), order(1, 60), order(3, 60)]));
    for (const t of p.line.trays) {
      expect(minutesBetween(t.proofFrom, t.fryAt)).toBeCloseTo(p.line.proofMinutes, -1);
      expect(Date.parse(t.cutAt)).toBeLessThanOrEqual(Date.parse(t.proofFrom));
    }
    expect(p.line.traysInUse).toBeLessThanOrEqual(DEFAULT_EQUIPMENT.proofing.trays);
    const starts = p.line.trays.map((t) => Date.parse(t.fryAt));
    expect(new Set(starts).size).toBe(starts.length);
  });

  it('re-rolled pieces proof after the first roll\'s', () => {
    const trays = plan.line.trays;
    const sheetRoll = new Map(plan.line.sheets.map((s) => [s.sheet, s.roll]));
    const firstRoll = trays.filter((t) => sheetRoll.get(t.sheet) === 1);
    const reroll = trays.filter((t) => sheetRoll.get(t.sheet) === 2);
    expect(reroll.length).toBeGreaterThan(0);
    const lastFirst = Math.max(...firstRoll.map((t) => Date.parse(t.proofFrom)));
    expect(Math.min(...reroll.map((t) => Date.parse(t.proofFrom)))).toBeGreaterThanOrEqual(Math.min(...firstRoll.map((t) => Date.parse(t.proofFrom))));
    expect(Math.max(...reroll.map((t) => Date.parse(t.proofFrom)))).toBeGreaterThanOrEqual(lastFirst);
  });

  it('glazing overlaps frying', () => {
    const fry = plan.timeline.find((s) => s.step === 'fry')!;
    const glaze = plan.timeline.find((s) => s.step === 'glaze')!;
    expect(Date.parse(glaze.startsAt)).toBeLessThan(Date.parse(fry.endsAt));
  });

  it('rolling, glazing and packing grow with the quantity at the baker\'s rates', () => {
    const small = planBake(baseInput([order(0, 12)]));
    const large = planBake(baseInput([order(0, 60), order(1, 40)]));
    const rolling = (p: typeof plan) => p.line.sheets.reduce((s, x) => s + minutesBetween(x.from, x.until), 0);
    expect(rolling(large)).toBeGreaterThan(rolling(small));
    expect(rolling(small)).toBeCloseTo(small.line.sheets.length * DEFAULT_SCHEDULE.rates!.rollMinutesPerSheet, -1);
    for (const step of ['glaze', 'pack'] as const) {
      expect(large.timeline.find((s) => s.step === step)!.minutes).toBeGreaterThan(small.timeline.find((s) => s.step === step)!.minutes);
    }
    const slowGlazer = planBake({ ...baseInput([order(0, 40)]), schedule: { ...DEFAULT_SCHEDULE, rates: { ...DEFAULT_SCHEDULE.rates!, glazeSecondsPerPiece: 120 } } });
    const normal = planBake(baseInput([order(0, 40)]));
    expect(minutesBetween(slowGlazer.line.glazeFrom, slowGlazer.line.glazeUntil)).toBeGreaterThan(minutesBetween(normal.line.glazeFrom, normal.line.glazeUntil));
  });

  it('the fry timetable lists every batch in order, with its pieces and the thermometer reading in the common 360–375 °F range (common practice, no source)', () => {
    const t = plan.fry.timetable;
    expect(t).toHaveLength(plan.fry.batches);
    expect(t.map((b) => b.batch)).toEqual(t.map((_, i) => i + 1));
    expect(t.reduce((s, b) => s + b.pieces, 0)).toBe(plan.cuts.rings + plan.cuts.holes);
    for (let i = 1; i < t.length; i++) expect(Date.parse(t[i]!.at)).toBeGreaterThan(Date.parse(t[i - 1]!.at));
    for (const b of t) {
      expect(b.waitForC).toBeGreaterThanOrEqual(fToC(360) - 1e-9);
      expect(b.waitForC).toBeLessThanOrEqual(fToC(375) + 1e-9);
      expect(b.lowestC).toBeGreaterThanOrEqual(DEFAULT_EQUIPMENT.oil.floorC - 1e-9);
      expect(b.glazes.reduce((s, g) => s + g.pieces, 0)).toBe(b.pieces);
    }
  });

  it('the oil floor default sits in the common frying range 360–375 °F, not on the "too cold" 350 °F line (common practice, no source)', () => {
    expect(DEFAULT_EQUIPMENT.oil.floorC).toBeGreaterThanOrEqual(fToC(360) - 1e-9);
    expect(DEFAULT_EQUIPMENT.oil.startC).toBeLessThanOrEqual(fToC(375) + 1e-9);
    expect(plan.fry.rings.perBatch).toBeGreaterThanOrEqual(2); // not the one ring a batch of the old model
  });
});

describe('frying fat and oil (USDA SR Legacy 18255, glazed yeast doughnut: 22.70 g fat per 100 g; BAKERpedia: 15–25 % of the fried weight)', () => {
  it('the fat taken up is 15–25 % of the fried weight and follows the pieces\' mass', () => {
    const friedGrams = plan.cuts.rings * plan.fry.rings.friedGrams + plan.cuts.holes * plan.fry.holes.friedGrams;
    const share = plan.fry.oilAbsorbedGrams / friedGrams;
    expect(share).toBeGreaterThanOrEqual(0.15);
    expect(share).toBeLessThanOrEqual(0.25);
    const heavy = planBake({ ...baseInput(saturday), equipment: { ...DEFAULT_EQUIPMENT, rolling: { ...DEFAULT_EQUIPMENT.rolling, measuredRingGrams: 80 } } });
    expect(heavy.fry.rings.fatGramsPerPiece / plan.fry.rings.fatGramsPerPiece).toBeCloseTo(80 / plan.pieces.ringGrams, 9);
  });

  it('says how much oil to buy and keeps the pot deep enough, with room above the hot oil', () => {
    expect(plan.shopping.oilFreshGrams).toBeGreaterThanOrEqual(plan.fry.oil.fillGrams);
    expect(plan.fry.oil.freeboardMm!).toBeGreaterThanOrEqual(plan.fry.oil.minFreeboardMm);
    const shallowPot = planBake(withEquipment(saturday, (e) => ({ pot: { ...e.pot, heightMm: 100 } })));
    expect(codes(shallowPot)).toContain('freeboard_too_small');
    const long = planBake(baseInput([order(0, 200), order(3, 60)]));
    expect(long.fry.oil.topUpGrams).toBeGreaterThan(0);
    expect(long.fry.timetable.some((b) => b.topUpGramsBefore > 0)).toBe(true);
  });
});

describe('cost and capacity', () => {
  it('a piece costs the same whatever the order count (none, a Saturday, a rush)', () => {
    const none = planBake(baseInput([]));
    const rush = planBake(baseInput([order(0, 300), order(3, 200)]));
    expect(none.cost.perPiece).toEqual(plan.cost.perPiece);
    expect(rush.cost.perPiece).toEqual(plan.cost.perPiece);
    expect(none.cost.perPiece[0]!.ringCents).toBeGreaterThan(10); // not the 2¢ of a cost spread over no dough
  });

  it('the fryer\'s capacity counts the hole batches in the same window', () => {
    const rings = [order(0, 30), order(2, 20)];
    const withHoles = planBake(baseInput(rings)).capacity.candidates.find((c) => c.limit === 'fry')!.pieces;
    const noHoles = planBake(withEquipment(rings, () => ({ cutter: { outerMm: 76, innerMm: 0 } }))).capacity.candidates.find((c) => c.limit === 'fry')!.pieces;
    expect(withHoles).toBeLessThan(noHoles);
  });
});

describe('dough variations', () => {
  const FLAVOURS: OrderLine[] = [
    { menuItemId: 'm-lemon', name: 'Lemon zest ring', kind: 'ring', glaze: 'vanilla-milk-glaze', quantity: 24, dough: 'lemon-zest' },
    { menuItemId: 'm-brown', name: 'Brown butter ring', kind: 'ring', glaze: 'cinnamon-sugar', quantity: 18, dough: 'brown-butter' },
    { menuItemId: 'm-plain', name: 'Plain ring', kind: 'ring', glaze: null, quantity: 12 },
  ];
  const v = planBake(baseInput(FLAVOURS));

  it('folds the add-ins into the lemon share at its grams per kg, and mixes the brown-butter dough of its own formula', () => {
    const lemon = v.variations.find((x) => x.id === 'lemon-zest')!;
    const zest = lemon.addIns.find((a) => a.name === 'Lemon zest')!;
    expect(zest.grams).toBeCloseTo((10 * lemon.doughGrams) / 1.01 / 1000, 6);
    const lemonPortions = v.mixes.flatMap((m) => m.portions.filter((p) => p.dough === 'lemon-zest'));
    expect(lemonPortions.reduce((s, p) => s + p.addIns[0]!.grams, 0)).toBeCloseTo(zest.grams, 6);
    expect(v.mixes.some((m) => m.formulaOf === 'brown-butter')).toBe(true);
    expect(v.mixes.filter((m) => m.formulaOf === null).every((m) => m.portions.every((p) => p.dough !== 'brown-butter'))).toBe(true);
  });

  it('keeps each flavour\'s pieces apart on trays and in the fryer, so the glazes land on the right ones', () => {
    for (const t of v.line.trays) expect(['lemon-zest', 'brown-butter', null]).toContain(t.dough);
    const glazedBy = (dough: string | null, glazeId: string | null) => v.fry.timetable
      .filter((b) => b.dough === dough && b.kind === 'ring')
      .reduce((s, b) => s + b.glazes.filter((g) => g.glazeId === glazeId).reduce((x, g) => x + g.pieces, 0), 0);
    expect(glazedBy('lemon-zest', 'vanilla-milk-glaze')).toBe(24);
    expect(glazedBy('brown-butter', 'cinnamon-sugar')).toBe(18);
    expect(glazedBy('lemon-zest', 'cinnamon-sugar')).toBe(0);
    for (const b of v.fry.timetable) expect(v.line.trays[b.tray - 1]!.dough).toBe(b.dough);
  });

  it('costs each flavour\'s pieces with its own dough, whatever is ordered (worked example in cost.test.ts)', () => {
    const priced = (orders: OrderLine[], zestCentsPerKg: number) => {
      const input = baseInput(orders);
      return planBake({ ...input, prices: { ...input.prices, centsPerKg: { ...input.prices.centsPerKg, 'Lemon zest': zestCentsPerKg, 'Browned butter': 1100, 'Roux flour': 190 } } });
    };
    const cheap = priced(FLAVOURS, 0).cost.perDough.find((d) => d.dough === 'lemon-zest')!;
    const dear = priced(FLAVOURS, 40_000).cost.perDough.find((d) => d.dough === 'lemon-zest')!;
    // 10 g of zest per kg at $400/kg is 4 ¢ per kg of base dough: a ring of about 55 g dough gets dearer.
    expect(dear.perPiece[0]!.ringCents).toBeGreaterThan(cheap.perPiece[0]!.ringCents);
    expect(priced([], 40_000).cost.perDough).toEqual(priced(FLAVOURS, 40_000).cost.perDough);
    // The brown-butter dough costs as its own formula would as the base dough.
    const brown = DEFAULT_PLAN_SETTINGS.doughs!.find((d) => d.id === 'brown-butter')!;
    const none = priced([], 0);
    const asBase = planBake({ ...baseInput([]), formula: brown.formula!, prices: { ...baseInput([]).prices, centsPerKg: { ...baseInput([]).prices.centsPerKg, 'Browned butter': 1100, 'Roux flour': 190 } } });
    expect(none.cost.perDough.find((d) => d.dough === 'brown-butter')!.perPiece).toEqual(asBase.cost.perPiece);
  });

  it('refuses a flavour\'s own formula that cannot be mixed, ordered or not, naming the dough', () => {
    const input = baseInput([]);
    const bad = { id: 'bad', name: 'Bad dough', formula: { ingredients: [{ name: 'Bread flour', percent: 90, kind: 'flour' as const }, { name: 'Water', percent: 60, kind: 'water' as const }] } };
    expect(() => planBake({ ...input, doughs: [...input.doughs!, bad] })).toThrow(/doughs\[2\]\.formula\.ingredients: the flour lines must add up to 100 %/);
  });
});

describe('the liquid temperature warning', () => {
  it('stays quiet for warm milk in a cool 21 °C kitchen, and speaks up when the milk would have to be scalding', () => {
    expect(codes(planBake({ ...baseInput(saturday), roomTempC: 21 }))).not.toContain('liquid_temperature_out_of_range');
    const cold = planBake({ ...baseInput(saturday), roomTempC: 15 });
    expect(cold.dough.liquidTemperatureC).toBeGreaterThan(45);
    expect(codes(cold)).toContain('liquid_temperature_out_of_range');
  });
});
