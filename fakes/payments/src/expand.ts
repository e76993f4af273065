import { paramError } from './errors.js';
import { listOf } from './lists.js';
import type { PaymentsStore } from './state.js';
import type { ApiList, CheckoutSession, Charge } from './types.js';

type Expander = (store: PaymentsStore, owner: Record<string, unknown>, field: string) => unknown;

/** Replaces an id with the object it names. */
const reference: Expander = (store, owner, field) => {
  const value = owner[field];
  return typeof value === 'string' ? (store.findById(value) ?? value) : value;
};

const sessionLineItems: Expander = (store, owner) => {
  const session = owner as unknown as CheckoutSession;
  return listOf(store.internalsOf(session).lineItems, `/v1/checkout/sessions/${session.id}/line_items`);
};

const chargeRefunds: Expander = (store, owner) => {
  const charge = owner as unknown as Charge;
  const refunds = store.refunds.newestFirst().filter((refund) => refund.charge === charge.id);
  return listOf(refunds, `/v1/charges/${charge.id}/refunds`);
};

/** Which fields of which objects can be expanded. */
const EXPANDABLE: Record<string, Record<string, Expander>> = {
  'checkout.session': { payment_intent: reference, line_items: sessionLineItems },
  payment_intent: { latest_charge: reference },
  charge: { payment_intent: reference, balance_transaction: reference, refunds: chargeRefunds },
  refund: { charge: reference, payment_intent: reference, balance_transaction: reference },
  balance_transaction: { source: reference },
};

const MAX_DEPTH = 4;

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null;
}

function expandPath(store: PaymentsStore, owner: Record<string, unknown>, segments: string[], path: string): void {
  const [field, ...rest] = segments;
  if (field === undefined) return;
  const expander = EXPANDABLE[String(owner.object)]?.[field];
  if (!expander) throw paramError(`This property cannot be expanded (${path}).`, 'expand');
  if (!isRecord(owner[field])) owner[field] = structuredClone(expander(store, owner, field));
  const child = owner[field];
  if (rest.length > 0 && isRecord(child)) expandPath(store, child, rest, path);
}

/** A copy of `object` with the requested dotted paths expanded. */
export function expandObject<T>(store: PaymentsStore, object: T, paths: string[]): T {
  if (paths.length === 0) return object;
  const copy = structuredClone(object) as Record<string, unknown>;
  for (const path of paths) {
    const segments = path.split('.');
    if (segments.length > MAX_DEPTH) {
      throw paramError(`You cannot expand more than ${MAX_DEPTH} levels of a property (${path}).`, 'expand');
    }
    expandPath(store, copy, segments, path);
  }
  return copy as T;
}

/** Lists take `expand[]=data.field`. */
export function expandList<T>(store: PaymentsStore, list: ApiList<T>, paths: string[]): ApiList<T> {
  if (paths.length === 0) return list;
  const itemPaths = paths.map((path) => {
    if (!path.startsWith('data.')) throw paramError(`This property cannot be expanded (${path}).`, 'expand');
    return path.slice('data.'.length);
  });
  return { ...list, data: list.data.map((item) => expandObject(store, item, itemPaths)) };
}
