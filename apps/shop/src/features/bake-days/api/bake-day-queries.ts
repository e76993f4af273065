import { queryOptions } from '@tanstack/react-query';
import type { BakeDayView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

export const bakeDayQueries = {
  list: () =>
    queryOptions({
      queryKey: [...queryRoots.bakeDays, 'list'] as const,
      queryFn: () => api.get<BakeDayView[]>('/api/bake-days'),
    }),
  detail: (id: string) =>
    queryOptions({
      queryKey: [...queryRoots.bakeDays, 'detail', id] as const,
      queryFn: () => api.get<BakeDayView>(`/api/bake-days/${encodeURIComponent(id)}`),
    }),
};
