import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { ShopSettingsInput, ShopSettingsView } from '@fryline/schemas';
import { shopQueryRoot } from '@fryline/ui';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

export const shopSettingsRoot = ['shop-settings'] as const;

export const shopSettingsQueries = {
  current: () =>
    queryOptions({
      queryKey: [...shopSettingsRoot, 'current'] as const,
      queryFn: () => api.get<ShopSettingsView>('/api/staff/shop-settings'),
    }),
};

/** Saves the whole form (`PUT /api/staff/shop-settings`); bake days show the tax, and every page the name and currency, so they are fetched again. */
export function useSaveShopSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ShopSettingsInput) => api.put<ShopSettingsView>('/api/staff/shop-settings', body),
    onSuccess: (saved) => {
      queryClient.setQueryData(shopSettingsQueries.current().queryKey, saved);
      // the shop's name and currency show on every page
      return Promise.all([queryClient.invalidateQueries({ queryKey: queryRoots.bakeDays }), queryClient.invalidateQueries({ queryKey: shopQueryRoot })]);
    },
  });
}
