import { queryOptions } from '@tanstack/react-query';
import type { BakeDayView, StaffOrderView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

const detailKey = (bakeDayId: string) => [...queryRoots.bakeDays, 'detail', bakeDayId] as const;

export const bakeDayOrdersQueries = {
  /** One bake day, past ones included: date, place, time zone, windows and capacity. */
  day: (bakeDayId: string) =>
    queryOptions({
      queryKey: detailKey(bakeDayId),
      queryFn: () => api.get<BakeDayView>(`/api/bake-days/${encodeURIComponent(bakeDayId)}`),
    }),
  /** Every order of the bake day, by pickup window then name; asked again every 30 s as orders come in. */
  orders: (bakeDayId: string) =>
    queryOptions({
      queryKey: [...detailKey(bakeDayId), 'orders'] as const,
      queryFn: () => api.get<StaffOrderView[]>(`/api/staff/bake-days/${encodeURIComponent(bakeDayId)}/orders`),
      staleTime: 0,
      refetchInterval: 30_000,
    }),
};
