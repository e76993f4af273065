import { useState } from 'react';
import { errorMessage } from '@fryline/ui/api-client';
import { useSignOut } from './use-sign-out';

export function SignOutButton() {
  const signOut = useSignOut();
  const [problem, setProblem] = useState<string | null>(null);
  return (
    <span className="flex items-center gap-2">
      {problem && (
        <span role="alert" className="text-sm font-semibold text-brick-700">
          {problem}
        </span>
      )}
      <button
        type="button"
        className="btn btn-quiet btn-small"
        disabled={signOut.isPending}
        onClick={() =>
          signOut.mutate(undefined, {
            onSuccess: () => window.location.assign('/'),
            onError: (error) => setProblem(errorMessage(error)),
          })
        }
      >
        Sign out
      </button>
    </span>
  );
}
