import { queryOptions } from '@tanstack/react-query';
import type { PublicShopView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';

/** The shop's own facts every page may show: its name and refund policy (`GET /api/shop`). */
export const shopQueries = {
  info: () =>
    queryOptions({
      queryKey: ['shop', 'info'] as const,
      queryFn: () => api.get<PublicShopView>('/api/shop'),
      staleTime: 5 * 60_000,
    }),
};
