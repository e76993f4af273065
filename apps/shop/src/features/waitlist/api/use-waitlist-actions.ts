import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { JoinWaitlistInput } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

export type { JoinWaitlistInput } from '@fryline/schemas';

export function useJoinWaitlist(bakeDayId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: JoinWaitlistInput) =>
      api.post<{ id: string; position: number }>(`/api/bake-days/${encodeURIComponent(bakeDayId)}/waitlist`, input),
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
