import { useMutation } from '@tanstack/react-query';
import { api } from '@fryline/ui/api-client';

/** Asks for news of new bake days; the answer is the same whatever the address's state (`POST /api/announcements/subscribe`). */
export function useSubscribe() {
  return useMutation({ mutationFn: (email: string) => api.post<{ message: string }>('/api/announcements/subscribe', { email }) });
}

/** The link in the confirmation e-mail (`POST /api/announcements/confirm`). */
export function useConfirmSubscription() {
  return useMutation({ mutationFn: (token: string) => api.post<{ confirmed: true; email: string }>('/api/announcements/confirm', { token }) });
}

/** The same address the e-mails' one-click unsubscribe posts to; the token is the authority, no sign-in needed. */
export function useUnsubscribe() {
  return useMutation({
    mutationFn: (token: string) => api.post<{ unsubscribed: true }>(`/api/announcements/unsubscribe?token=${encodeURIComponent(token)}`, {}),
  });
}
