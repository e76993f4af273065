import { beforeEach, describe, expect, it } from 'vitest';
import { BakeDay } from '../src/db/models/index.js';
import { Browser, signIn, useStack } from './support.js';
import { halfDozen, mixedDozen, openDay, orderAndPay } from './order-helpers.js';

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
