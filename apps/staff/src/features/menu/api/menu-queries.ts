import { queryOptions } from '@tanstack/react-query';
import type { MenuItemAdminView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';

/** First element of every menu query key (the bake-day form reads the same list under it). */
export const menuRoot = ['menu-items'] as const;

export const menuQueries = {
  /** Every item, archived ones last (`GET /api/staff/menu-items`). */
  all: () =>
    queryOptions({
      queryKey: [...menuRoot, 'all'] as const,
      queryFn: () => api.get<MenuItemAdminView[]>('/api/staff/menu-items'),
    }),
  detail: (id: string) =>
    queryOptions({
      queryKey: [...menuRoot, 'detail', id] as const,
      queryFn: () => api.get<MenuItemAdminView>(`/api/staff/menu-items/${encodeURIComponent(id)}`),
    }),
};
