import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { saveFormulaSchema, FormulaVersionView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { productionRoot } from '../../../lib/queries/production-queries';

/** Saves the formula as a new version. Sheets already planned keep their own version. */
export function useSaveFormula() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.output<typeof saveFormulaSchema>) => api.post<FormulaVersionView>('/api/production/formulas', body),
    // The version list changes, and every sheet's "newer formula" notice with it.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: productionRoot }),
  });
}
