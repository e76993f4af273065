import { useEffect, type ReactNode } from 'react';
import { useQuery } from '@tanstack/react-query';
import type { Me } from '@fryline/schemas';
import { meQueries } from './session/me-queries';
import { SignInScreen } from './session/sign-in-screen';
import { StaffMemberProvider, type StaffMember } from './session/staff-member';
import { ErrorState, LoadingState } from '@fryline/ui';

function isStaff(me: Me): me is StaffMember {
  return me.role !== 'customer';
}

/**
 * Nothing of the staff app renders until the server says who this is:
 * nobody → the sign-in screen; a customer → straight back to the shop;
 * staff → the app, for their role.
 */
export function StaffGate({ children }: { children: ReactNode }) {
  const me = useQuery(meQueries.current());
  const customer = me.data?.role === 'customer';

  useEffect(() => {
    if (customer) window.location.assign('/');
  }, [customer]);

  if (me.isPending) {
    return (
      <main className="flex min-h-dvh items-center justify-center">
        <LoadingState label="Checking who is signed in…" />
      </main>
    );
  }
  // a failed refresh with an answer already known (kept on the phone while offline) keeps the app open
  if (me.isError && me.data === undefined) {
    return (
      <main className="mx-auto flex min-h-dvh max-w-md items-center px-4">
        <ErrorState error={me.error} title="Fryline could not be reached" onRetry={() => void me.refetch()} />
      </main>
    );
  }
  if (me.data === null || me.data === undefined) return <SignInScreen />;
  if (!isStaff(me.data)) return <p role="status">Taking you to the shop…</p>;
  return <StaffMemberProvider member={me.data}>{children}</StaffMemberProvider>;
}
