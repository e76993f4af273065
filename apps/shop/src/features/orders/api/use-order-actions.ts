import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { checkoutLinkSchema, OrderDetail } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

function orderPath(id: string, action: string): string {
  return `/api/orders/${encodeURIComponent(id)}/${action}`;
}

/** Orders and bake-day capacity both change when an order is cancelled or moved. */
function useInvalidateAfterChange() {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: queryRoots.orders }),
      queryClient.invalidateQueries({ queryKey: queryRoots.bakeDays }),
    ]);
}

export function useCancelOrder() {
  const invalidate = useInvalidateAfterChange();
  return useMutation({
    mutationFn: (id: string) => api.post<OrderDetail>(orderPath(id, 'cancel')),
    onSettled: invalidate,
  });
}

export function useMoveOrder() {
  const invalidate = useInvalidateAfterChange();
  return useMutation({
    mutationFn: ({ id, pickupWindowId }: { id: string; pickupWindowId: string }) =>
      api.post<OrderDetail>(orderPath(id, 'move'), { pickupWindowId }),
    onSettled: invalidate,
  });
}

/** A new checkout page for an order still on hold. */
export function useResumeCheckout() {
  return useMutation({
    mutationFn: (id: string) => api.post<z.infer<typeof checkoutLinkSchema>>(orderPath(id, 'checkout')),
  });
}
