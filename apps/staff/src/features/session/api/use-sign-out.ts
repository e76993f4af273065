import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { clearOfflineCache } from '../../../lib/offline-cache';

/** Ends the session and forgets what the device kept; the caller then leaves for the shop's front page. */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<void>('/auth/logout'),
    onSuccess: async () => {
      queryClient.clear();
      await clearOfflineCache();
    },
  });
}
