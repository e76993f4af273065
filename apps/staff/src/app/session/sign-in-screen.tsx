import { signInUrl } from '@fryline/ui/sign-in';

/** For someone not signed in: one way in, with Google, coming back to the staff app. */
export function SignInScreen() {
  return (
    <main className="flex min-h-dvh items-center justify-center px-4">
      <title>Sign in · Fryline staff</title>
      <div className="card flex w-full max-w-sm flex-col items-center gap-4 text-center">
        <span className="brand-mark size-12" aria-hidden="true" />
        <h1 className="text-2xl">Fryline staff</h1>
        <p>Sign in with the Google account the owner added to the team.</p>
        <a className="btn btn-primary w-full" href={signInUrl('/staff/')}>
          Sign in with Google
        </a>
        <a className="text-sm font-semibold text-plum-700 underline" href="/">
          Go to the shop instead
        </a>
      </div>
    </main>
  );
}
