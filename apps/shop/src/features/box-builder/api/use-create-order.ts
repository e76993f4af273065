import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreatedOrder, CreateOrderInput } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

/** An order request; `claimToken` orders within a waitlist offer. */
export type OrderRequest = CreateOrderInput & { claimToken?: string };

export function useCreateOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: OrderRequest) => api.post<CreatedOrder>('/api/orders', input),
    onSettled: () => {
      // Success takes capacity; a sold-out or closed answer means our figures were stale.
      void queryClient.invalidateQueries({ queryKey: queryRoots.bakeDays });
      void queryClient.invalidateQueries({ queryKey: queryRoots.orders });
    },
  });
}
