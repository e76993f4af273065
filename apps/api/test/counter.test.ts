import { describe, expect, it, onTestFinished } from 'vitest';
import { QueryTypes } from 'sequelize';
import { seedCounterDay, type SeededCounterDay } from '@fryline/seeds';
import { database } from '../src/db/sequelize.js';
import { ReadCache } from '../src/lib/read-cache.js';
import { Browser, signIn, useStack } from './support.js';
import { CARD_OK, halfDozen, openDay, orderAndPay, sessionIdOf } from './order-helpers.js';

const stack = useStack();

async function counterDay(): Promise<{ seeded: SeededCounterDay; counter: Browser }> {
  const seeded = await seedCounterDay(new Date());
  const counter = new Browser(stack.url);
  await signIn(counter, 'counter@fryline.test');
  return { seeded, counter };
}

const sql = <T extends object>(query: string, replacements: Record<string, unknown> = {}) => database().query<T>(query, { replacements, type: QueryTypes.SELECT });
const auditFor = (subjectId: string) =>
  sql<{ action: string; actor_id: string; created_at: Date; details: any }>('SELECT action, actor_id, created_at, details FROM audit_log WHERE subject_id = :subjectId ORDER BY id', { subjectId });
const userId = async (email: string) => (await sql<{ id: string }>('SELECT id FROM users WHERE email = :email', { email }))[0]!.id;

describe('the pickup list', () => {
  it('lists the day’s paid orders with name, code, window, status and boxes; a customer gets 403, nobody signed in 401', async () => {
    const { seeded, counter } = await counterDay();
    const list = await counter.getJson(`/api/bake-days/${seeded.day.id}/pickups`);
    expect(list.status).toBe(200);
    expect(list.body).toHaveLength(seeded.orders.length);
    const ada = list.body.find((r: any) => r.name === 'Ada Quillfeather');
    const seededAda = seeded.orders.find((o) => o.name === 'Ada Quillfeather')!;
    expect(ada).toMatchObject({ orderId: seededAda.id, pickupCode: seededAda.code, windowId: seeded.windows[1]!.id, status: 'paid', rings: 12, holes: 12, late: false });
    expect(ada.boxes).toEqual([
      { size: 'dozen', pieces: 12, items: [{ menuItemId: expect.any(String), name: 'Dark Chocolate Dip', quantity: 12 }] },
      { size: 'holes', pieces: 12, items: [{ menuItemId: expect.any(String), name: 'Cinnamon Sugar Holes', quantity: 12 }] },
    ]);
    // the first window is over: its orders are late
    expect(list.body.filter((r: any) => r.late).map((r: any) => r.name).sort()).toEqual(['Hollis Penrose', 'Wren Abernathy']);

    const customer = new Browser(stack.url);
    await signIn(customer, 'customer@fryline.test');
    for (const path of [`/api/bake-days/${seeded.day.id}/pickups`, `/api/bake-days/${seeded.day.id}/surplus`, `/api/orders/by-code/${seededAda.code}`, `/api/bake-days/${seeded.day.id}/end-of-day`]) {
      expect((await customer.getJson(path)).status, path).toBe(403);
      expect((await new Browser(stack.url).getJson(path)).status, path).toBe(401);
    }
    for (const action of ['collect', 'uncollect', 'no-show']) {
      expect((await customer.send('POST', `/api/orders/${seededAda.id}/${action}`, {})).status).toBe(403);
    }
    expect((await customer.send('POST', `/api/bake-days/${seeded.day.id}/walk-ups`, { items: [], method: 'cash', amountCents: 0 })).status).toBe(403);
  });

  it('finds an order by its code whatever the case, with dashes or spaces, and with look-alike characters', async () => {
    const { seeded, counter } = await counterDay();
    const order = seeded.orders[2]!;
    await sql('UPDATE orders SET pickup_code = :code WHERE id = :id', { code: 'DJ7KMN', id: order.id });
    for (const typed of ['DJ7KMN', 'dj7kmn', 'dj7-kmn', ' 0I2 kmn ', 'OL7KMN', 'q1zkmn']) {
      const found = await counter.getJson(`/api/orders/by-code/${encodeURIComponent(typed)}`);
      expect(found.status, typed).toBe(200);
      expect(found.body).toMatchObject({ id: order.id, status: 'paid', pickupCode: 'DJ7KMN', bakeDayId: seeded.day.id, windowId: seeded.windows[1]!.id, name: order.name });
      expect(found.body.boxes).toHaveLength(2);
    }
    expect((await counter.getJson('/api/orders/by-code/DJ7KMX')).status).toBe(404);
  });
});

describe('handing over', () => {
  it('hands over once; a second hand-over answers 409 already_collected with when and by whom; a repeated key answers the first result', async () => {
    const { seeded, counter } = await counterDay();
    const order = seeded.orders[3]!;
    const first = await counter.send('POST', `/api/orders/${order.id}/collect`, { bakeDayId: seeded.day.id }, { 'idempotency-key': 'hand-over-key-0001' });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ orderId: order.id, status: 'collected', collectedBy: 'Priya Halloway' });
    expect(Date.parse(first.body.undoUntil) - Date.parse(first.body.collectedAt)).toBe(15_000);

    const again = await counter.send('POST', `/api/orders/${order.id}/collect`, { bakeDayId: seeded.day.id }, { 'idempotency-key': 'hand-over-key-0001' });
    expect(again).toEqual(first);

    const other = new Browser(stack.url);
    await signIn(other, 'baker@fryline.test');
    const twice = await other.send('POST', `/api/orders/${order.id}/collect`, {}, { 'idempotency-key': 'hand-over-key-0002' });
    // the refusal is the first answer for that key, too
    const refusedAgain = await other.send('POST', `/api/orders/${order.id}/collect`, {}, { 'idempotency-key': 'hand-over-key-0002' });
    const withoutRequestId = (r: typeof twice) => ({ status: r.status, error: { ...r.body.error, details: { ...r.body.error.details, requestId: undefined } } });
    expect(withoutRequestId(refusedAgain)).toEqual(withoutRequestId(twice));
    expect(twice.status).toBe(409);
    expect(twice.body.error.code).toBe('already_collected');
    expect(twice.body.error.details).toMatchObject({ collectedAt: first.body.collectedAt, collectedBy: 'Priya Halloway' });
    expect(twice.body.error.message).toMatch(/Already handed over at \d{1,2}:\d\d [AP]M by Priya Halloway/);

    const [row] = await sql<{ status: string; collected_by: string; collected_at: Date }>('SELECT status, collected_by, collected_at FROM orders WHERE id = :id', { id: order.id });
    expect(row).toMatchObject({ status: 'collected', collected_by: await userId('counter@fryline.test') });
    const entries = await auditFor(order.id);
    expect(entries.map((e) => e.action)).toEqual(['order.collected']); // the replay and the refusal changed nothing
    expect(entries[0]!.actor_id).toBe(await userId('counter@fryline.test'));
    expect(Math.abs(entries[0]!.created_at.getTime() - row!.collected_at.getTime())).toBeLessThan(1000);
  });

  it('undo works within the time limit and is refused after it; each change is in the audit log with who and when', async () => {
    const { seeded, counter } = await counterDay();
    const [a, b] = [seeded.orders[2]!, seeded.orders[4]!];
    expect((await counter.send('POST', `/api/orders/${a.id}/collect`, {})).status).toBe(200);
    const undone = await counter.send('POST', `/api/orders/${a.id}/uncollect`, {});
    expect(undone.status).toBe(200);
    expect(undone.body).toMatchObject({ status: 'paid', collectedAt: null, collectedBy: null });
    expect((await auditFor(a.id)).map((e) => e.action)).toEqual(['order.collected', 'order.collect_undone']);

    expect((await counter.send('POST', `/api/orders/${b.id}/collect`, {})).status).toBe(200);
    // sixteen seconds later (the default limit is 15 s)
    await sql("UPDATE orders SET collected_at = now() - interval '16 seconds' WHERE id = :id", { id: b.id });
    const late = await counter.send('POST', `/api/orders/${b.id}/uncollect`, {});
    expect(late.status).toBe(409);
    expect(late.body.error.code).toBe('undo_too_late');
    expect((await sql<{ status: string }>('SELECT status FROM orders WHERE id = :id', { id: b.id }))[0]!.status).toBe('collected');
    expect((await counter.send('POST', `/api/orders/${seeded.orders[5]!.id}/uncollect`, {})).body.error.code).toBe('not_collected');
  });

  it('refuses unpaid, refunded and another day’s orders with the reason in words', async () => {
    const { seeded, counter } = await counterDay();
    const day = await openDay(stack);
    const customer = new Browser(stack.url);
    await signIn(customer, 'customer@fryline.test');
    const held = await customer.send('POST', '/api/orders', halfDozen(day));
    const unpaid = await counter.send('POST', `/api/orders/${held.body.id}/collect`, {});
    expect(unpaid.status).toBe(409);
    expect(unpaid.body.error).toMatchObject({ code: 'not_paid', message: expect.stringMatching(/never paid/) });

    await sql("UPDATE orders SET status = 'refunded', refunded_cents = total_cents WHERE id = :id", { id: seeded.orders[0]!.id });
    const refunded = await counter.send('POST', `/api/orders/${seeded.orders[0]!.id}/collect`, { bakeDayId: seeded.day.id });
    expect(refunded.body.error).toMatchObject({ code: 'refunded', message: expect.stringMatching(/refunded: don’t hand it over/) });

    const other = new Browser(stack.url);
    await signIn(other, 'other.day@example.test');
    const { order: elsewhere } = await orderAndPay(stack, other, halfDozen(day));
    const wrongDay = await counter.send('POST', `/api/orders/${elsewhere.id}/collect`, { bakeDayId: seeded.day.id });
    expect(wrongDay.status).toBe(409);
    expect(wrongDay.body.error).toMatchObject({ code: 'wrong_bake_day', message: expect.stringMatching(/^This order is for \w+day /) });
    expect((await sql<{ status: string }>('SELECT status FROM orders WHERE id = :id', { id: elsewhere.id }))[0]!.status).toBe('paid');
  });
});

describe('no-shows', () => {
  it('are refused before the window end plus grace, allowed after, reversible, and "the rest" marks every remaining one once', async () => {
    const { seeded, counter } = await counterDay();
    const current = seeded.orders.find((o) => o.windowIndex === 1)!;
    const tooEarly = await counter.send('POST', `/api/orders/${current.id}/no-show`, {});
    expect(tooEarly.status).toBe(409);
    expect(tooEarly.body.error.code).toBe('too_early');
    // window under way ends 30 min from now; the owner's grace is 30 min by default
    expect(Date.parse(tooEarly.body.error.details.noShowFrom)).toBe(seeded.windows[1]!.endsAt.getTime() + 30 * 60_000);

    const [wren, hollis] = seeded.orders.filter((o) => o.windowIndex === 0);
    const marked = await counter.send('POST', `/api/orders/${wren!.id}/no-show`, {});
    expect(marked.body).toMatchObject({ status: 'no_show', noShowBy: 'Priya Halloway' });
    const reversed = await counter.send('POST', `/api/orders/${wren!.id}/reverse-no-show`, {});
    expect(reversed.body).toMatchObject({ status: 'paid', noShowAt: null });
    expect((await auditFor(wren!.id)).map((e) => e.action)).toEqual(['order.no_show', 'order.no_show_reversed']);

    // the owner gives more grace: nothing is over yet
    await sql('UPDATE shop_settings SET no_show_grace_minutes = 120');
    expect((await counter.send('POST', `/api/bake-days/${seeded.day.id}/no-shows`, {})).body).toEqual({ marked: 0, orderIds: [] });
    await sql('UPDATE shop_settings SET no_show_grace_minutes = 30');
    const rest = await counter.send('POST', `/api/bake-days/${seeded.day.id}/no-shows`, {}, { 'idempotency-key': 'rest-no-show-0001' });
    expect(rest.body.marked).toBe(2);
    expect(rest.body.orderIds.sort()).toEqual([wren!.id, hollis!.id].sort());
    expect((await counter.send('POST', `/api/bake-days/${seeded.day.id}/no-shows`, {}, { 'idempotency-key': 'rest-no-show-0001' })).body).toEqual(rest.body);
    const auditRows = await sql<{ n: number }>("SELECT count(*)::int AS n FROM audit_log WHERE action = 'order.no_show' AND actor_id = :actor", { actor: await userId('counter@fryline.test') });
    expect(auditRows[0]!.n).toBe(3);
    // a no-show who turns up after all can still be handed over
    expect((await counter.send('POST', `/api/orders/${hollis!.id}/collect`, {})).body.status).toBe('collected');
  });
});

describe('walk-up sales of the surplus', () => {
  it('surplus = made − paid pre-orders − walk-ups; a sale is 201, more than is left is 409 surplus_gone naming the item; a repeated key sells once', async () => {
    const { seeded, counter } = await counterDay();
    const before = await counter.getJson(`/api/bake-days/${seeded.day.id}/surplus`);
    expect(before.status).toBe(200);
    const vanilla = before.body.items.find((i: any) => i.name === 'Vanilla Bean Glaze');
    // pre-ordered in the seeded day: 6 + 3 + 12
    expect(vanilla.preOrdered).toBe(21);
    for (const item of before.body.items) expect(item.left).toBe(item.made - item.preOrdered - item.sold);
    expect(before.body.rings).toBe(before.body.items.filter((i: any) => i.kind === 'ring').reduce((n: number, i: any) => n + i.left, 0));
    const plan = await counter.getJson(`/api/bake-days/${seeded.day.id}/plan`);
    expect(plan.status).toBe(403); // the sheet is the baker's; the counter only sees what is left

    const sale = { items: [{ menuItemId: vanilla.menuItemId, quantity: 1 }], method: 'cash', amountCents: 350 };
    const sold = await counter.send('POST', `/api/bake-days/${seeded.day.id}/walk-ups`, sale, { 'idempotency-key': 'walk-up-key-0001' });
    expect(sold.status).toBe(201);
    expect(sold.body).toMatchObject({ method: 'cash', amountCents: 350, items: [{ name: 'Vanilla Bean Glaze', quantity: 1 }] });
    const replay = await counter.send('POST', `/api/bake-days/${seeded.day.id}/walk-ups`, sale, { 'idempotency-key': 'walk-up-key-0001' });
    expect(replay).toEqual(sold);
    const after = await counter.getJson(`/api/bake-days/${seeded.day.id}/surplus`);
    const vanillaAfter = after.body.items.find((i: any) => i.menuItemId === vanilla.menuItemId);
    expect(vanillaAfter).toMatchObject({ left: vanilla.left - 1, sold: 1 });

    const tooMany = await counter.send('POST', `/api/bake-days/${seeded.day.id}/walk-ups`, { ...sale, items: [{ menuItemId: vanilla.menuItemId, quantity: vanillaAfter.left + 1 }] });
    expect(tooMany.status).toBe(409);
    expect(tooMany.body.error).toMatchObject({ code: 'surplus_gone', details: { menuItemId: vanilla.menuItemId, name: 'Vanilla Bean Glaze', left: vanillaAfter.left } });
    expect(tooMany.body.error.message).toContain('Vanilla Bean Glaze');
    const bad = await counter.send('POST', `/api/bake-days/${seeded.day.id}/walk-ups`, { ...sale, method: 'cheque' });
    expect(bad.status).toBe(400);
    expect((await sql<{ n: number }>('SELECT count(*)::int AS n FROM walk_up_sales')).at(0)!.n).toBe(1);
    const audit = await sql<{ actor_id: string; created_at: Date }>("SELECT actor_id, created_at FROM audit_log WHERE action = 'walk_up.sold'");
    expect(audit).toHaveLength(1);
    expect(audit[0]!.actor_id).toBe(await userId('counter@fryline.test'));
  });
});

describe('the surplus follows the paid orders after the counter first reads it', () => {
  it('a fully refunded order gives its pieces back; an order held then and paid later takes its own; made − pre-ordered − sold = left throughout', async () => {
    const day = await openDay(stack);
    const customer = new Browser(stack.url);
    await signIn(customer, 'surplus.customer@example.test');
    const owner = new Browser(stack.url);
    await signIn(owner, 'owner@fryline.test');
    const counter = new Browser(stack.url);
    await signIn(counter, 'counter@fryline.test');
    const { order: first } = await orderAndPay(stack, customer, halfDozen(day, 0));
    // held when the counter first reads the surplus: the plan made its pieces, so they count as left until it is paid
    const held = await customer.send('POST', '/api/orders', halfDozen(day, 0));
    expect(held.status).toBe(201);
    const surplus = async () => (await counter.getJson(`/api/bake-days/${day.id}/surplus`)).body;
    const itemOf = (s: any) => s.items.find((i: any) => i.menuItemId === halfDozen(day, 0).boxes[0]!.items[0]!.menuItemId);
    const balanced = (s: any) => {
      for (const i of s.items) expect(i.left).toBe(i.made - i.preOrdered - i.sold);
    };
    const atStart = await surplus();
    balanced(atStart);
    expect(itemOf(atStart).preOrdered).toBe(6);

    stack.payments.paySession(sessionIdOf(held.body.checkoutUrl), CARD_OK);
    await stack.payments.webhooksIdle();
    const second = held.body;
    const afterSecond = await surplus();
    balanced(afterSecond);
    expect(itemOf(afterSecond).left).toBe(itemOf(atStart).left - 6);

    const refunded = await owner.send('POST', `/api/staff/orders/${first.id}/refunds`, { amountCents: first.totalCents, reason: 'customer is ill' }, { 'idempotency-key': 'surplus-refund-0001' });
    expect(refunded.status).toBe(201);
    await stack.payments.webhooksIdle();
    const afterRefund = await surplus();
    balanced(afterRefund);
    expect(itemOf(afterRefund).left).toBe(itemOf(afterSecond).left + 6);

    // a handed-over order that is refunded afterwards gave its pieces away: nothing comes back
    expect((await counter.send('POST', `/api/orders/${second.id}/collect`, { bakeDayId: day.id })).status).toBe(200);
    const refundedLater = await owner.send('POST', `/api/staff/orders/${second.id}/refunds`, { amountCents: second.totalCents, reason: 'box was dropped' }, { 'idempotency-key': 'surplus-refund-0002' });
    expect(refundedLater.status).toBe(201);
    await stack.payments.webhooksIdle();
    expect(itemOf(await surplus()).left).toBe(itemOf(afterRefund).left);
  });
});

describe('orders paid after the counter first reads the surplus', () => {
  it('can use up more than the plan made of an item, and cancelling one gives back only what is really left', async () => {
    const day = await openDay(stack);
    const customer = new Browser(stack.url);
    await signIn(customer, 'late.orders@example.test');
    const counter = new Browser(stack.url);
    await signIn(counter, 'counter@fryline.test');
    const itemId = halfDozen(day, 0).boxes[0]!.items[0]!.menuItemId;
    const surplus = async () => (await counter.getJson(`/api/bake-days/${day.id}/surplus`)).body;
    const itemOf = (s: any) => s.items.find((i: any) => i.menuItemId === itemId);
    await surplus();
    // a plan that made only two more of this flavour than were pre-ordered when the counter first looked
    const [{ pre }] = await sql<{ pre: number }>(
      `SELECT COALESCE(SUM(l.quantity), 0)::int AS pre FROM orders o JOIN order_boxes b ON b.order_id = o.id JOIN order_lines l ON l.order_box_id = b.id
        WHERE o.bake_day_id = :dayId AND l.menu_item_id = :itemId AND o.status IN ('paid', 'collected', 'no_show')`,
      { dayId: day.id, itemId },
    ) as [{ pre: number }];
    await database().query('UPDATE bake_day_surplus SET made = :made, left_count = 2 WHERE bake_day_id = :dayId AND menu_item_id = :itemId', {
      replacements: { made: pre + 2, dayId: day.id, itemId },
    });

    const { order } = await orderAndPay(stack, customer, halfDozen(day, 0));
    const afterPaid = itemOf(await surplus());
    expect(afterPaid).toMatchObject({ made: pre + 2, preOrdered: pre + 6, left: 0 });

    const cancelled = await customer.send('POST', `/api/orders/${order.id}/cancel`);
    expect(cancelled.status).toBe(200);
    await stack.payments.webhooksIdle();
    expect(itemOf(await surplus())).toMatchObject({ made: pre + 2, preOrdered: pre, left: 2 });
  });
});

describe('the end of the day', () => {
  it('adds up to a hand-computed expectation from a seeded day', async () => {
    const { seeded, counter } = await counterDay();
    // spare pieces glazed vanilla, at least 12 rings and 12 holes: enough surplus for the sales below
    await sql(`UPDATE production_settings SET spare = '{"percent": 5, "minimumRings": 12, "minimumHoles": 12, "glazeId": "vanilla-milk-glaze"}'`);
    const byName = (name: string) => seeded.orders.find((o) => o.name === name)!;
    for (const name of ['Ada Quillfeather', 'Bram Ellery', 'Hollis Penrose']) {
      expect((await counter.send('POST', `/api/orders/${byName(name).id}/collect`, { bakeDayId: seeded.day.id })).status).toBe(200);
    }
    expect((await counter.send('POST', `/api/bake-days/${seeded.day.id}/no-shows`, {})).body.marked).toBe(1); // Wren; the other windows are not over

    const surplus = (await counter.getJson(`/api/bake-days/${seeded.day.id}/surplus`)).body;
    const vanilla = surplus.items.find((i: any) => i.name === 'Vanilla Bean Glaze');
    const holes = surplus.items.find((i: any) => i.kind === 'hole');
    const sell = async (items: Array<[any, number]>, method: string, amountCents: number) =>
      expect((await counter.send('POST', `/api/bake-days/${seeded.day.id}/walk-ups`, { items: items.map(([i, quantity]) => ({ menuItemId: i.menuItemId, quantity })), method, amountCents })).status).toBe(201);
    await sell([[vanilla, 1]], 'cash', 350);
    await sell([[vanilla, 2]], 'cash', 700);
    await sell([[vanilla, 2], [holes, 3]], 'card', 1100);

    const eod = await counter.getJson(`/api/bake-days/${seeded.day.id}/end-of-day`);
    expect(eod.status).toBe(200);
    // by hand: Ada 12 rings + 12 holes, Bram 6, Hollis 6 handed over; Wren's 12 a no-show; Cleo 6 and Dorian 12 still to come
    expect(eod.body.orders).toEqual({ paid: 6, handedOver: 3, toHandOver: 2, noShows: 1, refunded: 0 });
    expect(eod.body.pieces).toEqual({ handedOver: { rings: 24, holes: 12 }, noShows: { rings: 12, holes: 0 }, toHandOver: { rings: 18, holes: 0 } });
    // walk-ups: $3.50 + $7.00 cash, $11.00 card; 5 rings and 3 holes
    expect(eod.body.walkUps).toEqual({ sales: 3, rings: 5, holes: 3, totalCents: 2150, byMethod: { cash: { sales: 2, amountCents: 1050 }, card: { sales: 1, amountCents: 1100 } } });
    expect(eod.body.cashToCountCents).toBe(1050);
    const leftVanilla = eod.body.leftOver.items.find((i: any) => i.menuItemId === vanilla.menuItemId);
    expect(leftVanilla).toEqual({ ...vanilla, sold: 5, left: vanilla.made - 21 - 5 });
    expect(vanilla.made).toBeGreaterThanOrEqual(21 + 12);
    expect(eod.body.leftOver.items.find((i: any) => i.menuItemId === holes.menuItemId)).toMatchObject({ sold: 3, left: holes.made - 12 - 3 });
  });
});

describe('the owner’s counter settings', () => {
  it('the owner sets the no-show grace and the undo time; the counter reads them but cannot change them; bad values change nothing', async () => {
    const { seeded, counter } = await counterDay();
    expect((await counter.getJson('/api/counter/settings')).body).toEqual({ noShowGraceMinutes: 30, handOverUndoSeconds: 15 });
    expect((await counter.send('PUT', '/api/counter/settings', { noShowGraceMinutes: 45, handOverUndoSeconds: 20 })).status).toBe(403);
    const owner = new Browser(stack.url);
    await signIn(owner, 'owner@fryline.test');
    const bad = await owner.send('PUT', '/api/counter/settings', { noShowGraceMinutes: -5, handOverUndoSeconds: 20 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.fields.noShowGraceMinutes).toMatch(/at least 0/i);
    const saved = await owner.send('PUT', '/api/counter/settings', { noShowGraceMinutes: 45, handOverUndoSeconds: 20 });
    expect(saved.body).toEqual({ noShowGraceMinutes: 45, handOverUndoSeconds: 20 });
    const rows = (await counter.getJson(`/api/bake-days/${seeded.day.id}/pickups`)).body;
    const row = rows.find((r: any) => r.windowId === seeded.windows[1]!.id);
    expect(Date.parse(row.noShowFrom)).toBe(seeded.windows[1]!.endsAt.getTime() + 45 * 60_000);
    const collected = await counter.send('POST', `/api/orders/${row.orderId}/collect`, {});
    expect(Date.parse(collected.body.undoUntil) - Date.parse(collected.body.collectedAt)).toBe(20_000);
    expect((await sql<{ action: string }>("SELECT action FROM audit_log WHERE action = 'shop.counter_settings'"))).toHaveLength(1);
  });

  it('is one setting with the shop settings page: a change on either side shows on the other at once', async () => {
    // with the read cache on, as in a started API (it is off under test)
    ReadCache.ttlMs = 60_000;
    onTestFinished(() => {
      ReadCache.ttlMs = 0;
    });
    const owner = new Browser(stack.url);
    await signIn(owner, 'owner@fryline.test');
    const shopSide = async () => (await owner.getJson('/api/staff/shop-settings')).body;
    await shopSide(); // read once, so a stale copy would be cached
    expect((await owner.send('PUT', '/api/counter/settings', { noShowGraceMinutes: 50, handOverUndoSeconds: 15 })).status).toBe(200);
    const onShopPage = await shopSide();
    expect(onShopPage.noShowGraceMinutes).toBe(50);
    const { updatedAt: _updatedAt, logo: _logo, ...input } = onShopPage;
    expect((await owner.send('PUT', '/api/staff/shop-settings', { ...input, noShowGraceMinutes: 25 })).status).toBe(200);
    expect((await owner.getJson('/api/counter/settings')).body.noShowGraceMinutes).toBe(25);
  });
});
