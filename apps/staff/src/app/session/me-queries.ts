import { queryOptions } from '@tanstack/react-query';
import type { Me } from '@fryline/schemas';
import { fetchCurrentUser } from '@fryline/ui/api-client';
import { queryRoots } from '../../lib/query-keys';

export const meQueries = {
  /** Who is signed in (null: nobody). Roles can change, so this is asked again on focus. */
  current: () =>
    queryOptions({ queryKey: [...queryRoots.me], queryFn: () => fetchCurrentUser<Me>(), staleTime: 60_000 }),
};
