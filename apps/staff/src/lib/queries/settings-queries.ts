import { queryOptions } from '@tanstack/react-query';
import type { Capacity } from '@fryline/production';
import type { ProductionSettingsView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { productionRoot } from './production-queries';

export const settingsQueries = {
  current: () =>
    queryOptions({
      queryKey: [...productionRoot, 'settings'] as const,
      queryFn: () => api.get<ProductionSettingsView>('/api/production/settings'),
      staleTime: 60_000,
    }),
  /** What the equipment can make in a bake day, and which piece of kit limits it. */
  capacity: () =>
    queryOptions({
      queryKey: [...productionRoot, 'capacity'] as const,
      queryFn: () => api.get<Capacity>('/api/production/capacity'),
    }),
};
