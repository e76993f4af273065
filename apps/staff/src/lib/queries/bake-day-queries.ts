import { queryOptions } from '@tanstack/react-query';
import type { BakeDayView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../query-keys';

export const bakeDayQueries = {
  /** Upcoming bake days, soonest first; staff want fresh capacity figures. */
  upcoming: () =>
    queryOptions({
      queryKey: [...queryRoots.bakeDays, 'upcoming'] as const,
      queryFn: () => api.get<BakeDayView[]>('/api/bake-days'),
      staleTime: 10_000,
      refetchInterval: 60_000,
    }),
  /** Bake days saved as drafts, not yet shown to customers (owner). */
  drafts: () =>
    queryOptions({
      queryKey: [...queryRoots.bakeDays, 'drafts'] as const,
      queryFn: () => api.get<BakeDayView[]>('/api/staff/bake-days/drafts'),
      staleTime: 10_000,
    }),
  /** Bake days of the last weeks, newest first: for late refunds and no-shows. */
  past: () =>
    queryOptions({
      queryKey: [...queryRoots.bakeDays, 'past'] as const,
      queryFn: () => api.get<BakeDayView[]>('/api/staff/bake-days/past'),
      staleTime: 60_000,
    }),
};

/** The bake day staff are working towards: the first one not yet done. */
export function nextBakeDay(days: readonly BakeDayView[]): BakeDayView | undefined {
  return days.find((day) => day.status !== 'done');
}
