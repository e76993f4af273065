import { orderStatuses, type OrderStatus, type StaffOrderView } from '@fryline/schemas';

/** Lower case, accents dropped (é → e), spaces squeezed: how names and e-mails are compared. */
export function foldText(text: string): string {
  return text.normalize('NFD').replace(/\p{M}/gu, '').toLowerCase().replace(/\s+/g, ' ').trim();
}

/** A pickup code as compared: case, spaces and dashes don't matter. */
export function compactCode(text: string): string {
  return text.toUpperCase().replace(/[\s-]/g, '');
}

/**
 * Whether an order answers what was typed in the search box: every word
 * found in the customer's name or e-mail, or the text found in the pickup
 * code. An empty search matches everything.
 */
export function matchesOrder(order: Pick<StaffOrderView, 'customer' | 'pickupCode'>, query: string): boolean {
  const words = foldText(query).split(' ').filter(Boolean);
  if (words.length === 0) return true;
  const person = foldText(`${order.customer.name} ${order.customer.email}`);
  if (words.every((word) => person.includes(word))) return true;
  const code = compactCode(query);
  return order.pickupCode !== null && code !== '' && compactCode(order.pickupCode).includes(code);
}

export interface WindowTimes {
  id: string;
  startsAt: string;
  endsAt: string;
}

export interface WindowGroup<O> {
  window: WindowTimes;
  orders: O[];
}

/**
 * Orders under their pickup windows, earliest window first: every window of
 * the bake day (some may have no orders), then any window only an order
 * still names. Orders keep the order they came in.
 */
export function groupByWindow<O extends Pick<StaffOrderView, 'pickupWindow'>>(
  windows: readonly WindowTimes[],
  orders: readonly O[],
): WindowGroup<O>[] {
  const groups = new Map<string, WindowGroup<O>>();
  for (const window of windows) groups.set(window.id, { window, orders: [] });
  for (const order of orders) {
    let group = groups.get(order.pickupWindow.id);
    if (!group) {
      group = { window: order.pickupWindow, orders: [] };
      groups.set(order.pickupWindow.id, group);
    }
    group.orders.push(order);
  }
  return [...groups.values()].sort((a, b) => Date.parse(a.window.startsAt) - Date.parse(b.window.startsAt));
}

export interface OrdersSummary {
  /** How many orders are in each status, in the lifecycle's order; statuses with none left out. */
  byStatus: Array<{ status: OrderStatus; count: number }>;
  /** Everything paid on these orders, before refunds. */
  paidCents: number;
  refundedCents: number;
}

export function summariseOrders(
  orders: readonly Pick<StaffOrderView, 'status' | 'paidAt' | 'totalCents' | 'refundedCents'>[],
): OrdersSummary {
  const counts = new Map<OrderStatus, number>();
  let paidCents = 0;
  let refundedCents = 0;
  for (const order of orders) {
    counts.set(order.status, (counts.get(order.status) ?? 0) + 1);
    if (order.paidAt !== null) paidCents += order.totalCents;
    refundedCents += order.refundedCents;
  }
  return {
    byStatus: orderStatuses.flatMap((status) => {
      const count = counts.get(status) ?? 0;
      return count > 0 ? [{ status, count }] : [];
    }),
    paidCents,
    refundedCents,
  };
}
