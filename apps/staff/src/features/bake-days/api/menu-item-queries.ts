import { queryOptions } from '@tanstack/react-query';
import type { MenuItemAdminView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';

export const menuItemQueries = {
  /** Every menu item, retired ones included, in menu order (`GET /api/staff/menu-items`). */
  all: () =>
    queryOptions({
      queryKey: ['menu-items', 'all'] as const,
      queryFn: () => api.get<MenuItemAdminView[]>('/api/staff/menu-items'),
      staleTime: 60_000,
    }),
};
