import { queryOptions, useQuery } from '@tanstack/react-query';
import { api as contract, type ResponseOf } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from './query-keys';

type ShopInfo = ResponseOf<typeof contract.getShop>;

export const shopQueries = {
  /** The business this storefront belongs to (its name and logo, from the shop settings). */
  info: () =>
    queryOptions({ queryKey: [...queryRoots.shop] as const, queryFn: () => api.get<ShopInfo>(contract.getShop.path), staleTime: 10 * 60_000 }),
};

/** The business's name, or null while it is still loading (or could not be loaded). */
export function useShop(): ShopInfo | null {
  return useQuery(shopQueries.info()).data ?? null;
}
