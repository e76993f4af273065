/** A same-origin path that is safe to return to after sign-in, or the fallback. */
export function safeReturnTo(value: string | null | undefined, fallback = '/'): string {
  if (!value || !value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) return fallback;
  return value;
}

/** Where the "Sign in with Google" link points. */
export function signInUrl(returnTo: string): string {
  return `/auth/google?returnTo=${encodeURIComponent(safeReturnTo(returnTo))}`;
}
