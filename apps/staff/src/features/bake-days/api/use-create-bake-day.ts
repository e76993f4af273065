import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BakeDayView, CreateBakeDayInput } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

/**
 * Announces a bake day (`POST /api/staff/bake-days`). Capacity above what the
 * equipment makes is answered 409 `above_equipment` until the body says
 * `acceptAboveEquipment`.
 */
export function useCreateBakeDay() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateBakeDayInput) => api.post<BakeDayView>('/api/staff/bake-days', body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryRoots.bakeDays }),
  });
}
