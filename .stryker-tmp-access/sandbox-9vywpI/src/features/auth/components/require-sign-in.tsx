// @ts-nocheck
import { Outlet } from 'react-router-dom';
import { useSession } from '../api/get-session';
import { SignedOutNotice } from './signed-out-notice';

/** A route group for signed-in people: a signed-out visitor is told so and offered the way back in. */
export function RequireSignIn({ what = 'this page' }: { what?: string }) {
  const session = useSession();
  if (session.isPending) return <div role="progressbar" className="h-24 animate-pulse rounded bg-mist" aria-label="Checking sign-in" />;
  if (!session.data?.signedIn) return <SignedOutNotice what={what} />;
  return <Outlet />;
}
