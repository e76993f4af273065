import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { CapacityResult, capacityOverrideSchema } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

/**
 * Sets one bake day's capacity. Above what the equipment allows the server
 * answers 409 `above_equipment` until `acceptAboveEquipment` is sent; below
 * what is already sold, 409 `below_sold`.
 */
export function useSetCapacity(bakeDayId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.output<typeof capacityOverrideSchema>) =>
      api.post<CapacityResult>(`/api/bake-days/${encodeURIComponent(bakeDayId)}/capacity`, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryRoots.bakeDays }),
  });
}
