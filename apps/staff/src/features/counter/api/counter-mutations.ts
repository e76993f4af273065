import { onlineManager, useMutation, useMutationState, useQueryClient, type Mutation, type QueryClient } from '@tanstack/react-query';
import { formatCents, type MarkRestNoShowResult, type PaymentMethod, type PickupRow, type WalkUpSale } from '@fryline/schemas';
import { shopQuery } from '@fryline/ui';
import { api, ApiError } from '@fryline/ui/api-client';
import { addConflict } from '../model/conflicts';
import type { CounterActionName, PendingChange } from '../model/pickups';
import { counterQueries } from './counter-queries';

// The counter's changes. Each one carries an Idempotency-Key made when the
// person tapped, so sending it again (after a dead connection, a reload, a
// retry) never counts it twice. They share one scope: sent one after the
// other, in the order they were made. With no connection they wait, are kept
// on the phone with the query cache, and go out when it is back.

export interface OrderChange extends PendingChange {
  bakeDayId: string;
  key: string;
  /** The customer's name, for the conflict list. */
  name: string;
}

export interface WalkUpChange {
  bakeDayId: string;
  key: string;
  at: string;
  items: Array<{ menuItemId: string; name: string; quantity: number }>;
  method: PaymentMethod;
  amountCents: number;
}

export interface RestNoShowChange {
  bakeDayId: string;
  key: string;
  at: string;
  count: number;
}

export const counterMutationKeys = {
  all: ['counter'] as const,
  order: ['counter', 'order-change'] as const,
  walkUp: ['counter', 'walk-up'] as const,
  restNoShow: ['counter', 'no-shows'] as const,
};

const SCOPE = { id: 'counter-changes' };
const headers = (key: string) => ({ headers: { 'Idempotency-Key': key } });

/** No answer, or the server in trouble: try again later. Anything else is the server's decision. */
const transient = (error: unknown) => !(error instanceof ApiError) || error.status === 0 || error.status >= 500;

const actionWords: Record<CounterActionName, string> = {
  collect: 'Hand over',
  uncollect: 'Undo the hand-over for',
  'no-show': 'Mark as no-show:',
  'reverse-no-show': 'Undo the no-show for',
};

function afterChange(queryClient: QueryClient, bakeDayId: string) {
  return queryClient.invalidateQueries({ queryKey: counterQueries.dayKey(bakeDayId) });
}

const shared = {
  scope: SCOPE,
  retry: (_failures: number, error: unknown) => transient(error),
  retryDelay: (failures: number) => Math.min(30_000, 1_000 * 2 ** failures),
};

/**
 * Registers how each counter change is sent. It lives on the query client,
 * not in a component, so changes kept from before a reload can be sent.
 */
export function registerCounterMutations(queryClient: QueryClient) {
  queryClient.setMutationDefaults(counterMutationKeys.order, {
    ...shared,
    mutationFn: (v: OrderChange) => api.post<PickupRow>(`/api/orders/${encodeURIComponent(v.orderId)}/${v.action}`, { bakeDayId: v.bakeDayId }, headers(v.key)),
    onSuccess: (data: unknown, v: OrderChange) => {
      const row = data as PickupRow;
      queryClient.setQueryData<PickupRow[]>(counterQueries.pickups(v.bakeDayId).queryKey, (rows) => rows?.map((r) => (r.orderId === row.orderId ? row : r)));
    },
    onError: (error: unknown, v: OrderChange) => {
      addConflict({ what: `${actionWords[v.action]} ${v.name}`, reason: error instanceof ApiError ? error.message : String(error), code: error instanceof ApiError ? error.code : 'error', orderId: v.orderId });
    },
    onSettled: (_d: unknown, _e: unknown, v: OrderChange) => afterChange(queryClient, v.bakeDayId),
  });
  queryClient.setMutationDefaults(counterMutationKeys.walkUp, {
    ...shared,
    mutationFn: (v: WalkUpChange) =>
      api.post<WalkUpSale>(
        `/api/bake-days/${encodeURIComponent(v.bakeDayId)}/walk-ups`,
        { items: v.items.map(({ menuItemId, quantity }) => ({ menuItemId, quantity })), method: v.method, amountCents: v.amountCents },
        headers(v.key),
      ),
    onError: (error: unknown, v: WalkUpChange) => {
      const what = `Walk-up sale: ${v.items.map((i) => `${i.quantity} ${i.name}`).join(', ')} (${v.method}, ${formatCents(v.amountCents, queryClient.getQueryData(shopQuery().queryKey)?.currency)})`;
      addConflict({ what, reason: error instanceof ApiError ? error.message : String(error), code: error instanceof ApiError ? error.code : 'error' });
    },
    onSettled: (_d: unknown, _e: unknown, v: WalkUpChange) => afterChange(queryClient, v.bakeDayId),
  });
  queryClient.setMutationDefaults(counterMutationKeys.restNoShow, {
    ...shared,
    mutationFn: (v: RestNoShowChange) => api.post<MarkRestNoShowResult>(`/api/bake-days/${encodeURIComponent(v.bakeDayId)}/no-shows`, {}, headers(v.key)),
    onError: (error: unknown) => {
      addConflict({ what: 'Mark the rest as no-show', reason: error instanceof ApiError ? error.message : String(error), code: error instanceof ApiError ? error.code : 'error' });
    },
    onSettled: (_d: unknown, _e: unknown, v: RestNoShowChange) => afterChange(queryClient, v.bakeDayId),
  });
}

/**
 * After a reload, the changes kept on the phone are back in the cache as
 * "pending": send them again, in the order they were made (one scope).
 */
export function sendKeptChanges(queryClient: QueryClient) {
  const kept = queryClient
    .getMutationCache()
    .findAll({ mutationKey: counterMutationKeys.all, status: 'pending' })
    .sort((a, b) => a.state.submittedAt - b.state.submittedAt);
  for (const m of kept) void m.continue().catch(() => undefined);
}

const newKey = () => crypto.randomUUID();

export function useOrderChange() {
  const queryClient = useQueryClient();
  const mutation = useMutation<PickupRow, unknown, OrderChange>({ mutationKey: counterMutationKeys.order });
  return {
    ...mutation,
    /** Makes a change; an undo of a hand-over that has not left the phone yet just takes it back. */
    change(v: Omit<OrderChange, 'key' | 'at'>) {
      if (v.action === 'uncollect') {
        const waiting = queryClient
          .getMutationCache()
          .findAll({ mutationKey: counterMutationKeys.order, predicate: (m) => m.state.isPaused && isOrderChange(m, v.orderId, 'collect') });
        if (waiting.length) {
          for (const m of waiting) queryClient.getMutationCache().remove(m);
          if (onlineManager.isOnline()) void queryClient.resumePausedMutations();
          return;
        }
      }
      mutation.mutate({ ...v, key: newKey(), at: new Date().toISOString() });
    },
  };
}

function isOrderChange(m: Mutation<any, any, any, any>, orderId: string, action: CounterActionName): boolean {
  const v = m.state.variables as OrderChange | undefined;
  return v?.orderId === orderId && v.action === action;
}

export function useWalkUpSale() {
  const mutation = useMutation<WalkUpSale, unknown, WalkUpChange>({ mutationKey: counterMutationKeys.walkUp });
  return {
    ...mutation,
    sell: (v: Omit<WalkUpChange, 'key' | 'at'>, callbacks?: { onSuccess?: () => void; onError?: () => void }) =>
      mutation.mutate({ ...v, key: newKey(), at: new Date().toISOString() }, callbacks),
  };
}

export function useRestNoShow() {
  const mutation = useMutation<MarkRestNoShowResult, unknown, RestNoShowChange>({ mutationKey: counterMutationKeys.restNoShow });
  return { ...mutation, markRest: (v: Omit<RestNoShowChange, 'key' | 'at'>) => mutation.mutate({ ...v, key: newKey(), at: new Date().toISOString() }) };
}

/** Every counter change still waiting to reach the server, oldest first. */
export function useWaitingChanges() {
  return useMutationState({
    filters: { mutationKey: counterMutationKeys.all, status: 'pending' },
    select: (m) => ({ key: m.options.mutationKey?.[1] as string, variables: m.state.variables as OrderChange | WalkUpChange | RestNoShowChange, submittedAt: m.state.submittedAt }),
  });
}
