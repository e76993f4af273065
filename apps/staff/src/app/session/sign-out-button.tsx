import { useState } from 'react';
import { SignOutButton as SignOut } from '@fryline/ui';
import { errorMessage } from '@fryline/ui/api-client';
import { clearOfflineCache } from '../../lib/offline-cache';

/** Sign out, with the reason beside the button when it did not work; what the phone kept for a dead connection is forgotten. */
export function SignOutButton() {
  const [problem, setProblem] = useState<string | null>(null);
  return (
    <span className="flex items-center gap-2">
      {problem && (
        <span role="alert" className="text-sm font-semibold text-brick-700">
          {problem}
        </span>
      )}
      <SignOut onError={(error) => setProblem(errorMessage(error))} forget={clearOfflineCache} />
    </span>
  );
}
