import { queryOptions } from '@tanstack/react-query';
import type { StaffMemberView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';

/** First element of every staff-list query key. */
export const staffRoot = ['staff-members'] as const;

export const staffQueries = {
  /** Everyone with a staff role, owners first (`GET /api/staff/members`). */
  all: () =>
    queryOptions({
      queryKey: [...staffRoot, 'all'] as const,
      queryFn: () => api.get<StaffMemberView[]>('/api/staff/members'),
    }),
};
