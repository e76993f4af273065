import { DateTime } from 'luxon';
import {
  DEFAULT_DOUGH_ALLERGENS, DEFAULT_DOUGH_TEMPERATURE_SETTINGS, DEFAULT_DOUGH_VARIATIONS, DEFAULT_FORMULA, DEFAULT_PLAN_SETTINGS, ProductionInputError, planBake,
  type BakePlan, type BoxOffer, type Formula, type OrderLine, type PlanBakeInput,
} from '@fryline/production';
import {
  boxLabel, boxPieces, type DoughSettingsInput, type FormulaInput, type PlanMeta, type PlanResponse, type ProductionSettingsInput,
} from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { boxesToPack, orderCountsByStatus, orderedLines } from '../../db/queries/plan.js';
import { BakeDay, FormulaVersion, ProductionSettings } from '../../db/models/index.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { audit } from '../audit/audit.js';
import { findBakeDay } from '../bake-days/bake-days.js';
import { setCapacityKeepingSold } from '../bake-day-edit/capacity.js';

/** Fallback prices (cents per kg) when the owner has entered none: our own round figures. */
const DEFAULT_PRICES: ProductionSettingsInput['prices'] = { centsPerKg: {}, fryingOilCentsPerKg: 300, oilBakesPerFill: 3 };

/** The demo's flavoured doughs, and the menu flavours that take them. */
const DEFAULT_FLAVOURS: Record<string, string[]> = { 'lemon-zest': ['Lemon zest'], 'brown-butter': ['Brown butter'] };

export const defaultDoughSettings = (): DoughSettingsInput => ({
  temperature: structuredClone(DEFAULT_DOUGH_TEMPERATURE_SETTINGS) as DoughSettingsInput['temperature'],
  variations: structuredClone(DEFAULT_DOUGH_VARIATIONS).map((v) => ({ ...v, flavours: DEFAULT_FLAVOURS[v.id] ?? [] })) as DoughSettingsInput['variations'],
  eggClass: 'large',
});

export const defaultProductionSettings = (): Required<ProductionSettingsInput> => ({
  equipment: structuredClone(DEFAULT_PLAN_SETTINGS.equipment) as ProductionSettingsInput['equipment'],
  schedule: structuredClone(DEFAULT_PLAN_SETTINGS.schedule) as ProductionSettingsInput['schedule'],
  spare: structuredClone(DEFAULT_PLAN_SETTINGS.spare) as ProductionSettingsInput['spare'],
  glazes: structuredClone(DEFAULT_PLAN_SETTINGS.glazes) as ProductionSettingsInput['glazes'],
  prices: structuredClone(DEFAULT_PRICES),
  roomTempC: 22,
  dough: defaultDoughSettings(),
});

export async function getProductionSettings(): Promise<Required<ProductionSettingsInput> & { updatedAt: string | null }> {
  const row = await ProductionSettings.findByPk(1);
  if (!row) return { ...defaultProductionSettings(), updatedAt: null };
  return {
    equipment: row.equipment, schedule: row.schedule, spare: row.spare, glazes: row.glazes, prices: row.prices, roomTempC: row.roomTempC,
    dough: row.dough ?? defaultDoughSettings(),
    updatedAt: row.updatedAt.toISOString(),
  };
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

/** Which dough each menu flavour takes (case-insensitive), from the owner's flavoured doughs. */
function doughByFlavour(dough: DoughSettingsInput): Map<string, string> {
  return new Map(dough.variations.flatMap((v) => v.flavours.map((f) => [f.trim().toLowerCase(), v.id] as const)));
}

/** What a plan is worked out from; `dough` is null in settings saved before it existed. */
type PlanningSettings = Omit<ProductionSettingsInput, 'dough'> & { dough?: DoughSettingsInput | null };

function planInput(
  settings: PlanningSettings,
  formula: Formula,
  orders: OrderLine[],
  when: { firstPickupStartsAt: string; timeZone: string; now: string },
  boxes: BoxOffer[],
  byMenuItem: Record<string, string[]> = {},
  boxCount?: number,
): PlanBakeInput {
  const dough = settings.dough ?? defaultDoughSettings();
  return {
    orders,
    doughTemperature: dough.temperature,
    doughs: dough.variations.map(({ flavours: _flavours, ...v }) => v),
    eggClass: dough.eggClass,
    ...(boxCount !== undefined ? { boxesToPack: boxCount } : {}),
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
 * The last few plans, by everything they were worked out from except the
 * clock: the sheet is asked for every 30 s by each open screen and rarely
 * changes between two asks. The clock only decides whether the cut-off or
 * the first step has passed, so a plan is reused while that stays the same.
 * Each keeps its JSON text, written once (a big day's sheet is megabytes).
 */
const planCache = new Map<string, { plan: BakePlan; phase: number }>();
const planTexts = new WeakMap<BakePlan, Buffer>();
const PLAN_CACHE_SIZE = 4;

function clockPhase(plan: BakePlan, nowIso: string): number {
  const nowMs = Date.parse(nowIso);
  if (nowMs >= Date.parse(plan.firstStepAt)) return 2;
  return nowMs >= Date.parse(plan.preorderCutoffAt) ? 1 : 0;
}

function cachedPlan(input: PlanBakeInput): BakePlan {
  const key = JSON.stringify({ ...input, now: undefined });
  const hit = planCache.get(key);
  if (hit && clockPhase(hit.plan, input.now) === hit.phase) {
    planCache.delete(key); // most recently used last
    planCache.set(key, hit);
    return hit.plan;
  }
  const plan = planBake(input);
  planCache.delete(key);
  planCache.set(key, { plan, phase: clockPhase(plan, input.now) });
  if (planCache.size > PLAN_CACHE_SIZE) planCache.delete(planCache.keys().next().value!);
  return plan;
}

/**
 * The sheet route's answer as the bytes res.json would write, in three
 * parts: a cached plan's UTF-8 text is reused, only the meta is written anew.
 */
export function planResponseParts(response: PlanResponse): Buffer[] {
  let plan = planTexts.get(response.plan);
  if (plan === undefined) {
    plan = Buffer.from(JSON.stringify(response.plan));
    planTexts.set(response.plan, plan);
  }
  return [Buffer.from('{"plan":'), plan, Buffer.from(`,"meta":${JSON.stringify(response.meta)}}`)];
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

  const [lines, counts, settings, boxCount] = await Promise.all([
    orderedLines(day.id),
    orderCountsByStatus(day.id),
    getProductionSettings(),
    boxesToPack(day.id),
  ]);
  const known = new Set(settings.glazes.map((g) => g.id));
  const doughs = doughByFlavour(settings.dough);
  const orders: OrderLine[] = lines.map((l) => ({
    menuItemId: l.menu_item_id,
    name: l.name,
    kind: l.kind,
    glaze: l.glaze_recipe_id && known.has(l.glaze_recipe_id) ? l.glaze_recipe_id : null,
    quantity: l.quantity,
    dough: doughs.get(l.flavour.trim().toLowerCase()) ?? null,
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
    plan = cachedPlan(
      planInput(settings, formula.formula as Formula, orders, { firstPickupStartsAt: windows[0].startsAt.toISOString(), timeZone: day.timeZone, now: now.toISOString() }, boxes, byMenuItem, boxCount),
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
  settings: PlanningSettings,
  formula: Formula,
  firstPickupStartsAt: string,
  timeZone: string,
  rings: number,
  now: Date,
): Date {
  const plan = planBake(
    planInput(settings, formula, rings > 0 ? [{ menuItemId: 'full-day', name: 'A full day', kind: 'ring', glaze: null, quantity: rings }] : [], {
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
