import { useQuery } from '@tanstack/react-query';
import { meQueries } from '../api/me-queries';
import { SignOutButton } from '@fryline/ui';
import { signInUrl } from '../../../lib/sign-in';
import { useToast } from '../../../components/toast';
import { useLocation } from 'react-router-dom';

/** The header's right-hand side: who is signed in, with sign-in or sign-out. */
export function AccountMenu() {
  const me = useQuery(meQueries.current());
  const toast = useToast();
  const location = useLocation();

  if (me.isPending) return <span role="status" className="spinner" aria-label="Checking who is signed in" />;

  if (!me.data) {
    const returnTo = location.pathname === '/signin' ? '/' : `${location.pathname}${location.search}`;
    return (
      <a className="btn btn-accent btn-small" href={signInUrl(returnTo)}>
        Sign in
      </a>
    );
  }

  return (
    <div className="flex items-center gap-3">
      <span className="hidden max-w-[12rem] truncate font-semibold sm:inline" title={me.data.email}>
        {me.data.name}
      </span>
      <SignOutButton onError={() => toast('Signing out did not work. Please try again.', 'bad')}>
        <span className="sr-only"> ({me.data.name})</span>
      </SignOutButton>
    </div>
  );
}
