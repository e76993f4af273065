import { beforeEach, describe, expect, it } from 'vitest';
import { DateTime } from 'luxon';
import { parse } from 'csv-parse/sync';
import { BakeDay, BakeDayBox, BakeDayMenuItem, MenuItem, Order, OrderBox, OrderLine, PickupWindow, ProductionSettings, User } from '../src/db/models/index.js';
import { database } from '../src/db/sequelize.js';
import { createPaymentsClient } from '../src/integrations/payments.js';
import { defaultProductionSettings } from '../src/services/production/production.js';
import { Browser, signIn, useStack } from './support.js';
import { orderAndPay, sessionIdOf } from './order-helpers.js';

// No demo data: every row this file counts is made here, so each figure can be worked out by hand.
const stack = useStack({ demo: false });
const ZONE = 'America/Denver';

let owner: Browser;
let items: { vanilla: MenuItem; twist: MenuItem; holes: MenuItem };

/** Our own round prices, cents per kg, for the default formula and glazes (fictional). */
const prices = {
  centsPerKg: {
    'Bread flour': 130, Water: 0, 'Whole milk': 110, 'Whole eggs': 620, 'Unsalted butter': 1150, Sugar: 160, 'Fine salt': 90,
    'Vanilla extract': 32000, 'Icing sugar': 260, 'Ground cinnamon': 2600, 'Sourdough starter': 60, 'Roux flour': 130,
  },
  fryingOilCentsPerKg: 320,
  oilBakesPerFill: 3,
};

beforeEach(async () => {
  await User.create({ email: 'owner@fryline.test', name: 'Test Owner', role: 'owner', googleSub: null });
  await User.create({ email: 'counter@fryline.test', name: 'Test Counter', role: 'counter', googleSub: null });
  owner = new Browser(stack.url);
  await signIn(owner, 'owner@fryline.test');
  await ProductionSettings.create({ id: 1, ...defaultProductionSettings(), prices, updatedBy: null });
  const A = ['wheat', 'milk', 'eggs'];
  items = {
    vanilla: await MenuItem.create({ name: 'Vanilla Crackle', flavour: 'Vanilla bean', glaze: 'Vanilla glaze', glazeRecipeId: 'vanilla-milk-glaze', kind: 'ring', surchargeCents: 50, allergens: A } as any),
    twist: await MenuItem.create({ name: 'Cinnamon Twist', flavour: 'Plain', glaze: 'Cinnamon sugar', glazeRecipeId: 'cinnamon-sugar', kind: 'ring', surchargeCents: 0, allergens: A } as any),
    holes: await MenuItem.create({ name: 'Cinnamon Holes', flavour: 'Plain', glaze: 'Cinnamon sugar', glazeRecipeId: 'cinnamon-sugar', kind: 'hole', surchargeCents: 0, allergens: A } as any),
  };
});

async function makeDay(opts: { date: string; zone: string; open: boolean; rings: number; holes: number; place: string; windowStart: Date }) {
  const cutoffAt = opts.open ? new Date(Date.now() + 3_600_000) : new Date(opts.windowStart.getTime() - 3_600_000);
  const day = await BakeDay.create({
    date: opts.date,
    place: opts.place,
    timeZone: opts.zone,
    status: opts.open ? 'published' : 'done',
    ordersOpenAt: new Date(Math.min(Date.now(), cutoffAt.getTime()) - 86_400_000 * 10),
    cutoffAt,
    ringCapacity: opts.rings,
    holeCapacity: opts.holes,
    ringsRemaining: opts.rings,
    holesRemaining: opts.holes,
    announcedAt: new Date(),
  });
  const window = await PickupWindow.create({ bakeDayId: day.id, startsAt: opts.windowStart, endsAt: new Date(opts.windowStart.getTime() + 3_600_000), maxOrders: null, ordersRemaining: null });
  await BakeDayBox.bulkCreate([
    { bakeDayId: day.id, size: 'dozen', pieces: 12, priceCents: 3000 },
    { bakeDayId: day.id, size: 'half-dozen', pieces: 6, priceCents: 1700 },
    { bakeDayId: day.id, size: 'holes', pieces: 12, priceCents: 800 },
  ]);
  await BakeDayMenuItem.bulkCreate(Object.values(items).map((m) => ({ bakeDayId: day.id, menuItemId: m.id })));
  return { day, window };
}

/** An order written straight into the tables, as a past week left it (the payments service only pays "now"). */
async function pastOrder(dayId: string, windowId: string, paidAt: Date, line: { item: MenuItem; quantity: number; size: 'dozen' | 'half-dozen' | 'holes' }, money: { total: number; fee: number }, status = 'collected') {
  const user = await User.create({ email: `past-${crypto.randomUUID()}@example.test`, name: 'Past Customer', role: 'customer', googleSub: `past-${crypto.randomUUID()}` });
  const order = await Order.create({
    userId: user.id, bakeDayId: dayId, pickupWindowId: windowId, status: status as any, rings: line.size === 'holes' ? 0 : line.quantity, holes: line.size === 'holes' ? line.quantity : 0,
    holdsCapacity: true, subtotalCents: money.total, taxCents: 0, totalCents: money.total, feeCents: money.fee, paidAt, pickupCode: null, source: 'online',
  });
  const box = await OrderBox.create({ orderId: order.id, position: 0, size: line.size, pieces: line.quantity, priceCents: money.total });
  await OrderLine.create({ orderBoxId: box.id, menuItemId: line.item.id, name: line.item.name, kind: line.item.kind, quantity: line.quantity, surchargeCents: line.item.surchargeCents, allergens: [] });
  return order;
}

async function walkUp(dayId: string, method: 'cash' | 'card', cents: number, soldAt: Date, lines: Array<[MenuItem, number]>) {
  const [sale] = (await database().query(`INSERT INTO walk_up_sales (bake_day_id, method, amount_cents, sold_at) VALUES (:dayId, :method, :cents, :soldAt) RETURNING id`, {
    replacements: { dayId, method, cents, soldAt },
  })) as [Array<{ id: string }>, unknown];
  for (const [item, quantity] of lines) {
    await database().query(`INSERT INTO walk_up_sale_items (sale_id, menu_item_id, quantity) VALUES (:sale, :item, :quantity)`, { replacements: { sale: sale[0]!.id, item: item.id, quantity } });
  }
}

const box = (dayId: string, windowId: string, size: 'dozen' | 'half-dozen' | 'holes', lines: Array<[MenuItem, number]>) => ({
  bakeDayId: dayId,
  pickupWindowId: windowId,
  boxes: [{ size, items: lines.map(([m, quantity]) => ({ menuItemId: m.id, quantity })) }],
});

/** The business's time zone: the shop settings' (when they have one) and every bake day's. */
async function setBusinessZone(zone: string) {
  await database().query(`UPDATE bake_days SET time_zone = :zone`, { replacements: { zone } });
  const [columns] = await database().query(`SELECT 1 FROM information_schema.columns WHERE table_name = 'shop_settings' AND column_name = 'time_zone'`);
  if ((columns as unknown[]).length) {
    await database().query(`INSERT INTO shop_settings (id, shop_name, time_zone) VALUES (1, 'Test shop', :zone) ON CONFLICT (id) DO UPDATE SET time_zone = :zone`, { replacements: { zone } });
  }
}

async function customer(email: string) {
  const browser = new Browser(stack.url);
  await signIn(browser, email);
  return browser;
}

describe('weekly sales', () => {
  it('every figure of a seeded week equals the hand-worked one; fees match the payments service; the CSV says the same', async () => {
    const now = DateTime.now().setZone(ZONE);
    const monday = now.startOf('week'); // luxon weeks start on Monday (ISO 8601)
    const { day, window } = await makeDay({ date: now.toISODate()!, zone: ZONE, open: true, rings: 120, holes: 48, place: 'Corner of Fifth', windowStart: new Date(Date.now() + 2 * 3_600_000) });
    const { vanilla, twist, holes } = items;

    // this week, through the real checkout and webhooks (the fee is read from each charge's balance transaction)
    const o1 = (await orderAndPay(stack, await customer('o1@example.test'), box(day.id, window.id, 'dozen', [[vanilla, 6], [twist, 6]]))).order; // 3000 + 6 × 50 = 3300
    const o2 = (await orderAndPay(stack, await customer('o2@example.test'), box(day.id, window.id, 'half-dozen', [[twist, 6]]))).order; // 1700
    const o3 = (await orderAndPay(stack, await customer('o3@example.test'), box(day.id, window.id, 'holes', [[holes, 12]]))).order; // 800
    const o4 = (await orderAndPay(stack, await customer('o4@example.test'), box(day.id, window.id, 'half-dozen', [[vanilla, 6]]))).order; // 1700 + 300 = 2000
    const o5 = (await orderAndPay(stack, await customer('o5@example.test'), box(day.id, window.id, 'dozen', [[twist, 12]]))).order; // 3000
    expect([o1, o2, o3, o4, o5].map((o) => o.totalCents)).toEqual([3300, 1700, 800, 2000, 3000]);
    // a box on hold and never paid counts for nothing
    const held = await (await customer('o6@example.test')).send('POST', '/api/orders', box(day.id, window.id, 'dozen', [[twist, 12]]));
    expect(held.status).toBe(201);
    expect(sessionIdOf(held.body.checkoutUrl)).toMatch(/^cs_/);

    const refund = (id: string, amountCents: number, key: string) => owner.send('POST', `/api/staff/orders/${id}/refunds`, { amountCents, reason: 'test' }, { 'idempotency-key': key });
    expect((await refund(o4.id, 2000, 'weekly-refund-o4')).status).toBe(201); // o4 refunded in full: no longer an order
    expect((await refund(o5.id, 500, 'weekly-refund-o5')).status).toBe(201); // o5 partly
    await Order.update({ status: 'collected', collectedAt: new Date() }, { where: { id: o2.id } });
    await database().query(`UPDATE orders SET status = 'no_show', no_show_at = now() WHERE id = :id`, { replacements: { id: o5.id } });
    await walkUp(day.id, 'cash', 1000, new Date(), [[twist, 3], [vanilla, 1]]);
    await walkUp(day.id, 'card', 450, new Date(), [[holes, 6]]);

    // the week before: one collected order and one walk-up
    const lastMonday = monday.minus({ weeks: 1 });
    const past = await makeDay({ date: lastMonday.plus({ days: 4 }).toISODate()!, zone: ZONE, open: false, rings: 60, holes: 0, place: 'Old depot', windowStart: lastMonday.plus({ days: 4, hours: 9 }).toJSDate() });
    await pastOrder(past.day.id, past.window.id, lastMonday.plus({ days: 2, hours: 12 }).toJSDate(), { item: twist, quantity: 6, size: 'half-dozen' }, { total: 1700, fee: 79 });
    await walkUp(past.day.id, 'cash', 500, lastMonday.plus({ days: 4, hours: 10 }).toJSDate(), [[twist, 2]]);
    await stack.payments.webhooksIdle();
    await setBusinessZone(ZONE);

    const res = await owner.getJson(`/api/reports/weekly?start=${monday.toISODate()}`);
    expect(res.status).toBe(200);
    const r = res.body;

    // Stripe's published US card pricing: 2.9 % + 30¢ per successful charge, rounded to the cent
    // 3300 → 95.7 → 96 + 30 = 126; 1700 → 49.3 → 49 + 30 = 79; 800 → 23.2 → 23 + 30 = 53; 2000 → 58 + 30 = 88; 3000 → 87 + 30 = 117
    const fees = 126 + 79 + 53 + 88 + 117; // 463
    const gross = 3300 + 1700 + 800 + 2000 + 3000 + 1000 + 450; // 12 250: pre-orders paid plus walk-ups
    const refunds = 2000 + 500;
    expect(r).toMatchObject({
      week: { start: monday.toISODate(), end: monday.plus({ days: 6 }).toISODate(), timeZone: ZONE },
      grossCents: 12_250,
      refundsCents: 2_500,
      feesCents: 463,
      netCents: 9_287, // 12 250 − 2 500 − 463
      orders: 4, // o1, o2, o3, o5 (o4 refunded in full, o6 never paid)
      pieces: 42, // 12 + 6 + 12 + 12
      preorderCents: 10_800,
      noShows: 1,
      noShowPieces: 12,
      walkUps: { sales: 2, cents: 1_450, pieces: 10, byMethod: [{ method: 'card', sales: 1, cents: 450 }, { method: 'cash', sales: 1, cents: 1000 }] },
    });
    expect(r.grossCents).toBe(gross);
    expect(r.netCents).toBe(gross - refunds - fees);
    expect(r.netCents).toBe(r.grossCents - r.refundsCents - r.feesCents);
    expect(r.byItem.map((i: any) => [i.name, i.orders, i.preorderPieces, i.walkUpPieces, i.pieces])).toEqual([
      ['Cinnamon Twist', 3, 24, 3, 27], // o1 6 + o2 6 + o5 12; 3 over the counter
      ['Cinnamon Holes', 1, 12, 6, 18],
      ['Vanilla Crackle', 1, 6, 1, 7], // o4's 6 were refunded
    ]);
    expect(r.byFlavour).toEqual([{ flavour: 'Plain', pieces: 45 }, { flavour: 'Vanilla bean', pieces: 7 }]);
    expect(r.byGlaze).toEqual([{ glaze: 'Cinnamon sugar', pieces: 45 }, { glaze: 'Vanilla glaze', pieces: 7 }]);
    // 42 pre-ordered + 10 walk-up = 52 of 168 (120 rings + 48 holes) = 30.95… → 31.0 %
    expect(r.sellThrough).toEqual([
      { bakeDayId: day.id, date: day.date, place: 'Corner of Fifth', capacity: 168, preorderPieces: 42, walkUpPieces: 10, sold: 52, percent: 31, calledOff: false },
    ]);

    // fees as the payments service recorded them on each charge's balance transaction
    const stripe = createPaymentsClient(stack.config);
    const txns = (await stripe.balanceTransactions.list({ type: 'charge', limit: 100 })).data;
    expect(txns).toHaveLength(5);
    expect(txns.reduce((n, t) => n + t.fee, 0)).toBe(r.feesCents);
    expect(txns.map((t) => t.fee).sort((a, b) => a - b)).toEqual([53, 79, 88, 117, 126]);

    // ingredient cost: the production sheet's per-piece cost (its own costing) × pieces sold
    const plan = (await owner.getJson(`/api/bake-days/${day.id}/plan`)).body.plan;
    const per = (glaze: string, kind: 'ring' | 'hole') => plan.cost.perPiece.find((p: any) => p.glazeId === glaze)[kind === 'ring' ? 'ringCents' : 'holeCents'] as number;
    const cost = 27 * per('cinnamon-sugar', 'ring') + 18 * per('cinnamon-sugar', 'hole') + 7 * per('vanilla-milk-glaze', 'ring');
    expect(cost).toBeGreaterThan(0);
    expect(r.ingredientCents).toBe(cost);
    expect(r.marginCents).toBe(9_287 - cost);
    expect(r.costPerPieceCents).toBe(Math.round(cost / 52));

    // the week before, beside it
    expect(r.previous).toMatchObject({
      week: { start: lastMonday.toISODate() },
      grossCents: 2_200, // 1 700 + 500
      refundsCents: 0,
      feesCents: 79,
      netCents: 2_121,
      orders: 1,
      pieces: 6,
      noShows: 0,
      walkUps: { sales: 1, cents: 500, pieces: 2 },
      sellThrough: [{ bakeDayId: past.day.id, capacity: 60, sold: 8, percent: 13.3 }], // 8 / 60 = 13.33 %
    });
    expect(r.previous).not.toHaveProperty('previous');

    // the CSV (RFC 4180: CRLF line ends) parses back into the same numbers
    const csv = await owner.fetch(`/api/reports/weekly.csv?start=${monday.toISODate()}`);
    expect(csv.status).toBe(200);
    expect(csv.headers.get('content-type')).toMatch(/^text\/csv/);
    expect(csv.headers.get('content-disposition')).toContain(`sales-week-${monday.toISODate()}.csv`);
    const text = await csv.text();
    expect(text).toContain('\r\n');
    const rows = parse(text, { columns: true, cast: true, record_delimiter: '\r\n' }) as Array<{ section: string; name: string; measure: string; this_week: number | string; previous_week: number | string }>;
    const get = (section: string, name: string, measure?: string) => rows.find((x) => x.section === section && x.name === name && (!measure || x.measure === measure))!;
    for (const [name, key] of [['gross_cents', 'grossCents'], ['refunds_cents', 'refundsCents'], ['fees_cents', 'feesCents'], ['net_cents', 'netCents'], ['orders', 'orders'], ['pieces', 'pieces'], ['no_shows', 'noShows'], ['ingredient_cents', 'ingredientCents'], ['margin_cents', 'marginCents']] as const) {
      expect(get('summary', name).this_week).toBe(r[key]);
      expect(get('summary', name).previous_week).toBe(r.previous[key]);
    }
    expect(get('walk_ups', 'cash', 'cents').this_week).toBe(1000);
    expect(get('walk_ups', 'card', 'cents').this_week).toBe(450);
    expect(get('item', 'Cinnamon Twist').this_week).toBe(27);
    expect(get('item', 'Cinnamon Twist').previous_week).toBe(8);
    expect(get('sell_through', `${day.date} Corner of Fifth`, 'sold').this_week).toBe(52);
  });

  it('counts every order of a week with the end of daylight saving time once (America/Chicago, week of Monday 2026-10-26)', async () => {
    // US daylight saving time ends Sunday 2026-11-01 02:00 CDT → 01:00 CST (Energy Policy Act of 2005), so this week lasts 169 hours
    const zone = 'America/Chicago';
    const { day, window } = await makeDay({ date: '2026-10-31', zone, open: false, rings: 100, holes: 0, place: 'Riverside', windowStart: new Date('2026-10-31T14:00:00Z') });
    const at = [
      '2026-10-25T04:59:59Z', // Sun 25 Oct 23:59:59 CDT: the week before
      '2026-10-26T05:00:00Z', // Mon 26 Oct 00:00 CDT: first instant of the week
      '2026-11-01T06:30:00Z', // Sun 1 Nov 01:30 CDT, before the clocks go back
      '2026-11-01T07:30:00Z', // Sun 1 Nov 01:30 CST, the same clock time an hour later
      '2026-11-02T05:30:00Z', // Sun 1 Nov 23:30 CST: still this week (7 × 24 h from the start would have ended at 05:00Z)
      '2026-11-02T06:00:00Z', // Mon 2 Nov 00:00 CST: the next week
    ];
    for (const instant of at) {
      await pastOrder(day.id, window.id, new Date(instant), { item: items.twist, quantity: 6, size: 'half-dozen' }, { total: 1700, fee: 79 });
    }
    await setBusinessZone(zone);
    const week = async (start: string) => (await owner.getJson(`/api/reports/weekly?start=${start}`)).body;
    const before = await week('2026-10-19');
    const dst = await week('2026-10-26');
    const after = await week('2026-11-02');
    expect(dst.week).toMatchObject({ timeZone: zone, from: '2026-10-26T05:00:00.000Z', to: '2026-11-02T06:00:00.000Z' });
    expect([before.orders, dst.orders, after.orders]).toEqual([1, 4, 1]);
    expect(before.orders + dst.orders + after.orders).toBe(at.length);
    expect(dst.grossCents).toBe(4 * 1700);
    expect(after.previous.orders).toBe(4);
    // the bake day of Saturday 31 October belongs to that week only
    expect(dst.sellThrough.map((d: any) => d.bakeDayId)).toEqual([day.id]);
    expect(after.sellThrough).toEqual([]);
  });

  it('only the owner may read it (customer and counter 403); a mid-week start means its week; a non-date is refused', async () => {
    const monday = DateTime.now().setZone(ZONE).startOf('week').toISODate();
    const counter = await customer('counter@fryline.test');
    const shopper = await customer('shopper@example.test');
    expect((await counter.getJson(`/api/reports/weekly?start=${monday}`)).status).toBe(403);
    expect((await shopper.getJson(`/api/reports/weekly?start=${monday}`)).status).toBe(403);
    expect((await counter.fetch(`/api/reports/weekly.csv?start=${monday}`)).status).toBe(403);
    expect((await fetch(`${stack.url}/api/reports/weekly?start=${monday}`)).status).toBe(401);
    // Sunday 1 November 2026 belongs to the week of Monday 26 October
    const sunday = await owner.getJson('/api/reports/weekly?start=2026-11-01');
    expect(sunday.status).toBe(200);
    expect(sunday.body.week).toMatchObject({ start: '2026-10-26', end: '2026-11-01' });
    expect(sunday.body.previous.week.start).toBe('2026-10-19');
    expect((await owner.getJson('/api/reports/weekly?start=last-week')).status).toBe(400);
  });
});
