import { signInUrl } from '@fryline/ui/sign-in';

export { safeReturnTo, signInUrl } from '@fryline/ui/sign-in';

/** The path and query of the page we are on, to come back to after sign-in. */
export function currentPath(): string {
  return `${window.location.pathname}${window.location.search}`;
}

/** Leaves for Google sign-in, coming back to `returnTo` (this page by default). */
export function goToSignIn(returnTo = currentPath()): void {
  window.location.assign(signInUrl(returnTo));
}
