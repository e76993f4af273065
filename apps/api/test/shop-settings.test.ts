import { beforeEach, describe, expect, it } from 'vitest';
import { AuditEntry, Order, ShopSettings } from '../src/db/models/index.js';
import { useStack } from './support.js';
import { signedInAgent, type Agent } from './owner-helpers.js';
import { halfDozen, openDay } from './order-helpers.js';

const stack = useStack();
let owner: Agent;
beforeEach(async () => {
  owner = await signedInAgent(stack, 'owner@fryline.test');
});

const settings = {
  shopName: 'Brindle & Bell Doughnuts',
  timeZone: 'America/Chicago',
  currency: 'usd',
  tax: { mode: 'added', rateBasisPoints: 825 },
  holdMinutes: 15,
  noShowGraceMinutes: 20,
  refundPolicy: 'Cancel before orders close for a full refund. After that, we refund only if we call the bake day off.',
};

describe('shop settings', () => {
  it('starts from the demo shop and a standard refund policy', async () => {
    const res = await owner.get('/api/staff/shop-settings');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ shopName: 'Brindle & Bell Doughnuts', timeZone: 'America/Denver', currency: 'usd', noShowGraceMinutes: 30, holdMinutes: 10 });
    expect(res.body.refundPolicy).toMatch(/full refund/);
  });

  it('saves every setting, logs what changed from and to, and the shop shows the refund policy', async () => {
    const res = await owner.put('/api/staff/shop-settings').send(settings);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject(settings);
    const row = (await ShopSettings.findByPk(1))!;
    expect(row).toMatchObject({ taxMode: 'added', taxRateBp: 825, noShowGraceMinutes: 20, holdMinutes: 15, timeZone: 'America/Chicago' });
    const entry = (await AuditEntry.findOne({ where: { action: 'shop.settings' } }))!;
    const changes = (entry.details as any).changes;
    expect(Object.keys(changes).sort()).toEqual(['holdMinutes', 'noShowGraceMinutes', 'refundPolicy', 'tax', 'timeZone']);
    expect(changes.noShowGraceMinutes).toEqual({ from: 30, to: 20 });
    const shop = (await (await fetch(`${stack.url}/api/shop`)).json()) as any;
    expect(shop).toEqual({ name: settings.shopName, logoUrl: null, shopName: settings.shopName, currency: 'usd', timeZone: 'America/Chicago', refundPolicy: settings.refundPolicy, holdMinutes: 15 });
    // the bake days show customers the new tax
    const days = (await (await fetch(`${stack.url}/api/bake-days`)).json()) as any[];
    expect(days[0].tax).toEqual({ mode: 'added', rateBasisPoints: 825 });
  });

  it('holds a new order for as long as the settings say', async () => {
    await owner.put('/api/staff/shop-settings').send({ ...settings, tax: { mode: 'included', rateBasisPoints: 0 }, holdMinutes: 25 });
    const customer = await signedInAgent(stack, 'customer@fryline.test');
    const day = await openDay(stack);
    const before = Date.now();
    const res = await customer.post('/api/orders').send(halfDozen(day));
    expect(res.status).toBe(201);
    const held = (await Order.findByPk(res.body.id))!;
    const minutes = (held.holdExpiresAt!.getTime() - before) / 60_000;
    expect(minutes).toBeGreaterThan(24.5);
    expect(minutes).toBeLessThan(25.5);
  });

  it.each([
    ['an unknown time zone', { timeZone: 'Atlantis/Deep' }, 'timeZone'],
    ['a currency we cannot take', { currency: 'xyz' }, 'currency'],
    ['a tax rate above 50 %', { tax: { mode: 'added', rateBasisPoints: 6000 } }, 'tax.rateBasisPoints'],
    ['a hold shorter than 5 minutes', { holdMinutes: 2 }, 'holdMinutes'],
    ['a grace period of a day and more', { noShowGraceMinutes: 1441 }, 'noShowGraceMinutes'],
    ['an empty refund policy', { refundPolicy: '  ' }, 'refundPolicy'],
  ])('refuses %s with the field named, and changes nothing', async (_name, change, field) => {
    const before = (await ShopSettings.findByPk(1))!.toJSON();
    const res = await owner.put('/api/staff/shop-settings').send({ ...settings, ...change });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.details.fields)).toContain(field);
    expect((await ShopSettings.findByPk(1))!.toJSON()).toEqual(before);
    expect(await AuditEntry.count({ where: { action: 'shop.settings' } })).toBe(0);
  });

  it('is for the owner only', async () => {
    for (const email of ['baker@fryline.test', 'counter@fryline.test', 'customer@fryline.test']) {
      const someone = await signedInAgent(stack, email);
      expect((await someone.get('/api/staff/shop-settings')).status).toBe(403);
      expect((await someone.put('/api/staff/shop-settings').send(settings)).status).toBe(403);
    }
    expect((await ShopSettings.findByPk(1))!.timeZone).toBe('America/Denver');
  });
});
