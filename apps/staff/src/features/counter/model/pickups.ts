import { boxLabel, normalisePickupCode, type PickupRow } from '@fryline/schemas';

// The pickup list as the counter sees it: server rows with this device's
// waiting changes laid over them, grouped by window with the current one
// first, searched by name or code. Pure: `now` is passed in.

export type CounterActionName = 'collect' | 'uncollect' | 'no-show' | 'reverse-no-show';

/** A change made on this device that the server has not confirmed yet. */
export interface PendingChange {
  action: CounterActionName;
  orderId: string;
  /** When the person tapped, ISO. */
  at: string;
  by: string;
}

export interface ShownRow extends PickupRow {
  /** A change on this device is waiting to reach the server. */
  waiting: boolean;
}

/** Lays this device's waiting changes, in the order they were made, over the server's rows. */
export function withPending(rows: readonly PickupRow[], pending: readonly PendingChange[], undoSeconds = 15): ShownRow[] {
  const byId = new Map<string, ShownRow>(rows.map((r) => [r.orderId, { ...r, waiting: false }]));
  for (const change of pending) {
    const row = byId.get(change.orderId);
    if (!row) continue;
    const next: ShownRow = { ...row, waiting: true };
    if (change.action === 'collect') {
      Object.assign(next, { status: 'collected', collectedAt: change.at, collectedBy: change.by, undoUntil: new Date(Date.parse(change.at) + undoSeconds * 1000).toISOString(), noShowAt: null, noShowBy: null, late: false });
    } else if (change.action === 'uncollect') {
      Object.assign(next, { status: 'paid', collectedAt: null, collectedBy: null, undoUntil: null });
    } else if (change.action === 'no-show') {
      Object.assign(next, { status: 'no_show', noShowAt: change.at, noShowBy: change.by });
    } else {
      Object.assign(next, { status: 'paid', noShowAt: null, noShowBy: null });
    }
    byId.set(change.orderId, next);
  }
  return [...byId.values()];
}

export type RowState = 'waiting' | 'late' | 'may-no-show' | 'handed-over' | 'no-show' | 'refunded' | 'cancelled' | 'not-paid';

/** What a row means at the counter right now. */
export function rowState(row: Pick<PickupRow, 'status' | 'window' | 'noShowFrom'>, now: number): RowState {
  switch (row.status) {
    case 'collected':
      return 'handed-over';
    case 'no_show':
      return 'no-show';
    case 'refunded':
      return 'refunded';
    case 'cancelled':
      return 'cancelled';
    case 'paid':
      if (now >= Date.parse(row.noShowFrom)) return 'may-no-show';
      return now > Date.parse(row.window.endsAt) ? 'late' : 'waiting';
    default:
      return 'not-paid';
  }
}

/** Whether the undo for a hand-over is still open, and for how many whole seconds. */
export function undoSecondsLeft(row: Pick<PickupRow, 'status' | 'undoUntil'>, now: number): number {
  if (row.status !== 'collected' || !row.undoUntil) return 0;
  return Math.max(0, Math.ceil((Date.parse(row.undoUntil) - now) / 1000));
}

/** Lower case, accents dropped, spaces squeezed. */
const fold = (text: string) => text.normalize('NFD').replace(/\p{M}/gu, '').toLowerCase().replace(/\s+/g, ' ').trim();

/** Every typed word in the name, or the typed text (look-alikes forgiven) in the pickup code. Empty matches all. */
export function matchesSearch(row: Pick<PickupRow, 'name' | 'pickupCode'>, query: string): boolean {
  const words = fold(query).split(' ').filter(Boolean);
  if (words.length === 0) return true;
  const name = fold(row.name);
  if (words.every((w) => name.includes(w))) return true;
  const code = normalisePickupCode(query);
  return row.pickupCode !== null && code !== '' && row.pickupCode.includes(code);
}

export interface WindowTimes {
  id: string;
  startsAt: string;
  endsAt: string;
}

export interface WindowGroup {
  window: WindowTimes;
  when: 'now' | 'next' | 'later' | 'over';
  rows: ShownRow[];
  totals: { toHandOver: number; handedOver: number; noShows: number };
}

/**
 * Rows under their windows: the window under way first (or, between
 * windows, the next one), then the ones still to come, then those already
 * over (late arrivals). Every window of the day is listed, even empty.
 */
export function groupByWindow(windows: readonly WindowTimes[], rows: readonly ShownRow[], now: number): WindowGroup[] {
  const sorted = [...windows].sort((a, b) => Date.parse(a.startsAt) - Date.parse(b.startsAt));
  const current = sorted.find((w) => Date.parse(w.startsAt) <= now && now < Date.parse(w.endsAt)) ?? sorted.find((w) => now < Date.parse(w.startsAt));
  const groups: WindowGroup[] = sorted.map((window) => {
    const mine = rows.filter((r) => r.windowId === window.id);
    const when: WindowGroup['when'] =
      window === current ? (Date.parse(window.startsAt) <= now ? 'now' : 'next') : Date.parse(window.endsAt) <= now ? 'over' : 'later';
    return {
      window,
      when,
      rows: mine,
      totals: {
        toHandOver: mine.filter((r) => r.status === 'paid').length,
        handedOver: mine.filter((r) => r.status === 'collected').length,
        noShows: mine.filter((r) => r.status === 'no_show').length,
      },
    };
  });
  const rank = { now: 0, next: 0, later: 1, over: 2 } as const;
  return groups.sort((a, b) => rank[a.when] - rank[b.when] || Date.parse(a.window.startsAt) - Date.parse(b.window.startsAt));
}

/** Paid orders whose window and grace are over: what "mark the rest as no-show" would mark. */
export function restForNoShow(rows: readonly ShownRow[], now: number): ShownRow[] {
  return rows.filter((r) => r.status === 'paid' && now >= Date.parse(r.noShowFrom));
}

/** "A dozen: 6 Vanilla Bean Glaze, 6 Brown Butter Maple". */
export function boxText(box: PickupRow['boxes'][number]): string {
  return `${boxLabel(box.size)}: ${box.items.map((i) => `${i.quantity} ${i.name}`).join(', ')}`;
}
