import { useMutation } from '@tanstack/react-query';
import { api } from '@fryline/ui/api-client';

/** Ends the session; the caller then leaves for the shop's front page. */
export function useSignOut() {
  return useMutation({ mutationFn: () => api.post<void>('/auth/logout') });
}
