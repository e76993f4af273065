import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ProductionSettingsInput, ProductionSettingsView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { productionRoot } from '../../../lib/queries/production-queries';

/** Saves the kitchen's settings (owner only); capacity and every sheet are worked out again. */
export function useSaveSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (settings: ProductionSettingsInput) => api.put<ProductionSettingsView>('/api/production/settings', settings),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: productionRoot }),
  });
}
