import { queryOptions } from '@tanstack/react-query';
import type { WaitlistEntryView, WaitlistOfferView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

export const waitlistQueries = {
  mine: () =>
    queryOptions({
      queryKey: [...queryRoots.waitlist, 'mine'] as const,
      queryFn: () => api.get<WaitlistEntryView[]>('/api/waitlist'),
    }),
  claim: (token: string) =>
    queryOptions({
      queryKey: [...queryRoots.waitlist, 'claim', token] as const,
      queryFn: () => api.get<WaitlistOfferView>(`/api/waitlist/claims/${encodeURIComponent(token)}`),
    }),
};
