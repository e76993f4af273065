import { queryOptions } from '@tanstack/react-query';
import type { WaitlistEntryView, WaitlistOfferView as ClaimOfferView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

export type { WaitlistEntryView, WaitlistOfferView as ClaimOfferView } from '@fryline/schemas';

export const waitlistQueries = {
  mine: () =>
    queryOptions({
      queryKey: [...queryRoots.waitlist, 'mine'] as const,
      queryFn: () => api.get<WaitlistEntryView[]>('/api/waitlist'),
    }),
  claim: (token: string) =>
    queryOptions({
      queryKey: [...queryRoots.waitlist, 'claim', token] as const,
      queryFn: () => api.get<ClaimOfferView>(`/api/waitlist/claims/${encodeURIComponent(token)}`),
    }),
};
