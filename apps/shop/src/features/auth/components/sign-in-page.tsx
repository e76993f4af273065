import { useQuery } from '@tanstack/react-query';
import { Link, useSearchParams } from 'react-router-dom';
import { meQueries } from '../api/me-queries';
import { safeReturnTo, signInUrl } from '../../../lib/sign-in';
import { PageTitle } from '../../../components/page-title';

const explanations: Record<string, { title: string; text: string }> = {
  access_denied: {
    title: 'You did not finish signing in',
    text: 'Google sign-in was cancelled, so you are not signed in. You can still look around; you need to sign in to pay for a box or see your orders.',
  },
  state: {
    title: 'Signing in took too long',
    text: 'The sign-in page was open for a long time or was started in another tab, so we stopped it to keep your account safe. Nothing was changed. Please try once more.',
  },
  conflict: {
    title: 'That account is already in use',
    text: 'Your e-mail address is already linked to another Google sign-in here. Please sign in with the Google account you used before.',
  },
  failed: {
    title: 'Signing in did not work',
    text: 'Something went wrong between Google and us, so you are not signed in. Please try again in a moment.',
  },
};

const unknownProblem = {
  title: 'Signing in did not work',
  text: 'You are not signed in. Please try again.',
};

export function SignInPage() {
  const [params] = useSearchParams();
  const code = params.get('error');
  const returnTo = safeReturnTo(params.get('returnTo'));
  const me = useQuery(meQueries.current());
  const problem = code ? (explanations[code] ?? unknownProblem) : null;

  return (
    <section className="mx-auto max-w-lg" aria-labelledby="signin-heading">
      <PageTitle>Sign in</PageTitle>
      <h1 id="signin-heading" tabIndex={-1} className="text-3xl">
        {problem ? problem.title : 'Sign in'}
      </h1>
      {problem ? (
        <div role="alert" className="notice notice-warn mt-4">
          <p>{problem.text}</p>
        </div>
      ) : me.data ? (
        <p className="mt-4">You are signed in as {me.data.name}.</p>
      ) : (
        <p className="mt-4">
          We use your Google account to sign you in, so there is no password to remember. We only keep your name and
          e-mail address, to send your pickup code and reminders.
        </p>
      )}
      <div className="mt-6 flex flex-wrap gap-3">
        {(problem || !me.data) && (
          <a className="btn btn-primary" href={signInUrl(returnTo)}>
            {problem ? 'Try again' : 'Sign in with Google'}
          </a>
        )}
        <Link className="btn btn-quiet" to="/">
          See the bake days
        </Link>
      </div>
    </section>
  );
}
