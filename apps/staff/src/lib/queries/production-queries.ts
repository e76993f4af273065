import { queryOptions } from '@tanstack/react-query';
import type { FormulaInput, PlanMeta } from '@fryline/schemas';
import type { BakePlan } from '@fryline/production';
import { api } from '@fryline/ui/api-client';

/** First element of every production query key: plans, formulas, settings, capacity. */
export const productionRoot = ['production'] as const;

export type { PlanMeta };

/** `GET /api/bake-days/:id/plan`: the sheet, and what it was worked out from. */
export interface PlanResponse {
  plan: BakePlan;
  meta: PlanMeta;
}

export interface FormulaVersionView {
  id: string;
  version: number;
  note: string;
  createdAt: string;
  formula: FormulaInput;
}

export interface FormulaList {
  /** The newest version (id null and version 0: the built-in starting formula, never saved). */
  current: { id: string | null; version: number; formula: FormulaInput; note: string; createdAt: string | null };
  /** Newest first. */
  versions: FormulaVersionView[];
}

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
