import { useMutation } from '@tanstack/react-query';
import { api } from '@fryline/ui/api-client';

/** E-mails the invitation again (`POST /api/staff/members/:id/invitation`), for someone who has not signed in yet. */
export function useResendInvitation() {
  return useMutation({
    mutationFn: (id: string) => api.post<{ queued: boolean }>(`/api/staff/members/${encodeURIComponent(id)}/invitation`),
  });
}
