import { beforeEach, describe, expect, it } from 'vitest';
import { AuditEntry, MenuItem } from '../src/db/models/index.js';
import { useStack } from './support.js';
import { signedInAgent, type Agent } from './owner-helpers.js';

const stack = useStack();
let owner: Agent;
beforeEach(async () => {
  owner = await signedInAgent(stack, 'owner@fryline.test');
});

const newItem = {
  name: 'Blackberry Sage',
  kind: 'ring',
  flavour: 'Sage',
  glaze: '',
  glazeRecipeId: 'lemon-glaze',
  // the nine major food allergens are listed by the U.S. FDA; these three are in every doughnut here
  allergens: ['wheat', 'milk', 'eggs'],
  description: 'Sage in the dough, a sharp glaze on top.',
  surchargeCents: 75,
};

describe('the menu', () => {
  it('lets the owner add an item linked to a glaze recipe, and logs it', async () => {
    const res = await owner.post('/api/staff/menu-items').send(newItem);
    expect(res.status).toBe(201);
    // the glaze label defaults to the recipe's name in the production settings
    expect(res.body).toMatchObject({ name: 'Blackberry Sage', glaze: 'Lemon glaze', glazeRecipeId: 'lemon-glaze', active: true, photo: null, surchargeCents: 75 });
    const list = await owner.get('/api/staff/menu-items');
    expect(list.body.map((m: any) => m.name)).toContain('Blackberry Sage');
    const entry = await AuditEntry.findOne({ where: { action: 'menu.created', subjectId: res.body.id } });
    expect(entry?.details).toMatchObject({ name: 'Blackberry Sage', surchargeCents: 75 });
  });

  it.each([
    ['an allergen outside the nine (FDA)', { allergens: ['wheat', 'celery'] }, 'allergens.1'],
    ['a glaze recipe not in the production settings', { glazeRecipeId: 'pistachio-cream' }, 'glazeRecipeId'],
    ['a negative extra charge', { surchargeCents: -5 }, 'surchargeCents'],
    ['fractional cents', { surchargeCents: 12.5 }, 'surchargeCents'],
    ['a kind that is neither ring nor hole', { kind: 'bar' }, 'kind'],
    ['a field we do not know', { photoUrl: 'http://elsewhere.test/x.jpg' }, 'photoUrl'],
  ])('refuses %s with the field named, and adds nothing', async (_name, change, field) => {
    const before = await MenuItem.count();
    const res = await owner.post('/api/staff/menu-items').send({ ...newItem, ...change });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.details.fields)).toContain(field);
    expect(await MenuItem.count()).toBe(before);
  });

  it('refuses a second item of the same kind and name with 409', async () => {
    expect((await owner.post('/api/staff/menu-items').send(newItem)).status).toBe(201);
    const again = await owner.post('/api/staff/menu-items').send({ ...newItem, flavour: 'Other' });
    expect(again.status).toBe(409);
    expect(again.body.error.details.fields.name).toMatch(/already has/);
  });

  it('edits an item; a new extra charge is logged as a price change with both amounts', async () => {
    const created = (await owner.post('/api/staff/menu-items').send(newItem)).body;
    const res = await owner.patch(`/api/staff/menu-items/${created.id}`).send({ surchargeCents: 100, description: 'Now with more sage.' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ surchargeCents: 100, description: 'Now with more sage.' });
    const price = await AuditEntry.findOne({ where: { action: 'menu.price_changed', subjectId: created.id } });
    expect(price?.details).toMatchObject({ surchargeCents: { from: 75, to: 100 } });
    const other = await AuditEntry.findOne({ where: { action: 'menu.updated', subjectId: created.id } });
    expect(Object.keys((other?.details as any).changes)).toEqual(['description']);
  });

  it('archives an item: off the shop and the bake-day form, kept for past orders, and can come back', async () => {
    const menu = (await owner.get('/api/staff/menu-items')).body as any[];
    const sold = menu.find((m) => m.orderCount > 0);
    expect(sold).toBeDefined();
    const res = await owner.post(`/api/staff/menu-items/${sold.id}/archive`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ active: false });
    expect(res.body.archivedAt).toBeTruthy();
    // still there for the orders that have it
    expect(await MenuItem.findByPk(sold.id)).not.toBeNull();
    const days = (await (await fetch(`${stack.url}/api/bake-days`)).json()) as any[];
    for (const day of days) expect(day.menu.map((m: any) => m.id)).not.toContain(sold.id);
    const back = await owner.post(`/api/staff/menu-items/${sold.id}/restore`);
    expect(back.body).toMatchObject({ active: true, archivedAt: null });
    expect(await AuditEntry.count({ where: { subjectId: sold.id, action: ['menu.archived', 'menu.restored'] } })).toBe(2);
  });

  it('is for the owner only: a baker may read it, a counter person and a customer get 403', async () => {
    const baker = await signedInAgent(stack, 'baker@fryline.test');
    expect((await baker.get('/api/staff/menu-items')).status).toBe(200);
    expect((await baker.post('/api/staff/menu-items').send(newItem)).status).toBe(403);
    for (const email of ['counter@fryline.test', 'customer@fryline.test']) {
      const someone = await signedInAgent(stack, email);
      expect((await someone.get('/api/staff/menu-items')).status).toBe(403);
      expect((await someone.post('/api/staff/menu-items').send(newItem)).status).toBe(403);
    }
    expect(await MenuItem.count({ where: { name: newItem.name } })).toBe(0);
  });
});
