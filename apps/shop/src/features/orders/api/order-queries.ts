import { queryOptions } from '@tanstack/react-query';
import type { OrderDetail } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

export const orderQueries = {
  list: () =>
    queryOptions({
      queryKey: [...queryRoots.orders, 'list'] as const,
      queryFn: () => api.get<OrderDetail[]>('/api/orders'),
    }),
  detail: (id: string) =>
    queryOptions({
      queryKey: [...queryRoots.orders, 'detail', id] as const,
      queryFn: () => api.get<OrderDetail>(`/api/orders/${encodeURIComponent(id)}`),
    }),
};
