import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { StaffMemberInput, StaffMemberView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { staffRoot } from './staff-queries';

/**
 * Gives an e-mail address a staff role (`POST /api/staff/members`): an
 * existing account keeps its identity and takes the role; a new address gets
 * it when that person first signs in with it.
 */
export function useAddStaff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: StaffMemberInput) => api.post<StaffMemberView>('/api/staff/members', body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: staffRoot }),
  });
}
