import { DateTime } from 'luxon';
import { Op, type Transaction } from 'sequelize';
import { DEFAULT_FORMULA, DEFAULT_PLAN_SETTINGS, type Formula } from '@fryline/production';
import { boxCatalogue, boxSizes, priceOrder, roundHalfUp, type BoxSize } from '@fryline/schemas';
import { cutoffFromSchedule } from '@fryline/api/services/production/production';
import {
  database, FormulaVersion, ProductionSettings, BakeDay, BakeDayBox, BakeDayMenuItem, MenuItem, Order, OrderBox, OrderLine, PickupWindow, ShopSettings, User,
} from '@fryline/api/db';
import { newPickupCode } from '@fryline/api/services/orders/pickup-codes';

// A fictional pop-up, invented for the demo: Brindle & Bell Doughnuts sells
// on Saturdays and Sundays from a stall at the (equally fictional)
// Larkspur Landing farmers' market in the town of Cobble Ridge.

export const DEMO_TIME_ZONE = 'America/Denver';
export const DEMO_SHOP = 'Brindle & Bell Doughnuts';

export const demoAccounts = [
  { email: 'owner@fryline.test', name: 'Marisol Quenby', role: 'owner' },
  { email: 'baker@fryline.test', name: 'Tobias Wrenfield', role: 'baker' },
  { email: 'counter@fryline.test', name: 'Priya Halloway', role: 'counter' },
  { email: 'customer@fryline.test', name: 'Dana Ostrander', role: 'customer' },
] as const;

const extraCustomers = [
  { email: 'june.plover@example.test', name: 'June Plover' },
  { email: 'omar.teasdale@example.test', name: 'Omar Teasdale' },
  { email: 'kit.marrow@example.test', name: 'Kit Marrow' },
  { email: 'lena.voss@example.test', name: 'Lena Voss' },
];

const A = ['wheat', 'milk', 'eggs'];

/** The stall's glazes: our own recipes, in parts by weight. */
export const demoGlazes = [
  { id: 'vanilla-milk-glaze', name: 'Vanilla glaze', gramsPerRing: 14, gramsPerHole: 4, extraPercent: 15, allergens: ['milk'], parts: [{ name: 'Icing sugar', parts: 80 }, { name: 'Whole milk', parts: 18 }, { name: 'Vanilla extract', parts: 2 }] },
  { id: 'maple-glaze', name: 'Maple glaze', gramsPerRing: 15, gramsPerHole: 4, extraPercent: 15, allergens: ['milk'], parts: [{ name: 'Icing sugar', parts: 72 }, { name: 'Maple syrup', parts: 22 }, { name: 'Whole milk', parts: 6 }] },
  { id: 'cardamom-sugar', name: 'Cardamom sugar', gramsPerRing: 8, gramsPerHole: 3, extraPercent: 25, parts: [{ name: 'Sugar', parts: 96 }, { name: 'Ground cardamom', parts: 4 }] },
  { id: 'dark-chocolate', name: 'Dark chocolate dip', gramsPerRing: 16, gramsPerHole: 5, extraPercent: 20, allergens: ['milk', 'soybeans'], parts: [{ name: 'Dark chocolate', parts: 68 }, { name: 'Cream', parts: 32 }] },
  { id: 'lemon-glaze', name: 'Lemon glaze', gramsPerRing: 14, gramsPerHole: 4, extraPercent: 15, parts: [{ name: 'Icing sugar', parts: 82 }, { name: 'Lemon juice', parts: 16 }, { name: 'Poppy seeds', parts: 2 }] },
  { id: 'honey-sesame', name: 'Honey glaze with sesame', gramsPerRing: 15, gramsPerHole: 4, extraPercent: 15, allergens: ['sesame'], parts: [{ name: 'Icing sugar', parts: 60 }, { name: 'Honey', parts: 25 }, { name: 'Water', parts: 8 }, { name: 'Toasted sesame', parts: 7 }] },
  { id: 'cinnamon-sugar', name: 'Cinnamon sugar', gramsPerRing: 8, gramsPerHole: 3, extraPercent: 25, parts: [{ name: 'Sugar', parts: 95 }, { name: 'Ground cinnamon', parts: 5 }] },
];

/** Prices the stall pays, in cents per kg (our own round figures). */
const demoPrices = {
  centsPerKg: {
    'Bread flour': 130, Water: 0, 'Whole milk': 110, 'Whole eggs': 620, 'Unsalted butter': 1150, Sugar: 160, 'Fine salt': 90,
    'Vanilla extract': 32000, 'Icing sugar': 260, 'Maple syrup': 2400, 'Ground cardamom': 6000, 'Dark chocolate': 1800, Cream: 650,
    'Lemon juice': 900, 'Poppy seeds': 1500, Honey: 1300, 'Toasted sesame': 1200, 'Ground cinnamon': 2600,
  },
  fryingOilCentsPerKg: 320,
  oilBakesPerFill: 3,
};
export const demoMenu = [
  { name: 'Vanilla Bean Glaze', glazeRecipeId: 'vanilla-milk-glaze', flavour: 'Vanilla bean', glaze: 'Vanilla glaze', kind: 'ring', surchargeCents: 0, allergens: A, description: 'Our plain sourdough ring under a thin crackle of vanilla-bean glaze.' },
  { name: 'Brown Butter Maple', glazeRecipeId: 'maple-glaze', flavour: 'Brown butter', glaze: 'Maple glaze', kind: 'ring', surchargeCents: 50, allergens: A, description: 'Nutty brown-butter dough with a maple glaze.' },
  { name: 'Cardamom Sugar', glazeRecipeId: 'cardamom-sugar', flavour: 'Cardamom', glaze: 'Cardamom sugar', kind: 'ring', surchargeCents: 0, allergens: A, description: 'Tossed warm in cardamom sugar.' },
  { name: 'Dark Chocolate Dip', glazeRecipeId: 'dark-chocolate', flavour: 'Plain', glaze: 'Dark chocolate', kind: 'ring', surchargeCents: 50, allergens: [...A, 'soybeans'], description: 'Dipped in dark chocolate (contains soy lecithin).' },
  { name: 'Lemon Poppy Glaze', glazeRecipeId: 'lemon-glaze', flavour: 'Lemon zest', glaze: 'Lemon glaze', kind: 'ring', surchargeCents: 0, allergens: A, description: 'Lemon-zest dough with a sharp lemon glaze and poppy seeds.' },
  { name: 'Honey Sesame', glazeRecipeId: 'honey-sesame', flavour: 'Plain', glaze: 'Honey glaze with toasted sesame', kind: 'ring', surchargeCents: 75, allergens: [...A, 'sesame'], description: 'Honey glaze and toasted sesame seeds.' },
  { name: 'Cinnamon Sugar Holes', glazeRecipeId: 'cinnamon-sugar', flavour: 'Plain', glaze: 'Cinnamon sugar', kind: 'hole', surchargeCents: 0, allergens: A, description: 'Doughnut holes rolled in cinnamon sugar.' },
] as const;

const DEMO_BOX_PRICES: Record<BoxSize, number> = { dozen: 3000, 'half-dozen': 1600, holes: 800 };

/** The demo's boxes: the catalogue's sizes and pieces at the demo's prices. */
export const demoBoxes = boxSizes.map((size) => ({ size, pieces: boxCatalogue[size].pieces, priceCents: DEMO_BOX_PRICES[size] }));

const WINDOWS = [
  ['08:00', '09:00'],
  ['09:00', '10:00'],
  ['10:00', '11:00'],
];

interface DayPlan {
  date: DateTime;
  status: 'published' | 'done';
  ordersOpenAt: Date;
  cutoffAt: Date;
}

async function createBakeDay(plan: DayPlan, menu: MenuItem[], transaction: Transaction) {
  const day = await BakeDay.create(
    {
      date: plan.date.toISODate()!,
      place: 'Larkspur Landing market, stall 14',
      address: '200 Millrace Road, Cobble Ridge',
      timeZone: DEMO_TIME_ZONE,
      status: plan.status,
      ordersOpenAt: plan.ordersOpenAt,
      cutoffAt: plan.cutoffAt,
      ringCapacity: 120,
      holeCapacity: 96,
      ringsRemaining: 120,
      holesRemaining: 96,
    },
    { transaction },
  );
  const windows = [];
  for (const [from, to] of WINDOWS) {
    const at = (hhmm: string) => plan.date.set({ hour: Number(hhmm.slice(0, 2)), minute: Number(hhmm.slice(3)) }).toJSDate();
    windows.push(await PickupWindow.create({ bakeDayId: day.id, startsAt: at(from!), endsAt: at(to!), maxOrders: 25, ordersRemaining: 25 }, { transaction }));
  }
  await BakeDayBox.bulkCreate(demoBoxes.map((b) => ({ ...b, bakeDayId: day.id })), { transaction });
  await BakeDayMenuItem.bulkCreate(menu.map((m) => ({ bakeDayId: day.id, menuItemId: m.id })), { transaction });
  return { day, windows };
}

/** The next `count` Saturdays/Sundays at least two days ahead, so their cut-off is still to come. */
function upcomingMarketDays(now: DateTime, count: number): DateTime[] {
  const days: DateTime[] = [];
  let d = now.setZone(DEMO_TIME_ZONE).startOf('day').plus({ days: 2 });
  while (days.length < count) {
    if (d.weekday === 6 || d.weekday === 7) days.push(d);
    d = d.plus({ days: 1 });
  }
  return days;
}

/** Orders close when the production schedule says (see cutoffFromSchedule). */
function openPlan(date: DateTime, now: DateTime, settings: ProductionSettings, formula: Formula): DayPlan {
  const firstPickup = date.set({ hour: Number(WINDOWS[0]![0]!.slice(0, 2)), minute: 0 });
  const cutoffAt = cutoffFromSchedule(settings, formula, firstPickup.toISO()!, DEMO_TIME_ZONE, 120, now.toJSDate());
  return { date, status: 'published', ordersOpenAt: now.minus({ days: 3 }).toJSDate(), cutoffAt };
}

async function seedPastWeek(menu: MenuItem[], customers: User[], now: DateTime, transaction: Transaction) {
  const date = now.setZone(DEMO_TIME_ZONE).startOf('day').minus({ days: 5 });
  const { day, windows } = await createBakeDay(
    { date, status: 'done', ordersOpenAt: date.minus({ days: 7 }).toJSDate(), cutoffAt: date.minus({ days: 1 }).set({ hour: 12 }).toJSDate() },
    menu,
    transaction,
  );
  const rings = menu.filter((m) => m.kind === 'ring');
  const hole = menu.find((m) => m.kind === 'hole')!;
  const statuses = ['collected', 'collected', 'collected', 'collected', 'no_show', 'refunded', 'cancelled', 'collected', 'collected', 'collected'] as const;
  let ringsTaken = 0;
  let holesTaken = 0;
  for (const [i, status] of statuses.entries()) {
    const size: BoxSize = i % 3 !== 2 ? 'dozen' : 'half-dozen';
    const pieces = boxCatalogue[size].pieces;
    const bagPieces = boxCatalogue.holes.pieces;
    const first = rings[i % rings.length]!;
    const second = rings[(i + 2) % rings.length]!;
    const withHoles = i % 4 === 0;
    const boxPrice = DEMO_BOX_PRICES[size];
    const price = priceOrder(
      [
        { boxPriceCents: boxPrice, items: [first, second].map((m) => ({ surchargeCents: m.surchargeCents, quantity: pieces / 2 })) },
        ...(withHoles ? [{ boxPriceCents: DEMO_BOX_PRICES.holes, items: [{ surchargeCents: hole.surchargeCents, quantity: bagPieces }] }] : []),
      ],
      { mode: 'included', rateBasisPoints: 0 },
    );
    const subtotal = price.totalCents;
    const counted = status !== 'cancelled' && status !== 'refunded';
    if (counted) {
      ringsTaken += pieces;
      holesTaken += withHoles ? bagPieces : 0;
    }
    const paidAt = date.minus({ days: 3, hours: i }).toJSDate();
    const order = await Order.create(
      {
        userId: customers[i % customers.length]!.id,
        bakeDayId: day.id,
        pickupWindowId: windows[i % windows.length]!.id,
        status,
        rings: pieces,
        holes: withHoles ? bagPieces : 0,
        holdsCapacity: counted,
        subtotalCents: subtotal,
        taxCents: 0,
        totalCents: subtotal,
        refundedCents: status === 'refunded' || status === 'cancelled' ? subtotal : 0,
        // the demo's card fee, our own round figures: 2.9 % + 30 ¢, half up to the cent
        feeCents: roundHalfUp(subtotal * 29, 1000) + 30,
        pickupCode: newPickupCode(),
        paidAt,
        collectedAt: status === 'collected' ? windows[i % windows.length]!.startsAt : null,
        cancelledAt: status === 'cancelled' ? date.minus({ days: 2 }).toJSDate() : null,
        createdAt: paidAt,
      },
      { transaction },
    );
    const box = await OrderBox.create({ orderId: order.id, position: 0, size, pieces, priceCents: boxPrice }, { transaction });
    for (const item of [first, second]) {
      await OrderLine.create(
        { orderBoxId: box.id, menuItemId: item.id, name: item.name, kind: 'ring', quantity: pieces / 2, surchargeCents: item.surchargeCents, allergens: item.allergens },
        { transaction },
      );
    }
    if (withHoles) {
      const bag = await OrderBox.create({ orderId: order.id, position: 1, size: 'holes', pieces: bagPieces, priceCents: DEMO_BOX_PRICES.holes }, { transaction });
      await OrderLine.create(
        { orderBoxId: bag.id, menuItemId: hole.id, name: hole.name, kind: 'hole', quantity: bagPieces, surchargeCents: hole.surchargeCents, allergens: hole.allergens },
        { transaction },
      );
    }
  }
  await day.update({ ringsRemaining: 120 - ringsTaken, holesRemaining: 96 - holesTaken }, { transaction });
}

export interface SeedResult {
  createdBase: boolean;
  createdBakeDays: number;
}

/**
 * Loads the demo scenario. Idempotent: the shop, people and menu are created
 * once; upcoming bake days are added only when none is still taking orders,
 * so a demo started on any day can take an order, and nothing users created
 * is touched.
 */
export async function seedDemo(nowDate: Date = new Date()): Promise<SeedResult> {
  const now = DateTime.fromJSDate(nowDate);
  return database().transaction(async (transaction) => {
    // one seeder at a time, even if two starts race
    await database().query('SELECT pg_advisory_xact_lock(4242001)', { transaction });
    const existing = await ShopSettings.findByPk(1, { transaction });
    let createdBase = false;
    if (!existing) {
      createdBase = true;
      await ShopSettings.create({ id: 1, shopName: DEMO_SHOP, currency: 'usd', taxMode: 'included', taxRateBp: 0 }, { transaction });
      for (const account of demoAccounts) {
        await User.findOrCreate({ where: { email: account.email }, defaults: { ...account, emailVerified: true }, transaction });
      }
      const customers = [];
      for (const c of extraCustomers) {
        const [user] = await User.findOrCreate({ where: { email: c.email }, defaults: { ...c, role: 'customer', emailVerified: true }, transaction });
        customers.push(user);
      }
      const menu = [];
      for (const [i, item] of demoMenu.entries()) {
        const [row] = await MenuItem.findOrCreate({
          where: { name: item.name, kind: item.kind },
          defaults: { ...item, allergens: [...item.allergens], sortOrder: i },
          transaction,
        });
        menu.push(row);
      }
      await seedPastWeek(menu, customers, now, transaction);
    }
    if (!(await ProductionSettings.findByPk(1, { transaction }))) {
      const equipment = structuredClone(DEFAULT_PLAN_SETTINGS.equipment);
      equipment.pot = { diameterMm: 280, oilDepthMm: 51 };
      equipment.frying = { ...equipment.frying, windowMinutes: 180 };
      equipment.proofing = { trays: 10, ringsPerTray: 12 };
      equipment.mixer = { capacityGrams: 5000, mixes: 2 };
      equipment.fridge = { doughGrams: 12000 };
      await ProductionSettings.create(
        {
          id: 1,
          equipment,
          schedule: structuredClone(DEFAULT_PLAN_SETTINGS.schedule),
          spare: { percent: 5, minimumRings: 2, minimumHoles: 0, glazeId: null },
          glazes: demoGlazes,
          prices: demoPrices,
          roomTempC: 21,
          updatedBy: null,
        },
        { transaction },
      );
      await FormulaVersion.create({ version: 1, formula: structuredClone(DEFAULT_FORMULA) as never, note: 'Starting formula', createdBy: null }, { transaction });
    }

    const stillOpen = await BakeDay.count({ where: { status: 'published', cutoffAt: { [Op.gt]: nowDate } }, transaction });
    let createdBakeDays = 0;
    if (stillOpen === 0) {
      const menu = await MenuItem.findAll({ where: { active: true }, transaction });
      const settings = (await ProductionSettings.findByPk(1, { transaction }))!;
      const formula = (await FormulaVersion.findOne({ order: [['version', 'DESC']], transaction }))!.formula as Formula;
      for (const date of upcomingMarketDays(now, 2)) {
        await createBakeDay(openPlan(date, now, settings, formula), menu, transaction);
        createdBakeDays += 1;
      }
    }
    return { createdBase, createdBakeDays };
  });
}
