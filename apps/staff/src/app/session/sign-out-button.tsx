import { useState } from 'react';
import { SignOutButton as SignOut } from '@fryline/ui';
import { errorMessage } from '@fryline/ui/api-client';

/** Sign out, with the reason beside the button when it did not work. */
export function SignOutButton() {
  const [problem, setProblem] = useState<string | null>(null);
  return (
    <span className="flex items-center gap-2">
      {problem && (
        <span role="alert" className="text-sm font-semibold text-brick-700">
          {problem}
        </span>
      )}
      <SignOut onError={(error) => setProblem(errorMessage(error))} />
    </span>
  );
}
