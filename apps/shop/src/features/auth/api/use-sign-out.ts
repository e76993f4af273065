import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@fryline/ui/api-client';

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<void>('/auth/logout'),
    onSuccess: () => queryClient.clear(),
  });
}
