import { queryOptions } from '@tanstack/react-query';
import type { FormulaList, PlanResponse } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';

/** First element of every production query key: plans, formulas, settings, capacity. */
export const productionRoot = ['production'] as const;

export const productionQueries = {
  /** A bake day's production sheet; asked again every 30 s so it follows the orders coming in. */
  plan: (bakeDayId: string) =>
    queryOptions({
      queryKey: [...productionRoot, 'plan', bakeDayId] as const,
      queryFn: () => api.get<PlanResponse>(`/api/bake-days/${encodeURIComponent(bakeDayId)}/plan`),
      staleTime: 0,
      refetchInterval: 30_000,
    }),
  /** Every saved formula version, newest first. */
  formulas: () =>
    queryOptions({
      queryKey: [...productionRoot, 'formulas'] as const,
      queryFn: () => api.get<FormulaList>('/api/production/formulas'),
    }),
};
