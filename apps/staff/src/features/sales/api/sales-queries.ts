import { queryOptions } from '@tanstack/react-query';
import type { WeeklyReport } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';

export const salesQueries = {
  /** One week's sales with the week before (`GET /api/reports/weekly?start=`). */
  weekly: (monday: string) =>
    queryOptions({
      queryKey: ['reports', 'weekly', monday] as const,
      queryFn: () => api.get<WeeklyReport>(`/api/reports/weekly?start=${encodeURIComponent(monday)}`),
      staleTime: 30_000,
    }),
};

/** The CSV of the same week, downloaded with the session cookie. */
export const weeklyCsvUrl = (monday: string) => `/api/reports/weekly.csv?start=${encodeURIComponent(monday)}`;
