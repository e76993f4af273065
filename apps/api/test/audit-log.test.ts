import { beforeEach, describe, expect, it } from 'vitest';
import { AuditEntry, User } from '../src/db/models/index.js';
import { database } from '../src/db/sequelize.js';
import { useStack } from './support.js';
import { signedInAgent, type Agent } from './owner-helpers.js';

const stack = useStack();
let owner: Agent;
let ownerId: string;
let bakerId: string;
beforeEach(async () => {
  owner = await signedInAgent(stack, 'owner@fryline.test');
  ownerId = (await User.findOne({ where: { email: 'owner@fryline.test' } }))!.id;
  bakerId = (await User.findOne({ where: { email: 'baker@fryline.test' } }))!.id;
});

/** Writes entries as other parts of the app do, at chosen moments. */
async function entry(actorId: string | null, action: string, at: string, subjectType = 'bake_day', details: Record<string, unknown> = {}) {
  const row = await AuditEntry.create({ actorId, action, subjectType, subjectId: null, details });
  await database().query('UPDATE audit_log SET created_at = :at WHERE id = :id', { replacements: { at, id: row.id } });
}

describe('the audit log', () => {
  it('gives every entry a kind from its action, for any part of the app that writes one', async () => {
    await database().query('DELETE FROM audit_log');
    const cases: Array<[string, string]> = [
      ['bake_day.capacity', 'capacity'],
      ['bake_day.called_off', 'call-offs'],
      ['order.refunded', 'refunds'],
      ['menu.price_changed', 'prices'],
      ['bake_day.boxes', 'prices'],
      ['menu.created', 'menu'],
      ['staff.role', 'roles'],
      ['order.collected', 'pickups'],
      ['order.no_show', 'pickups'],
      ['walk_up.sold', 'pickups'],
      ['shop.settings', 'settings'],
      ['bake_day.published', 'bake-days'],
      ['formula.saved', 'production'],
      ['order.held', 'orders'],
      ['account.created', 'accounts'],
      ['something.else', 'other'],
    ];
    for (const [action] of cases) await entry(ownerId, action, '2030-01-01T12:00:00Z');
    const [rows] = await database().query('SELECT action, kind FROM audit_log');
    const kinds = Object.fromEntries((rows as Array<{ action: string; kind: string }>).map((r) => [r.action, r.kind]));
    expect(kinds).toEqual(Object.fromEntries(cases));
  });

  it('filters by kind, person and days in the shop time zone, newest first, in pages', async () => {
    await database().query('DELETE FROM audit_log');
    // the demo shop is in America/Denver (UTC−7 in January, tz database)
    await entry(ownerId, 'bake_day.capacity', '2030-01-10T06:59:00Z', 'bake_day', { rings: 90, holes: 40 }); // Jan 9, 11:59 pm there
    await entry(ownerId, 'bake_day.capacity', '2030-01-10T07:00:00Z', 'bake_day', { rings: 80, holes: 40 }); // Jan 10, midnight there
    await entry(bakerId, 'formula.saved', '2030-01-10T15:00:00Z', 'formula', { version: 2 });
    await entry(ownerId, 'bake_day.capacity', '2030-01-11T06:59:00Z', 'bake_day', { rings: 70, holes: 30 }); // Jan 10, 11:59 pm there
    await entry(ownerId, 'bake_day.capacity', '2030-01-11T07:00:00Z', 'bake_day', { rings: 60, holes: 30 }); // Jan 11

    const day = await owner.get('/api/staff/audit-log?kind=capacity&from=2030-01-10&to=2030-01-10');
    expect(day.status).toBe(200);
    expect(day.body.total).toBe(2);
    expect(day.body.entries.map((e: any) => e.details.rings)).toEqual([70, 80]);
    expect(day.body.entries[0]).toMatchObject({ kind: 'capacity', actor: { id: ownerId, name: 'Marisol Quenby' } });
    expect(day.body.entries[0].summary).toBe('Set the capacity of a bake day to 70 rings and 30 holes');

    const baker = await owner.get(`/api/staff/audit-log?actorId=${bakerId}`);
    expect(baker.body.entries.map((e: any) => e.action)).toEqual(['formula.saved']);
    expect(baker.body.people.map((p: any) => p.id).sort()).toEqual([ownerId, bakerId].sort());

    const first = await owner.get('/api/staff/audit-log?pageSize=5&page=1&kind=capacity');
    expect(first.body).toMatchObject({ total: 4, page: 1, pageSize: 5 });
    const paged = await owner.get('/api/staff/audit-log?pageSize=5&page=2&kind=capacity');
    expect(paged.body.entries).toEqual([]);
  });

  it('shows the owner’s own changes as they happen: a role change and a menu edit', async () => {
    const kit = await User.findOne({ where: { email: 'kit.marrow@example.test' } });
    await owner.patch(`/api/staff/members/${kit!.id}`).send({ role: 'counter' }).expect(200);
    const res = await owner.get('/api/staff/audit-log?kind=roles');
    expect(res.body.entries[0].summary).toBe('Gave Kit Marrow the counter role');
  });

  it('refuses a bad filter with 400, and anyone but the owner with 403', async () => {
    expect((await owner.get('/api/staff/audit-log?kind=gossip')).status).toBe(400);
    expect((await owner.get('/api/staff/audit-log?from=2030-02-01&to=2030-01-01')).status).toBe(400);
    for (const email of ['baker@fryline.test', 'counter@fryline.test', 'customer@fryline.test']) {
      const someone = await signedInAgent(stack, email);
      expect((await someone.get('/api/staff/audit-log')).status).toBe(403);
    }
  });
});
