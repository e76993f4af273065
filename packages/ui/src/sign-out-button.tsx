import type { ReactNode } from 'react';
import { useMutation } from '@tanstack/react-query';
import { api } from './api-client';

/**
 * Ends the session, then leaves for the shop's front page (a full page load,
 * so nothing cached for this person stays in memory; `forget` clears what an
 * app keeps on the device before that). `children` adds to the button's
 * name, e.g. a screen-reader-only "(Sam)".
 */
export function SignOutButton({ onError, forget, children }: { onError: (error: unknown) => void; forget?: () => Promise<void>; children?: ReactNode }) {
  const signOut = useMutation({
    mutationFn: async () => {
      await api.post<void>('/auth/logout');
      await forget?.();
    },
  });
  return (
    <button
      type="button"
      className="btn btn-quiet btn-small whitespace-nowrap"
      disabled={signOut.isPending}
      onClick={() => signOut.mutate(undefined, { onSuccess: () => window.location.assign('/'), onError })}
    >
      Sign out
      {children}
    </button>
  );
}
