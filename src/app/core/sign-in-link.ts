/**
 * Where to come back to after signing in. Only a path on this site is accepted, so a crafted
 * link cannot send a freshly signed-in person to another site.
 */
export function safeReturnPath(candidate: string | null | undefined): string {
  if (!candidate || !candidate.startsWith('/') || candidate.startsWith('//')) return '/';
  if (candidate.includes('\\')) return '/';
  return candidate;
}

/** The server-side sign-in entry point, which runs the OpenID Connect redirect. */
export function signInHref(returnTo: string | null | undefined): string {
  return `/auth/sign-in?returnTo=${encodeURIComponent(safeReturnPath(returnTo))}`;
}
