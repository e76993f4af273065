import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Me } from '@fryline/schemas';
import { fetchCurrentUser } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

export const meQueries = {
  /** The signed-in customer, or null when nobody is signed in. */
  current: () =>
    queryOptions({ queryKey: [...queryRoots.me], queryFn: () => fetchCurrentUser<Me>(), staleTime: 5 * 60_000 }),
};

/** true or false once known; undefined while we are still asking. */
export function useSignedIn(): boolean | undefined {
  const me = useQuery(meQueries.current());
  return me.isSuccess ? me.data !== null : undefined;
}
