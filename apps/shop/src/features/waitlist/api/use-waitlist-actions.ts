import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { JoinedWaitlist, JoinWaitlistInput } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

export function useJoinWaitlist(bakeDayId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: JoinWaitlistInput) =>
      api.post<JoinedWaitlist>(`/api/bake-days/${encodeURIComponent(bakeDayId)}/waitlist`, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryRoots.waitlist }),
  });
}

export function useLeaveWaitlist() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (entryId: string) => api.delete(`/api/waitlist/${encodeURIComponent(entryId)}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryRoots.waitlist }),
  });
}
