/** The address that starts sign-in and comes back to `returnTo` (a path on this site). */
// @ts-nocheck

export function signInHref(returnTo: string): string {
  return `/api/auth/sign-in?returnTo=${encodeURIComponent(returnTo)}`;
}
