import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { BakeDayEditResult, BakeDayEditView, EditBakeDayInput, JobView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

const dayKey = (id: string) => [...queryRoots.bakeDays, 'edit', id] as const;

export const bakeDayEditQueries = {
  /** One bake day as the owner changes it (`GET /api/staff/bake-days/:id`). */
  detail: (id: string) =>
    queryOptions({
      queryKey: dayKey(id),
      queryFn: () => api.get<BakeDayEditView>(`/api/staff/bake-days/${encodeURIComponent(id)}`),
      staleTime: 5_000,
    }),
  /** A long job's progress (`GET /api/staff/jobs/:id`), asked again every second until it is over. */
  job: (id: string) =>
    queryOptions({
      queryKey: ['jobs', id] as const,
      queryFn: () => api.get<JobView>(`/api/staff/jobs/${encodeURIComponent(id)}`),
      refetchInterval: (query) => (query.state.data && ['done', 'failed'].includes(query.state.data.state) ? false : 1_000),
    }),
};

/** After a change: this day's view from the answer, and every bake-day list fetched again. */
function useSettle(id: string) {
  const queryClient = useQueryClient();
  return (result: BakeDayEditResult) => {
    queryClient.setQueryData(dayKey(id), result.day);
    return queryClient.invalidateQueries({ queryKey: queryRoots.bakeDays });
  };
}

/** `PATCH /api/staff/bake-days/:id` with only what changes. */
export function useEditBakeDay(id: string) {
  const settle = useSettle(id);
  return useMutation({
    mutationFn: (input: EditBakeDayInput) => api.patch<BakeDayEditResult>(`/api/staff/bake-days/${encodeURIComponent(id)}`, input),
    onSuccess: settle,
  });
}

export type BakeDayAction = 'open-now' | 'close-now' | 'mark-done';

/** Open orders now, close them now, or mark the day done. */
export function useBakeDayAction(id: string) {
  const settle = useSettle(id);
  return useMutation({
    mutationFn: (action: BakeDayAction) => api.post<BakeDayEditResult>(`/api/staff/bake-days/${encodeURIComponent(id)}/${action}`),
    onSuccess: settle,
  });
}

/** `POST /api/staff/bake-days/:id/call-off`: answered at once with the job that does the refunds and e-mails. */
export function useCallOff(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (reason: string) => api.post<JobView & { jobId: string }>(`/api/staff/bake-days/${encodeURIComponent(id)}/call-off`, { reason }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryRoots.bakeDays }),
  });
}
