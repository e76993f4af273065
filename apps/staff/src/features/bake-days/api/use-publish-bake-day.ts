import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BakeDayView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

/** Shows a draft bake day to customers (`POST /api/staff/bake-days/:id/publish`). */
export function usePublishBakeDay() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.post<BakeDayView>(`/api/staff/bake-days/${encodeURIComponent(id)}/publish`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryRoots.bakeDays }),
  });
}
