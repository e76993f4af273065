import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { shopRulesApi as contract, type OrderLimit } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';

const orderLimitKey = ['shop-settings', 'order-limit'] as const;

export const orderLimitQuery = () => queryOptions({ queryKey: orderLimitKey, queryFn: () => api.get<OrderLimit>(contract.getOrderLimit.path) });

/** Saves the limit on pieces per customer per bake day (`PUT /api/staff/order-limit`). */
export function useSaveOrderLimit() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: OrderLimit) => api.put<OrderLimit>(contract.setOrderLimit.path, body),
    onSuccess: (saved) => queryClient.setQueryData(orderLimitKey, saved),
  });
}
