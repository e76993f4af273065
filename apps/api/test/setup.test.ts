import { describe, expect, it, beforeEach } from 'vitest';
import { DateTime } from 'luxon';
import { BakeDay, User } from '../src/db/models/index.js';
import { Browser, signIn, useStack } from './support.js';

const stack = useStack();
let owner: Browser;
beforeEach(async () => {
  owner = new Browser(stack.url);
  await signIn(owner, 'owner@fryline.test');
});

async function newDayBody(overrides: Record<string, unknown> = {}) {
  const menu = (await owner.getJson('/api/staff/menu-items')).body as Array<{ id: string; kind: string }>;
  const date = DateTime.now().setZone('America/Chicago').plus({ days: 10 }).toISODate();
  return {
    date,
    place: 'Old depot platform',
    address: '5 Siding Lane',
    timeZone: 'America/Chicago',
    windows: [
      { start: '09:00', end: '10:00', maxOrders: 20 },
      { start: '10:00', end: '11:30' },
    ],
    menuItemIds: menu.map((m) => m.id),
    boxes: [
      { size: 'dozen', pieces: 12, priceCents: 3200 },
      { size: 'holes', pieces: 12, priceCents: 900 },
    ],
    ringCapacity: 60,
    holeCapacity: 48,
    ...overrides,
  };
}

describe('the owner announces a bake day', () => {
  it('creates it with windows at local clock times and a cut-off worked back from the schedule', async () => {
    const res = await owner.send('POST', '/api/staff/bake-days', await newDayBody());
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ place: 'Old depot platform', status: 'open', remaining: { rings: 60, holes: 48 } });
    const first = DateTime.fromISO(res.body.pickupWindows[0].startsAt).setZone('America/Chicago');
    expect(first.toFormat('HH:mm')).toBe('09:00');
    expect(res.body.pickupWindows[0].ordersLeft).toBe(20);
    expect(res.body.pickupWindows[1].ordersLeft).toBeNull();
    const cutoff = DateTime.fromISO(res.body.cutoffAt);
    expect(cutoff < first).toBe(true);
    expect(cutoff.setZone('America/Chicago').minute % 15).toBe(0);
    // the baker's sheet for it ends before the first pickup
    const plan = await owner.getJson(`/api/bake-days/${res.body.id}/plan`);
    expect(new Date(plan.body.plan.preorderCutoffAt).getTime()).toBeGreaterThanOrEqual(cutoff.toMillis());
    // customers see it
    const listed = (await (await fetch(`${stack.url}/api/bake-days`)).json()) as Array<{ id: string }>;
    expect(listed.map((d) => d.id)).toContain(res.body.id);
  });

  it.each([
    ['an unknown time zone', { timeZone: 'Mars/Olympus' }, 'timeZone'],
    ['overlapping windows', { windows: [{ start: '09:00', end: '10:30' }, { start: '10:00', end: '11:00' }] }, 'windows'],
    ['a window that ends before it starts', { windows: [{ start: '11:00', end: '10:00' }] }, 'windows.0.end'],
    ['a past date', { date: '2020-01-04' }, 'date'],
    ['a client-sent status', { status: 'published' }, 'status'],
  ])('refuses %s with 400 and creates nothing', async (_name, overrides, field) => {
    const before = await BakeDay.count();
    const res = await owner.send('POST', '/api/staff/bake-days', await newDayBody(overrides));
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.details.fields)).toContain(field);
    expect(await BakeDay.count()).toBe(before);
  });

  it('keeps a draft away from customers until the owner publishes it', async () => {
    const draft = await owner.send('POST', '/api/staff/bake-days', await newDayBody({ publish: false, place: 'Draft corner' }));
    expect(draft.status).toBe(201);
    const shopIds = async () => ((await (await fetch(`${stack.url}/api/bake-days`)).json()) as Array<{ id: string }>).map((d) => d.id);
    expect(await shopIds()).not.toContain(draft.body.id);
    expect((await owner.getJson('/api/staff/bake-days/drafts')).body.map((d: any) => d.id)).toEqual([draft.body.id]);
    const published = await owner.send('POST', `/api/staff/bake-days/${draft.body.id}/publish`);
    expect(published.status).toBe(200);
    expect(published.body.status).toBe('open');
    expect(await shopIds()).toContain(draft.body.id);
    expect((await owner.getJson('/api/staff/bake-days/drafts')).body).toEqual([]);
  });

  it('asks before offering more than the equipment makes, and only the owner may create', async () => {
    const tooMany = await owner.send('POST', '/api/staff/bake-days', await newDayBody({ ringCapacity: 5000 }));
    expect(tooMany.status).toBe(409);
    expect(tooMany.body.error.code).toBe('above_equipment');
    const baker = new Browser(stack.url);
    await signIn(baker, 'baker@fryline.test');
    expect((await baker.send('POST', '/api/staff/bake-days', await newDayBody())).status).toBe(403);
  });
});

describe('the owner manages staff', () => {
  it('gives a new address the counter role, which applies when that person signs in verified', async () => {
    const added = await owner.send('POST', '/api/staff/members', { email: 'New.Helper@Example.test', name: 'New Helper', role: 'counter' });
    expect(added.status).toBe(201);
    expect(added.body).toMatchObject({ email: 'new.helper@example.test', role: 'counter', signedIn: false });
    const helper = new Browser(stack.url);
    await signIn(helper, 'new.helper@example.test');
    expect((await helper.getJson('/api/me')).body.role).toBe('counter');
    const list = await owner.getJson('/api/staff/members');
    expect(list.body.find((m: any) => m.email === 'new.helper@example.test')).toMatchObject({ signedIn: true });
    // back to customer: staff routes close at once
    const demoted = await owner.send('PATCH', `/api/staff/members/${added.body.id}`, { role: 'customer' });
    expect(demoted.status).toBe(204);
    expect((await helper.getJson(`/api/staff/bake-days/past`)).status).toBe(403);
  });

  it('keeps at least one owner, and an owner cannot demote themselves', async () => {
    const me = (await owner.getJson('/api/me')).body;
    const self = await owner.send('PATCH', `/api/staff/members/${me.id}`, { role: 'baker' });
    expect(self.status).toBe(409);
    expect(self.body.error.code).toBe('own_role');
    expect((await User.findByPk(me.id))!.role).toBe('owner');
  });
});
