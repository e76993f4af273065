/**
 * The new-bake-day form: its values as typed, where they start, and how
 * they become the API's `CreateBakeDayInput`. Clock times are the bake day's
 * own local times; only the API body carries instants.
 */
import { z } from 'zod';
import { formatInstant, parseInstant } from '@fryline/production';
import {
  boxCatalogue,
  boxSizes,
  boxTakes,
  centsToInput,
  createBakeDaySchema,
  parseCents,
  type BakeDayView,
  type BoxSize,
  type CreateBakeDayInput,
  type MenuItemAdminView,
} from '@fryline/schemas';
import { isApiError, putFieldErrors } from '@fryline/ui/api-client';

/** One pickup window as typed: local clock times, and an order cap ('' for none). */
export interface WindowRow {
  start: string;
  end: string;
  maxOrders: string;
}

/** One box size: offered or not, how many it holds and its price as typed (in the shop's currency). */
export interface BoxRow {
  size: BoxSize;
  offered: boolean;
  pieces: number;
  price: string;
}

export interface NewBakeDayValues {
  date: string;
  place: string;
  address: string;
  timeZone: string;
  windows: WindowRow[];
  menuItemIds: string[];
  /** Always one row per box size, in the order of `boxSizes`. */
  boxes: BoxRow[];
  ringCapacity: number;
  holeCapacity: number;
  /** Local date and time ("2026-12-10T18:00") in the bake day's zone; blank: as soon as it is saved. */
  ordersOpenAt: string;
  /** Local date and time; blank: worked back from the production schedule. */
  cutoffAt: string;
  publish: boolean;
}

/** The API allows up to 12 pickup windows a day. */
export const MAX_WINDOWS = 12;

/** "09:30" + 60 → "10:30"; stops at 23:59 (a window ends on its bake day). */
function addMinutes(clock: string, minutes: number): string {
  const [h = 0, m = 0] = clock.split(':').map(Number);
  const total = Math.min(23 * 60 + 59, h * 60 + m + minutes);
  return `${String(Math.floor(total / 60)).padStart(2, '0')}:${String(total % 60).padStart(2, '0')}`;
}

/** The row "Add a pickup window" adds: an hour from where the last one ends, or blank. */
export function nextWindow(rows: readonly WindowRow[]): WindowRow {
  const lastEnd = rows.at(-1)?.end ?? '';
  if (!/^\d{2}:\d{2}$/.test(lastEnd) || lastEnd >= '23:59') return { start: '', end: '', maxOrders: '' };
  return { start: lastEnd, end: addMinutes(lastEnd, 60), maxOrders: '' };
}

/** The bake day with the latest date among the lists (upcoming and past), if any. */
export function latestBakeDay(...lists: ReadonlyArray<readonly BakeDayView[] | undefined>): BakeDayView | undefined {
  let latest: BakeDayView | undefined;
  for (const day of lists.flatMap((list) => list ?? [])) {
    if (!latest || day.date > latest.date) latest = day;
  }
  return latest;
}

/** The local clock time ("18:30") of an instant in a zone. */
export function clockIn(iso: string, timeZone: string): string {
  return formatInstant(Date.parse(iso), timeZone).slice(11, 16);
}

const LOCAL_DATE_TIME = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/;

/**
 * A local date and time typed in the bake day's zone ("2026-12-10T18:00")
 * as an ISO instant with that zone's offset at the time, or null when it is
 * not one. A time skipped by a daylight-saving change moves forward.
 */
export function instantIn(local: string, timeZone: string): string | null {
  if (!LOCAL_DATE_TIME.test(local)) return null;
  try {
    return formatInstant(parseInstant('time', local, timeZone), timeZone);
  } catch {
    return null;
  }
}

interface DefaultsSource {
  /** The most recent bake day, to copy its zone, windows and box prices from. */
  latest: BakeDayView | undefined;
  /** Rings the equipment makes in a bake day, when known. */
  equipmentRings: number | undefined;
  menuItems: readonly MenuItemAdminView[];
  /** The zone when there is no bake day to copy it from (the browser's). */
  fallbackZone: string;
}

/**
 * Where the form starts: the last bake day's zone, pickup windows and box
 * prices; every active menu item ticked; ring capacity from the equipment
 * and as many holes as rings (each ring's centre is cut out as a hole).
 */
export function newBakeDayDefaults({ latest, equipmentRings, menuItems, fallbackZone }: DefaultsSource): NewBakeDayValues {
  const timeZone = latest?.timeZone ?? fallbackZone;
  const active = menuItems.filter((item) => item.active);
  const hasKind = (kind: MenuItemAdminView['kind']) => active.some((item) => item.kind === kind);
  const rings = equipmentRings ?? latest?.capacity.rings ?? Number.NaN;
  const windows = latest?.pickupWindows.length
    ? latest.pickupWindows.slice(0, MAX_WINDOWS).map((w) => ({
        start: clockIn(w.startsAt, latest.timeZone),
        end: clockIn(w.endsAt, latest.timeZone),
        maxOrders: '',
      }))
    : [{ start: '09:00', end: '11:00', maxOrders: '' }];
  const boxes = boxSizes.map((size): BoxRow => {
    const before = latest?.boxes.find((box) => box.size === size);
    const fillable = hasKind(boxTakes(size));
    return {
      size,
      offered: fillable && (latest === undefined || before !== undefined),
      pieces: before?.pieces ?? boxCatalogue[size].pieces,
      price: before ? centsToInput(before.priceCents) : '',
    };
  });
  return {
    date: '',
    place: '',
    address: '',
    timeZone,
    windows,
    menuItemIds: active.map((item) => item.id),
    boxes,
    ringCapacity: rings,
    holeCapacity: rings,
    ordersOpenAt: '',
    cutoffAt: '',
    publish: true,
  };
}

/** The indexes of the box rows that are offered: the API's `boxes[i]` is the form's `boxes[offered[i]]`. */
export function offeredRows(boxes: readonly BoxRow[]): number[] {
  return boxes.flatMap((box, index) => (box.offered ? [index] : []));
}

const sameName = new Set(['date', 'place', 'address', 'timeZone', 'ringCapacity', 'holeCapacity', 'ordersOpenAt', 'cutoffAt']);
const windowFields = new Set(['start', 'end', 'maxOrders']);

/**
 * The form field an API field path belongs to (`boxes.1.priceCents` →
 * `boxes.2.price` when the dozen is not offered), or null for a path no
 * input shows. Lists' own errors go on the list.
 */
export function formPath(apiPath: string, offered: readonly number[]): string | null {
  if (sameName.has(apiPath)) return apiPath;
  const [head, index, leaf] = apiPath.split('.');
  if (head === 'menuItemIds') return 'menuItemIds';
  if (head === 'windows') return index !== undefined && leaf !== undefined && windowFields.has(leaf) ? `windows.${index}.${leaf}` : 'windows';
  if (head === 'boxes') {
    const row = index === undefined ? undefined : offered[Number(index)];
    if (row !== undefined && leaf === 'priceCents') return `boxes.${row}.price`;
    if (row !== undefined && leaf === 'pieces') return `boxes.${row}.pieces`;
    return 'boxes';
  }
  return null;
}

/** Messages by form field path ("windows.0.end"); `root` for what no field shows. */
export type FormProblems = Record<string, string>;

export type Conversion = { ok: true; body: CreateBakeDayInput } | { ok: false; problems: FormProblems };

/** "" → no cap; "20" → 20; anything else undefined (not a whole number). */
function orderCap(text: string): number | null | undefined {
  const trimmed = text.trim();
  if (trimmed === '') return null;
  return /^\d+$/.test(trimmed) ? Number(trimmed) : undefined;
}

/**
 * The typed pickup windows as the API takes them: local clock times and a
 * cap or null; a cap that is not a whole number is NaN, for the check to refuse.
 */
export function windowsForApi(rows: readonly WindowRow[]): CreateBakeDayInput['windows'] {
  return rows.map((row) => {
    const cap = orderCap(row.maxOrders);
    return { start: row.start, end: row.end, maxOrders: cap === undefined ? Number.NaN : cap };
  });
}

/**
 * Checks the form and turns it into the API body. Every problem comes back
 * at once, keyed by the form field it belongs to; the API's own schema
 * makes the final check.
 */
export function toCreateBakeDay(values: NewBakeDayValues): Conversion {
  const problems: FormProblems = {};
  const note = (path: string, message: string) => {
    problems[path] ??= message;
  };

  values.windows.forEach((row, i) => {
    if (row.start === '') note(`windows.${i}.start`, 'Give a start time');
    if (row.end === '') note(`windows.${i}.end`, 'Give an end time');
    // The API's own check skips a row with another problem; say this one at the same time.
    else if (row.start !== '' && row.end <= row.start) note(`windows.${i}.end`, 'A window ends after it starts');
    if (orderCap(row.maxOrders) === undefined) note(`windows.${i}.maxOrders`, 'A whole number of orders, or leave it blank');
  });

  const offered = offeredRows(values.boxes);
  const boxes = offered.map((index) => {
    const row = values.boxes[index]!;
    const cents = parseCents(row.price);
    if (row.price.trim() === '') note(`boxes.${index}.price`, 'Give the price');
    else if (cents === null) note(`boxes.${index}.price`, 'Write the price as a number, like 16.50');
    else if (cents > 100_000) note(`boxes.${index}.price`, 'At most 1,000.00');
    if (!Number.isInteger(row.pieces) || row.pieces < 1 || row.pieces > 60) note(`boxes.${index}.pieces`, 'Between 1 and 60');
    return { size: row.size, pieces: row.pieces, priceCents: cents ?? Number.NaN };
  });

  for (const name of ['ringCapacity', 'holeCapacity'] as const) {
    if (!Number.isFinite(values[name])) note(name, `Write a whole number of ${name === 'ringCapacity' ? 'rings' : 'holes'}`);
  }

  const instant = (name: 'ordersOpenAt' | 'cutoffAt') => {
    const typed = values[name].trim();
    if (typed === '') return undefined;
    const iso = instantIn(typed, values.timeZone);
    if (iso === null) note(name, 'Pick a date and a time');
    return iso ?? typed;
  };

  const menuItemIds: unknown = values.menuItemIds;
  const candidate = {
    date: values.date,
    place: values.place,
    address: values.address,
    timeZone: values.timeZone,
    windows: windowsForApi(values.windows),
    menuItemIds: Array.isArray(menuItemIds) ? menuItemIds : typeof menuItemIds === 'string' ? [menuItemIds] : [],
    boxes,
    ringCapacity: values.ringCapacity,
    holeCapacity: values.holeCapacity,
    ordersOpenAt: instant('ordersOpenAt'),
    cutoffAt: instant('cutoffAt'),
    publish: values.publish,
  };

  const parsed = createBakeDaySchema.safeParse(candidate);
  if (parsed.success && Object.keys(problems).length === 0) return { ok: true, body: parsed.data };
  for (const issue of parsed.error?.issues ?? []) {
    note(formPath(issue.path.join('.'), offered) ?? 'root', issue.message);
  }
  return { ok: false, problems };
}

/**
 * The form's resolver schema: the typed values in, `CreateBakeDayInput` out
 * (checked by `createBakeDaySchema`), or every problem at its field.
 */
export const newBakeDayFormSchema = z.custom<NewBakeDayValues>().transform((values, ctx): CreateBakeDayInput => {
  const result = toCreateBakeDay(values);
  if (result.ok) return result.body;
  for (const [path, message] of Object.entries(result.problems)) {
    ctx.addIssue({ code: 'custom', path: path.split('.').map((part) => (/^\d+$/.test(part) ? Number(part) : part)), message });
  }
  return z.NEVER;
});

/**
 * Puts the API's field errors beside the inputs they belong to (`offered`:
 * the box rows that were sent); returns the messages no input took, or the
 * error's own message when it named no field.
 */
export function placeServerErrors(
  error: unknown,
  offered: readonly number[],
  setError: (path: string, error: { type: string; message: string }) => void,
): string[] {
  const placed = isApiError(error) ? Object.keys(error.fieldErrors).filter((key) => formPath(key, offered) !== null) : [];
  return putFieldErrors(error, (key, fieldError) => setError(formPath(key, offered)!, fieldError), placed);
}
