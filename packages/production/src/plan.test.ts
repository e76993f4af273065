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

  it('mixes dough whose final-dough grams add up to the target, with a whole number of eggs (USDA SR Legacy large egg 50 g)', () => {
    const total = plan.dough.finalDough.reduce((s, r) => s + r.grams, 0);
    expect(total).toBeCloseTo(plan.dough.doughGrams, 6);
    expect(Number.isInteger(plan.dough.eggs!.count)).toBe(true);
    expect(plan.dough.eggs!.count).toBe(Math.max(1, Math.round(plan.dough.eggs!.grams / 50)));
    expect(plan.roux!.milkGrams).toBeCloseTo(plan.roux!.flourGrams * 5, 9); // 1:5 roux, common practice
    expect(plan.starter!.hoursBeforeMix).toBeGreaterThanOrEqual(3); // starter peak 4 ± 1 h, common practice
    expect(plan.starter!.hoursBeforeMix).toBeLessThanOrEqual(5);
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
    expect(plan.timeline.find((s) => s.step === 'fry')!.minutes).toBe(Math.ceil(plan.fry.minutes - 1e-9));
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
    expect(busy.warnings.some((w) => w.includes('more than the equipment\'s capacity'))).toBe(true);
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
    expect(empty.timeline).toHaveLength(13);
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
      { numRuns: 150 },
    );
  });
});
