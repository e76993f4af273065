import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@fryline/ui/api-client';
import type { PlanResponse } from '@fryline/schemas';
import { productionQueries } from '../../../lib/queries/production-queries';

/** Moves a bake day's sheet to another formula version; the answer is the new sheet. */
export function useSwitchFormula(bakeDayId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (formulaVersionId: string) =>
      api.post<PlanResponse>(`/api/bake-days/${encodeURIComponent(bakeDayId)}/formula`, { formulaVersionId }),
    onSuccess: (plan) => queryClient.setQueryData(productionQueries.plan(bakeDayId).queryKey, plan),
  });
}
