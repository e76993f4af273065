import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { StaffMemberView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import type { RoleChoice } from '../model/roles';
import { staffRoot } from './staff-queries';

export interface RoleChange {
  id: string;
  role: RoleChoice;
}

/**
 * Changes someone's role (`PATCH /api/staff/members/:id`). The answer is the
 * member as they are now, or undefined when their staff access was removed
 * (role back to customer). 409 `own_role` and `last_owner` keep an owner in charge.
 */
export function useChangeRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, role }: RoleChange) =>
      api.patch<StaffMemberView | undefined>(`/api/staff/members/${encodeURIComponent(id)}`, { role }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: staffRoot }),
  });
}
