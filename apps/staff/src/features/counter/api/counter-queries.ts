import { queryOptions } from '@tanstack/react-query';
import type { BakeDayView, CounterSettings, EndOfDay, OrderByCode, PickupRow, Surplus } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';

// The counter's reads. Everything under the 'counter' root is kept on the
// phone (IndexedDB) so a reload with no signal still shows the last list.

const root = ['counter'] as const;
const day = (bakeDayId: string) => [...root, 'day', bakeDayId] as const;
const DAY_MS = 24 * 3600_000;

export const counterQueries = {
  root,
  /** Bake days to choose from: today's and the coming ones, and the last weeks' (for a late no-show). */
  days: () =>
    queryOptions({
      queryKey: [...root, 'days'] as const,
      queryFn: async () => {
        const [upcoming, past] = await Promise.all([api.get<BakeDayView[]>('/api/bake-days'), api.get<BakeDayView[]>('/api/staff/bake-days/past')]);
        return { upcoming, past };
      },
      staleTime: 60_000,
      gcTime: DAY_MS,
    }),
  /** The pickup list; asked again every few seconds while online, so another device's hand-overs show up. */
  pickups: (bakeDayId: string) =>
    queryOptions({
      queryKey: [...day(bakeDayId), 'pickups'] as const,
      queryFn: () => api.get<PickupRow[]>(`/api/bake-days/${encodeURIComponent(bakeDayId)}/pickups`),
      staleTime: 0,
      gcTime: DAY_MS,
      refetchInterval: 4_000,
    }),
  surplus: (bakeDayId: string) =>
    queryOptions({
      queryKey: [...day(bakeDayId), 'surplus'] as const,
      queryFn: () => api.get<Surplus>(`/api/bake-days/${encodeURIComponent(bakeDayId)}/surplus`),
      staleTime: 0,
      gcTime: DAY_MS,
      refetchInterval: 8_000,
    }),
  endOfDay: (bakeDayId: string) =>
    queryOptions({
      queryKey: [...day(bakeDayId), 'end-of-day'] as const,
      queryFn: () => api.get<EndOfDay>(`/api/bake-days/${encodeURIComponent(bakeDayId)}/end-of-day`),
      staleTime: 0,
      gcTime: DAY_MS,
    }),
  /** The owner's no-show grace and undo time. */
  settings: () =>
    queryOptions({
      queryKey: [...root, 'settings'] as const,
      queryFn: () => api.get<CounterSettings>('/api/counter/settings'),
      staleTime: 5 * 60_000,
      gcTime: DAY_MS,
    }),
  /** The order a scanned or typed code names (any bake day). */
  byCode: (code: string) =>
    queryOptions({
      queryKey: [...root, 'by-code', code] as const,
      queryFn: () => api.get<OrderByCode>(`/api/orders/by-code/${encodeURIComponent(code)}`),
      staleTime: 5_000,
      retry: false,
    }),
  dayKey: day,
};

/** Today's bake day in its own time zone, or else the next one. */
export function defaultBakeDay(upcoming: readonly BakeDayView[], now: Date): BakeDayView | undefined {
  const today = (d: BakeDayView) => new Intl.DateTimeFormat('en-CA', { timeZone: d.timeZone }).format(now) === d.date;
  return upcoming.find(today) ?? upcoming[0];
}
