import {
  boxSizes,
  boxTakes,
  priceOrder,
  orderBill,
  type OrderBill,
  type BakeDayView,
  type BoxInput,
  type BoxSize,
  type BoxView,
  type MenuItemView,
  type OrderPrice,
} from '@fryline/schemas';
import { plural } from '@fryline/ui/format';

/** One box being filled: how many of each menu item it holds. */
export interface DraftBox {
  key: string;
  size: BoxSize;
  items: Record<string, number>;
}

export type DraftStep = 'build' | 'review';

export interface Draft {
  pickupWindowId: string | null;
  boxes: DraftBox[];
  step: DraftStep;
}

/** How many rings and holes the customer may still order. */
export interface PieceLimits {
  rings: number;
  holes: number;
}

export const emptyDraft: Draft = { pickupWindowId: null, boxes: [], step: 'build' };

export function boxOf(day: BakeDayView, size: BoxSize): BoxView | undefined {
  return day.boxes.find((b) => b.size === size);
}

export function itemsForBox(day: BakeDayView, size: BoxSize): MenuItemView[] {
  const kind = boxTakes(size);
  return day.menu.filter((item) => item.kind === kind);
}

/** The box sizes this bake day sells that also have something to put in them. */
export function offeredBoxes(day: BakeDayView): BoxView[] {
  return day.boxes.filter((box) => itemsForBox(day, box.size).length > 0);
}

export function filledCount(box: DraftBox): number {
  return Object.values(box.items).reduce((sum, n) => sum + n, 0);
}

/** Rings and holes the draft takes from the bake day, counted by box size. */
export function piecesUsed(day: BakeDayView, draft: Draft): PieceLimits {
  const used = { rings: 0, holes: 0 };
  for (const box of draft.boxes) {
    const pieces = boxOf(day, box.size)?.pieces ?? 0;
    if (boxTakes(box.size) === 'hole') used.holes += pieces;
    else used.rings += pieces;
  }
  return used;
}

/** Whether one more box of this size still fits within the limits. */
export function canAddBox(day: BakeDayView, draft: Draft, size: BoxSize, limits: PieceLimits): boolean {
  const box = boxOf(day, size);
  if (!box) return false;
  const used = piecesUsed(day, draft);
  return boxTakes(size) === 'hole' ? used.holes + box.pieces <= limits.holes : used.rings + box.pieces <= limits.rings;
}

export function toBoxInputs(draft: Draft): BoxInput[] {
  return draft.boxes.map((box) => ({
    size: box.size,
    items: Object.entries(box.items)
      .filter(([, quantity]) => quantity > 0)
      .map(([menuItemId, quantity]) => ({ menuItemId, quantity })),
  }));
}

/** The draft as the bill sees it: each box's price and its items' surcharges. */
function pricedBoxes(day: BakeDayView, draft: Draft) {
  const menu = new Map(day.menu.map((item) => [item.id, item]));
  return draft.boxes.map((box) => ({
    size: box.size,
    priceCents: boxOf(day, box.size)?.priceCents ?? 0,
    items: Object.entries(box.items).map(([id, quantity]) => ({ name: menu.get(id)?.name ?? 'Unknown item', surchargeCents: menu.get(id)?.surchargeCents ?? 0, quantity })),
  }));
}

/** A preview of the price; the server works out the real one. */
export function previewPrice(day: BakeDayView, draft: Draft): OrderPrice {
  return priceOrder(pricedBoxes(day, draft).map((box) => ({ boxPriceCents: box.priceCents, items: box.items })), day.tax);
}

/** The preview as bill lines that add up to its total. */
export function previewBill(day: BakeDayView, draft: Draft, currency?: string): OrderBill {
  const boxes = pricedBoxes(day, draft);
  return orderBill({ boxes, ...previewPrice(day, draft) }, currency);
}

export function boxTitle(day: BakeDayView, draft: Draft, box: DraftBox): string {
  const label = boxOf(day, box.size)?.label ?? box.size;
  const sameSize = draft.boxes.filter((b) => b.size === box.size);
  return sameSize.length > 1 ? `${label} ${sameSize.indexOf(box) + 1}` : label;
}

/** What still stands between the draft and the review step, in words. */
export function draftProblems(day: BakeDayView, draft: Draft, limits: PieceLimits): string[] {
  const problems: string[] = [];
  const window = day.pickupWindows.find((w) => w.id === draft.pickupWindowId);
  if (!window) problems.push('Choose a pickup window.');
  else if (window.ordersLeft === 0) problems.push('That pickup window is full now; choose another one.');
  if (draft.boxes.length === 0) problems.push('Add a box.');
  for (const box of draft.boxes) {
    const pieces = boxOf(day, box.size)?.pieces ?? 0;
    const filled = filledCount(box);
    if (filled !== pieces) problems.push(`Fill your ${boxTitle(day, draft, box).replace(/^an? /i, '').toLowerCase()} (${filled} of ${pieces}).`);
  }
  const used = piecesUsed(day, draft);
  if (used.rings > limits.rings) problems.push(`Only ${plural(limits.rings, 'ring')} can be ordered; take a smaller box.`);
  if (used.holes > limits.holes) problems.push(`Only ${plural(limits.holes, 'hole')} can be ordered; take a smaller bag.`);
  return problems;
}

export type DraftAction =
  | { type: 'chooseWindow'; windowId: string }
  | { type: 'addBox'; size: BoxSize }
  | { type: 'removeBox'; key: string }
  | { type: 'setQuantity'; key: string; itemId: string; quantity: number }
  | { type: 'fillRest'; key: string; itemId: string }
  | { type: 'setStep'; step: DraftStep };

let keySeed = 0;
function newKey(): string {
  keySeed += 1;
  return `${Date.now().toString(36)}-${keySeed}`;
}

function updateBox(draft: Draft, key: string, change: (box: DraftBox) => DraftBox): Draft {
  return { ...draft, boxes: draft.boxes.map((box) => (box.key === key ? change(box) : box)) };
}

function setItem(box: DraftBox, itemId: string, quantity: number, pieces: number): DraftBox {
  const others = filledCount(box) - (box.items[itemId] ?? 0);
  const clamped = Math.max(0, Math.min(quantity, pieces - others));
  const items = { ...box.items };
  if (clamped === 0) delete items[itemId];
  else items[itemId] = clamped;
  return { ...box, items };
}

export function reduceDraft(day: BakeDayView, draft: Draft, action: DraftAction): Draft {
  switch (action.type) {
    case 'chooseWindow':
      return { ...draft, pickupWindowId: action.windowId };
    case 'addBox':
      return { ...draft, boxes: [...draft.boxes, { key: newKey(), size: action.size, items: {} }] };
    case 'removeBox':
      return { ...draft, boxes: draft.boxes.filter((box) => box.key !== action.key) };
    case 'setQuantity':
      return updateBox(draft, action.key, (box) =>
        setItem(box, action.itemId, action.quantity, boxOf(day, box.size)?.pieces ?? 0),
      );
    case 'fillRest':
      return updateBox(draft, action.key, (box) => {
        const pieces = boxOf(day, box.size)?.pieces ?? 0;
        return setItem(box, action.itemId, (box.items[action.itemId] ?? 0) + pieces - filledCount(box), pieces);
      });
    case 'setStep':
      return { ...draft, step: action.step };
  }
}

/**
 * Rebuilds a draft read back from storage against today's bake day: boxes the
 * day no longer sells and items no longer on its menu are dropped.
 */
export function sanitizeDraft(day: BakeDayView, raw: unknown): Draft {
  if (typeof raw !== 'object' || raw === null) return emptyDraft;
  const value = raw as Partial<Record<keyof Draft, unknown>>;
  const pickupWindowId =
    typeof value.pickupWindowId === 'string' && day.pickupWindows.some((w) => w.id === value.pickupWindowId)
      ? value.pickupWindowId
      : null;
  const boxes: DraftBox[] = [];
  for (const entry of Array.isArray(value.boxes) ? (value.boxes as unknown[]) : []) {
    if (typeof entry !== 'object' || entry === null) continue;
    const { size, items } = entry as { size?: unknown; items?: unknown };
    const known = boxSizes.find((s) => s === size);
    if (!known || !boxOf(day, known)) continue;
    let box: DraftBox = { key: newKey(), size: known, items: {} };
    const allowed = new Set(itemsForBox(day, known).map((item) => item.id));
    const pieces = boxOf(day, known)?.pieces ?? 0;
    for (const [id, quantity] of Object.entries(typeof items === 'object' && items !== null ? items : {})) {
      if (allowed.has(id) && Number.isInteger(quantity)) box = setItem(box, id, quantity as number, pieces);
    }
    boxes.push(box);
  }
  const step = value.step === 'review' && boxes.length > 0 ? 'review' : 'build';
  return { pickupWindowId, boxes, step };
}
