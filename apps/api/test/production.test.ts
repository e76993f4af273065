import { beforeEach, describe, expect, it } from 'vitest';
import { BakeDay } from '../src/db/models/index.js';
import { Browser, signIn, useStack } from './support.js';
import { halfDozen, mixedDozen, openDay, orderAndPay } from './order-helpers.js';
import { planForBakeDay } from '../src/services/production/production.js';

const stack = useStack();
let baker: Browser;
let owner: Browser;
beforeEach(async () => {
  baker = new Browser(stack.url);
  await signIn(baker, 'baker@fryline.test');
  owner = new Browser(stack.url);
  await signIn(owner, 'owner@fryline.test');
});

describe('the production sheet route', () => {
  it('is for the baker and owner only', async () => {
    const day = await openDay(stack);
    const counter = new Browser(stack.url);
    await signIn(counter, 'counter@fryline.test');
    expect((await counter.getJson(`/api/bake-days/${day.id}/plan`)).status).toBe(403);
    const customer = new Browser(stack.url);
    await signIn(customer, 'customer@fryline.test');
    expect((await customer.getJson(`/api/bake-days/${day.id}/plan`)).status).toBe(403);
    expect((await owner.getJson(`/api/bake-days/${day.id}/plan`)).status).toBe(200);
  });

  it('counts the paid and held orders, and more orders mean more dough', async () => {
    const day = await openDay(stack);
    const empty = await baker.getJson(`/api/bake-days/${day.id}/plan`);
    expect(empty.body.meta.ordersCounted).toBe(0);
    const customer = new Browser(stack.url);
    await signIn(customer, 'customer@fryline.test');
    await orderAndPay(stack, customer, mixedDozen(day));
    const other = new Browser(stack.url);
    await signIn(other, 'second.customer@example.test');
    await other.send('POST', '/api/orders', halfDozen(day));
    const res = await baker.getJson(`/api/bake-days/${day.id}/plan`);
    expect(res.status).toBe(200);
    expect(res.body.meta).toMatchObject({ ordersCounted: 2, paidOrders: 1, heldOrders: 1 });
    expect(res.body.plan.pieces.rings.ordered).toBe(18);
    expect(res.body.plan.dough.doughGrams).toBeGreaterThan(empty.body.plan.dough.doughGrams);
    // the schedule is worked back from the first pickup window and ends before it
    const timeline = res.body.plan.timeline as Array<{ startsAt: string; endsAt: string }>;
    expect(new Date(timeline.at(-1)!.endsAt).getTime()).toBeLessThanOrEqual(new Date(day.pickupWindows[0]!.startsAt).getTime());
    expect(res.body.plan.cautions.join(' ')).toMatch(/water/i);
  });

  it('reuses a plan while nothing it was worked out from changes, and works it out again when an order comes or the clock passes the cut-off', async () => {
    const day = await openDay(stack);
    const customer = new Browser(stack.url);
    await signIn(customer, 'customer@fryline.test');
    await orderAndPay(stack, customer, mixedDozen(day));
    const first = await baker.getJson(`/api/bake-days/${day.id}/plan`);
    const again = await baker.fetch(`/api/bake-days/${day.id}/plan`);
    expect(again.headers.get('content-type')).toBe('application/json; charset=utf-8');
    expect(again.headers.get('cache-control')).toBe('no-store');
    expect(((await again.json()) as typeof first.body).plan).toEqual(first.body.plan);
    const now = new Date();
    const a = await planForBakeDay(day.id, now);
    expect((await planForBakeDay(day.id, new Date(now.getTime() + 1000))).plan).toBe(a.plan);
    const codes = (p: { warnings: Array<{ code: string }> }) => p.warnings.map((w) => w.code);
    expect(codes(a.plan)).not.toContain('cutoff_passed');
    const afterCutoff = (await planForBakeDay(day.id, new Date(Date.parse(a.plan.preorderCutoffAt) + 60_000))).plan;
    expect(codes(afterCutoff)).toContain('cutoff_passed');
    const tooLate = (await planForBakeDay(day.id, new Date(Date.parse(a.plan.firstStepAt) + 60_000))).plan;
    expect(codes(tooLate)).toContain('schedule_cannot_be_met');
    expect((await planForBakeDay(day.id, new Date(now.getTime() + 2000))).plan.warnings).toEqual(a.plan.warnings);
    const other = new Browser(stack.url);
    await signIn(other, 'second.customer@example.test');
    await other.send('POST', '/api/orders', halfDozen(day));
    expect((await planForBakeDay(day.id, now)).plan.pieces.rings.ordered).toBe(a.plan.pieces.rings.ordered + 6);
  });

  it('returns the dough temperature, the mixes, the fry timetable, the fat taken up and the warnings as data', async () => {
    const day = await openDay(stack);
    const customer = new Browser(stack.url);
    await signIn(customer, 'customer@fryline.test');
    await orderAndPay(stack, customer, mixedDozen(day));
    const { plan } = (await baker.getJson(`/api/bake-days/${day.id}/plan`)).body;
    expect(typeof plan.dough.liquidTemperatureC).toBe('number');
    expect(plan.mixes.length).toBeGreaterThan(0);
    for (const mix of plan.mixes) {
      expect(mix.doughGrams).toBeGreaterThan(0);
      expect(Array.isArray(mix.ingredients)).toBe(true);
    }
    expect(plan.fry.timetable.length).toBe(plan.fry.batches);
    expect(plan.fry.timetable[0]).toMatchObject({ batch: 1, pieces: expect.any(Number), waitForC: expect.any(Number) });
    expect(plan.fry.oilAbsorbedGrams).toBeGreaterThan(0);
    for (const w of plan.warnings) expect(Object.keys(w).sort()).toEqual(['code', 'message']);
  });

  it('makes a flavour\'s pieces from the dough the owner named for it, and keeps them apart in the fryer', async () => {
    const day = await openDay(stack);
    const brown = day.menu.find((m) => m.flavour === 'Brown butter');
    expect(brown).toBeDefined();
    const customer = new Browser(stack.url);
    await signIn(customer, 'customer@fryline.test');
    await orderAndPay(stack, customer, {
      bakeDayId: day.id,
      pickupWindowId: day.pickupWindows[0]!.id,
      boxes: [{ size: 'half-dozen', items: [{ menuItemId: brown!.id, quantity: 6 }] }],
    });
    const { plan } = (await baker.getJson(`/api/bake-days/${day.id}/plan`)).body;
    expect(plan.mixes.some((m: any) => m.formulaOf === 'brown-butter')).toBe(true);
    const brownBatches = plan.fry.timetable.filter((b: any) => b.dough === 'brown-butter' && b.kind === 'ring');
    expect(brownBatches.reduce((s: number, b: any) => s + b.pieces, 0)).toBeGreaterThanOrEqual(6);
  });

  it('keeps the formula version a day was planned with until the baker switches on purpose', async () => {
    const day = await openDay(stack);
    const first = await baker.getJson(`/api/bake-days/${day.id}/plan`);
    expect(first.body.meta.formula.version).toBe(1);
    const formulas = await baker.getJson('/api/production/formulas');
    const changed = structuredClone(formulas.body.current.formula);
    changed.ingredients.find((i: any) => i.kind === 'sugar').percent = 12;
    const saved = await baker.send('POST', '/api/production/formulas', { formula: changed, note: 'A little sweeter' });
    expect(saved.status).toBe(201);
    expect(saved.body.version).toBe(2);
    const again = await baker.getJson(`/api/bake-days/${day.id}/plan`);
    expect(again.body.meta.formula.version).toBe(1);
    expect(again.body.meta.latestFormulaVersion).toBe(2);
    const pinned = await baker.send('POST', `/api/bake-days/${day.id}/formula`, { formulaVersionId: saved.body.id });
    expect(pinned.body.meta.formula.version).toBe(2);
  });

  it('refuses a formula whose flour does not add up to 100 % and saves nothing', async () => {
    const formulas = await baker.getJson('/api/production/formulas');
    const broken = structuredClone(formulas.body.current.formula);
    broken.ingredients.find((i: any) => i.kind === 'flour').percent = 90;
    const res = await baker.send('POST', '/api/production/formulas', { formula: broken });
    expect(res.status).toBe(400);
    expect((await baker.getJson('/api/production/formulas')).body.current.version).toBe(1);
  });
});

describe('equipment and capacity', () => {
  it('stores the desired dough temperature, the burner, the pot, the trays, the baker\'s rates and the flavoured doughs', async () => {
    const { updatedAt: _u, ...body } = (await owner.getJson('/api/production/settings')).body;
    const changed = structuredClone(body);
    changed.dough.temperature = { ...changed.dough.temperature, targetC: 26, frictionC: 8, flourC: 19 };
    changed.dough.eggClass = 'medium';
    changed.dough.variations = [{ id: 'orange-zest', name: 'Orange zest dough', flavours: ['Orange'], addIns: [{ name: 'Orange zest', gramsPerKg: 12 }], addAt: 'at-shaping' }];
    changed.equipment.burner = { watts: 3000, efficiencyPercent: 45 };
    changed.equipment.pot = { ...changed.equipment.pot, massGrams: 3000, material: 'stainless-steel', heightMm: 180 };
    changed.equipment.proofing = { ...changed.equipment.proofing, trayWidthMm: 300, trayLengthMm: 400 };
    changed.equipment.mixer = { capacityGrams: 6000, mixes: 3 };
    changed.schedule.rates = { rollMinutesPerSheet: 9, rerollRestMinutes: 15, glazeSecondsPerPiece: 6, packSecondsPerBox: 30 };
    const saved = await owner.send('PUT', '/api/production/settings', changed);
    expect(saved.status).toBe(200);
    const again = (await owner.getJson('/api/production/settings')).body;
    expect(again.dough).toEqual(changed.dough);
    expect(again.equipment.burner).toEqual({ watts: 3000, efficiencyPercent: 45 });
    expect(again.equipment.pot).toMatchObject({ massGrams: 3000, material: 'stainless-steel', heightMm: 180 });
    expect(again.schedule.rates.rollMinutesPerSheet).toBe(9);
    const clash = structuredClone(changed);
    clash.dough.variations.push({ id: 'orange-two', name: 'Another', flavours: ['orange'], addIns: [] });
    const refused = await owner.send('PUT', '/api/production/settings', clash);
    expect(refused.status).toBe(400);
    expect((await owner.getJson('/api/production/settings')).body.dough.variations).toHaveLength(1);
  });

  it('saves a flavour\'s dough of its own formula version, and refuses one that cannot be mixed, changing nothing', async () => {
    const { updatedAt: _u, ...body } = (await owner.getJson('/api/production/settings')).body;
    const own = structuredClone((await owner.getJson('/api/production/formulas')).body.current.formula);
    own.ingredients.find((i: any) => i.kind === 'sugar').percent += 4;
    const changed = structuredClone(body);
    changed.dough.variations = [{ id: 'honey-dough', name: 'Honey dough', flavours: ['Honey'], formula: own }];
    const saved = await owner.send('PUT', '/api/production/settings', changed);
    expect(saved.status).toBe(200);
    expect((await owner.getJson('/api/production/settings')).body.dough.variations).toEqual(changed.dough.variations);

    // Flour lines at 90 %: the contract's own check names the field.
    const flour = structuredClone(changed);
    flour.dough.variations[0].formula.ingredients.find((i: any) => i.kind === 'flour').percent = 90;
    const refusedFlour = await owner.send('PUT', '/api/production/settings', flour);
    expect(refusedFlour.status).toBe(400);
    expect(Object.keys(refusedFlour.body.error.details.fields)).toContain('dough.variations.0.formula.ingredients');
    // A roux-milk line with no roux flour passes the contract; the bake maths refuses it, naming the dough.
    const roux = structuredClone(changed);
    roux.dough.variations[0].formula.ingredients = roux.dough.variations[0].formula.ingredients.filter((i: any) => i.kind !== 'roux-flour');
    if (!roux.dough.variations[0].formula.ingredients.some((i: any) => i.kind === 'roux-milk')) roux.dough.variations[0].formula.ingredients.push({ name: 'Roux milk', percent: 10, kind: 'roux-milk' });
    const refusedRoux = await owner.send('PUT', '/api/production/settings', roux);
    expect(refusedRoux.status).toBe(400);
    expect(Object.keys(refusedRoux.body.error.details.fields)[0]).toMatch(/^doughs\[0\]\.formula\./);
    expect((await owner.getJson('/api/production/settings')).body.dough.variations).toEqual(changed.dough.variations);
  });

  it('lets only the owner change equipment; bad settings get 400 and change nothing', async () => {
    const settings = (await owner.getJson('/api/production/settings')).body;
    const { updatedAt: _u, ...body } = settings;
    expect((await baker.send('PUT', '/api/production/settings', body)).status).toBe(403);
    const bad = structuredClone(body);
    bad.equipment.oil.floorC = bad.equipment.oil.startC + 5;
    const refused = await owner.send('PUT', '/api/production/settings', bad);
    expect(refused.status).toBe(400);
    expect(Object.keys(refused.body.error.details.fields)).toContain('equipment.oil.floorC');
    const good = structuredClone(body);
    good.equipment.proofing.trays = 4;
    const saved = await owner.send('PUT', '/api/production/settings', good);
    expect(saved.status).toBe(200);
    expect(saved.body.dough.temperature.targetC).toBeCloseTo(body.dough.temperature.targetC, 9);
    const capacity = await owner.getJson('/api/production/capacity');
    expect(capacity.body).toMatchObject({ pieces: 48, limitedBy: 'proofing-trays' });
  });

  it('sets a bake day lower than the equipment freely, higher only when confirmed, never below what is sold', async () => {
    const day = await openDay(stack);
    const derived = (await owner.getJson('/api/production/capacity')).body;
    const lower = await owner.send('POST', `/api/bake-days/${day.id}/capacity`, { rings: derived.pieces - 10, holes: 50 });
    expect(lower.status).toBe(200);
    expect(lower.body.remaining.rings).toBe(derived.pieces - 10);
    const higher = await owner.send('POST', `/api/bake-days/${day.id}/capacity`, { rings: derived.pieces + 50, holes: 50 });
    expect(higher.status).toBe(409);
    expect(higher.body.error.code).toBe('above_equipment');
    const confirmed = await owner.send('POST', `/api/bake-days/${day.id}/capacity`, { rings: derived.pieces + 50, holes: 50, acceptAboveEquipment: true });
    expect(confirmed.status).toBe(200);
    const customer = new Browser(stack.url);
    await signIn(customer, 'customer@fryline.test');
    await orderAndPay(stack, customer, mixedDozen(day));
    const below = await owner.send('POST', `/api/bake-days/${day.id}/capacity`, { rings: 6, holes: 50 });
    expect(below.status).toBe(409);
    expect(below.body.error.code).toBe('below_sold');
    expect((await BakeDay.findByPk(day.id))!.ringCapacity).toBe(derived.pieces + 50);
  });
});
