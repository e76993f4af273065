import { DateTime } from 'luxon';
import {
  DEFAULT_DOUGH_ALLERGENS, DEFAULT_FORMULA, DEFAULT_PLAN_SETTINGS, ProductionInputError, planBake,
  type BakePlan, type BoxOffer, type Formula, type OrderLine, type PlanBakeInput,
} from '@fryline/production';
import { boxLabel, boxPieces, type FormulaInput, type PlanMeta, type PlanResponse, type ProductionSettingsInput } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { orderCountsByStatus, orderedLines } from '../../db/queries/plan.js';
import { BakeDay, FormulaVersion, ProductionSettings } from '../../db/models/index.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { audit } from '../audit/audit.js';
import { findBakeDay } from '../bake-days/bake-days.js';
import { setCapacityKeepingSold } from '../bake-day-edit/capacity.js';

/** Fallback prices (cents per kg) when the owner has entered none: our own round figures. */
const DEFAULT_PRICES: ProductionSettingsInput['prices'] = { centsPerKg: {}, fryingOilCentsPerKg: 300, oilBakesPerFill: 3 };

export const defaultProductionSettings = (): ProductionSettingsInput => ({
  equipment: structuredClone(DEFAULT_PLAN_SETTINGS.equipment) as ProductionSettingsInput['equipment'],
  schedule: structuredClone(DEFAULT_PLAN_SETTINGS.schedule) as ProductionSettingsInput['schedule'],
  spare: structuredClone(DEFAULT_PLAN_SETTINGS.spare) as ProductionSettingsInput['spare'],
  glazes: structuredClone(DEFAULT_PLAN_SETTINGS.glazes) as ProductionSettingsInput['glazes'],
  prices: structuredClone(DEFAULT_PRICES),
  roomTempC: 22,
});

export async function getProductionSettings(): Promise<ProductionSettingsInput & { updatedAt: string | null }> {
  const row = await ProductionSettings.findByPk(1);
  if (!row) return { ...defaultProductionSettings(), updatedAt: null };
  return { equipment: row.equipment, schedule: row.schedule, spare: row.spare, glazes: row.glazes, prices: row.prices, roomTempC: row.roomTempC, updatedAt: row.updatedAt.toISOString() };
}

/** Checks settings with the maths itself (a plan with no orders), so nothing unusable is saved. */
function tryPlan(settings: ProductionSettingsInput, formula: Formula) {
  try {
    return planBake(planInput(settings, formula, [], { firstPickupStartsAt: '2030-06-01T15:00:00Z', timeZone: 'UTC', now: '2030-05-01T00:00:00Z' }, []));
  } catch (err) {
    if (err instanceof ProductionInputError) throw new AppError('invalid', `${err.field}: ${err.message}`, 400, { fields: { [err.field]: err.message } });
    throw err;
  }
}

export async function saveProductionSettings(userId: string, settings: ProductionSettingsInput) {
  tryPlan(settings, (await latestFormula()).formula as Formula);
  await database().transaction(async (transaction) => {
    await ProductionSettings.upsert({ id: 1, ...settings, updatedBy: userId }, { transaction });
    await audit({ actorId: userId, action: 'production.settings', subjectType: 'production_settings', subjectId: '1' }, transaction);
  });
  return getProductionSettings();
}

async function latestFormula(): Promise<{ id: string | null; version: number; formula: FormulaInput; note: string; createdAt: string | null }> {
  const row = await FormulaVersion.findOne({ order: [['version', 'DESC']] });
  if (!row) return { id: null, version: 0, formula: structuredClone(DEFAULT_FORMULA) as FormulaInput, note: 'built-in starting formula', createdAt: null };
  return { id: row.id, version: row.version, formula: row.formula, note: row.note, createdAt: row.createdAt.toISOString() };
}

export async function listFormulaVersions() {
  const rows = await FormulaVersion.findAll({ order: [['version', 'DESC']], limit: 50 });
  const latest = await latestFormula();
  return {
    current: latest,
    versions: rows.map((r) => ({ id: r.id, version: r.version, note: r.note, createdAt: r.createdAt.toISOString(), formula: r.formula })),
  };
}

/** Saves a formula as a new version; sheets already planned keep theirs. */
export async function saveFormula(userId: string, formula: FormulaInput, note: string) {
  const settings = await getProductionSettings();
  tryPlan(settings, formula as Formula);
  return database().transaction(async (transaction) => {
    await database().query('SELECT pg_advisory_xact_lock(4242002)', { transaction });
    const max = (await FormulaVersion.max('version', { transaction })) as number | null;
    const row = await FormulaVersion.create({ version: (max ?? 0) + 1, formula, note, createdBy: userId }, { transaction });
    await audit({ actorId: userId, action: 'formula.saved', subjectType: 'formula', subjectId: row.id, details: { version: row.version } }, transaction);
    return { id: row.id, version: row.version, note: row.note, createdAt: row.createdAt.toISOString(), formula: row.formula };
  });
}

function planInput(
  settings: ProductionSettingsInput,
  formula: Formula,
  orders: OrderLine[],
  when: { firstPickupStartsAt: string; timeZone: string; now: string },
  boxes: BoxOffer[],
  byMenuItem: Record<string, string[]> = {},
): PlanBakeInput {
  return {
    orders,
    spare: settings.spare,
    formula,
    equipment: settings.equipment,
    schedule: settings.schedule,
    roomTempC: settings.roomTempC,
    ...when,
    prices: settings.prices,
    glazes: settings.glazes,
    boxes,
    allergens: { dough: DEFAULT_DOUGH_ALLERGENS, byMenuItem },
  };
}

/**
 * The production sheet for a bake day: every paid and held order counted
 * (held ones may still lapse, so the sheet errs on the side of enough dough).
 * The first time a day is planned it is pinned to the current formula version.
 */
export async function planForBakeDay(bakeDayId: string, now: Date): Promise<PlanResponse> {
  const day = await findBakeDay(bakeDayId);
  if (!day) throw notFound('Bake day');
  const windows = [...(day.pickupWindows ?? [])].sort((a, b) => a.startsAt.getTime() - b.startsAt.getTime());
  if (!windows[0]) throw new AppError('no_pickup_window', 'This bake day has no pickup window to plan back from', 409);

  const latest = await latestFormula();
  if (!day.formulaVersionId && latest.id) {
    await BakeDay.update({ formulaVersionId: latest.id }, { where: { id: day.id, formulaVersionId: null } });
    await day.reload();
  }
  const pinned = day.formulaVersionId ? await FormulaVersion.findByPk(day.formulaVersionId) : null;
  const formula = pinned ? { id: pinned.id, version: pinned.version, note: pinned.note, formula: pinned.formula } : latest;

  const [lines, counts, settings] = await Promise.all([
    orderedLines(day.id),
    orderCountsByStatus(day.id),
    getProductionSettings(),
  ]);
  const known = new Set(settings.glazes.map((g) => g.id));
  const orders: OrderLine[] = lines.map((l) => ({
    menuItemId: l.menu_item_id,
    name: l.name,
    kind: l.kind,
    glaze: l.glaze_recipe_id && known.has(l.glaze_recipe_id) ? l.glaze_recipe_id : null,
    quantity: l.quantity,
  }));
  const boxes: BoxOffer[] = (day.boxes ?? []).map((b) => ({
    id: b.size,
    name: boxLabel(b.size),
    ...boxPieces(b.size, b.pieces),
    glazeId: null,
    priceCents: b.priceCents,
  }));
  const byMenuItem = Object.fromEntries((day.menuItems ?? []).map((m) => [m.id, m.allergens]));
  let plan: BakePlan;
  try {
    plan = planBake(
      planInput(settings, formula.formula as Formula, orders, { firstPickupStartsAt: windows[0].startsAt.toISOString(), timeZone: day.timeZone, now: now.toISOString() }, boxes, byMenuItem),
    );
  } catch (err) {
    if (err instanceof ProductionInputError) throw new AppError('plan_failed', `The plan can't be worked out: ${err.field} ${err.message}`, 409);
    throw err;
  }
  const n = (status: string) => counts.find((c) => c.status === status)?.n ?? 0;
  return {
    plan,
    meta: {
      bakeDay: {
        id: day.id,
        date: day.date,
        place: day.place,
        timeZone: day.timeZone,
        cutoffAt: DateTime.fromJSDate(day.cutoffAt).toISO()!,
        capacity: { rings: day.ringCapacity, holes: day.holeCapacity },
      },
      ordersCounted: n('held') + n('paid') + n('collected'),
      paidOrders: n('paid') + n('collected'),
      heldOrders: n('held'),
      computedAt: now.toISOString(),
      formula: { id: formula.id, version: formula.version, note: formula.note },
      latestFormulaVersion: latest.version,
      menu: (day.menuItems ?? []).map((m) => ({ id: m.id, name: m.name, kind: m.kind, glaze: m.glaze, glazeRecipeId: m.glazeRecipeId })),
    },
  };
}

/**
 * When pre-orders should close for a bake day: the schedule's first step
 * (building the starter), worked back from the first pickup for a full day's
 * pieces, less the baker's margin, rounded down to the quarter hour so
 * customers can read it. Pure: settings and formula are passed in.
 */
export function cutoffFromSchedule(
  settings: Pick<ProductionSettingsInput, 'spare' | 'equipment' | 'schedule' | 'roomTempC' | 'prices' | 'glazes'>,
  formula: Formula,
  firstPickupStartsAt: string,
  timeZone: string,
  rings: number,
  now: Date,
): Date {
  const plan = planBake(
    planInput(settings as ProductionSettingsInput, formula, rings > 0 ? [{ menuItemId: 'full-day', name: 'A full day', kind: 'ring', glaze: null, quantity: rings }] : [], {
      firstPickupStartsAt,
      timeZone,
      now: now.toISOString(),
    }, []),
  );
  const cutoff = DateTime.fromISO(plan.preorderCutoffAt).setZone(timeZone).startOf('minute');
  return cutoff.minus({ minutes: cutoff.minute % 15 }).toJSDate();
}

/** The current settings and formula, for working out a new bake day's cut-off. */
export async function currentPlanningBasis() {
  return { settings: await getProductionSettings(), formula: (await latestFormula()).formula as Formula };
}

/** Moves a bake day's sheet to another formula version, on purpose. */
export async function pinFormula(userId: string, bakeDayId: string, formulaVersionId: string) {
  const [day, version] = await Promise.all([BakeDay.findByPk(bakeDayId), FormulaVersion.findByPk(formulaVersionId)]);
  if (!day) throw notFound('Bake day');
  if (!version) throw notFound('Formula version');
  await database().transaction(async (transaction) => {
    await day.update({ formulaVersionId: version.id }, { transaction });
    await audit({ actorId: userId, action: 'bake_day.formula', subjectType: 'bake_day', subjectId: day.id, details: { version: version.version } }, transaction);
  });
}

const limitWords: Record<string, string> = { fry: 'frying time', 'proofing-trays': 'proofing trays', mixer: 'the mixer', fridge: 'fridge space' };

/** What the equipment can make in a day, and what limits it. */
export async function equipmentCapacity() {
  const settings = await getProductionSettings();
  return tryPlan(settings, (await latestFormula()).formula as Formula).capacity;
}

/**
 * The owner sets a bake day's capacity: lower than the equipment allows is
 * fine, higher needs an explicit yes. Never below what is already sold.
 */
export async function setBakeDayCapacity(userId: string, bakeDayId: string, rings: number, holes: number, acceptAboveEquipment: boolean) {
  const derived = await equipmentCapacity();
  if (rings > derived.pieces && !acceptAboveEquipment) {
    throw new AppError('above_equipment', `Your equipment makes about ${derived.pieces} rings a day (limited by ${limitWords[derived.limitedBy] ?? derived.limitedBy}). Confirm to set ${rings} anyway.`, 409, {
      derived,
    });
  }
  if (!(await BakeDay.findByPk(bakeDayId))) throw notFound('Bake day');
  await setCapacityKeepingSold(bakeDayId, rings, holes);
  await audit({ actorId: userId, action: 'bake_day.capacity', subjectType: 'bake_day', subjectId: bakeDayId, details: { rings, holes } });
  const day = await BakeDay.findByPk(bakeDayId);
  return { rings: day!.ringCapacity, holes: day!.holeCapacity, remaining: { rings: day!.ringsRemaining, holes: day!.holesRemaining }, derived };
}
