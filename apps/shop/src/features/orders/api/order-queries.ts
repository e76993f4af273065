import { queryOptions } from '@tanstack/react-query';
import type { OrderDetail } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

/** One order as its owner sees it: once paid, with the pickup QR code and a calendar file. */
export type OrderDetailView = OrderDetail;

export const orderQueries = {
  list: () =>
    queryOptions({
      queryKey: [...queryRoots.orders, 'list'] as const,
      queryFn: () => api.get<OrderDetail[]>('/api/orders'),
    }),
  detail: (id: string) =>
    queryOptions({
      queryKey: [...queryRoots.orders, 'detail', id] as const,
      queryFn: () => api.get<OrderDetailView>(`/api/orders/${encodeURIComponent(id)}`),
    }),
};
