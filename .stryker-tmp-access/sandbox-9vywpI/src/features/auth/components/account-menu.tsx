// @ts-nocheck
import { Link, useLocation } from 'react-router-dom';
import { signInHref, useSession } from '../api/get-session';
import { useSignOut } from '../api/sign-out';

/** The header's right end: who is signed in (and whether as admin), or a way to sign in. */
export function AccountMenu() {
  const session = useSession();
  const location = useLocation();
  const signOut = useSignOut();
  if (session.isPending) return <span role="progressbar" className="h-7 w-24 animate-pulse rounded bg-harbour-soft" aria-label="Checking sign-in" />;
  if (!session.data?.signedIn) {
    const here = location.pathname.startsWith('/sign-in') ? '/' : `${location.pathname}${location.search}`;
    return (
      <a href={signInHref(here)} className="rounded bg-paper px-3 py-1.5 text-sm font-medium text-harbour hover:bg-mist" data-testid="sign-in">
        Sign in
      </a>
    );
  }
  const { user } = session.data;
  return (
    <div className="flex items-center gap-3 text-sm" data-testid="account">
      <Link to="/settings" className="flex items-center gap-2 rounded px-2 py-1 text-paper hover:bg-harbour-soft" title="Your settings">
        <span>{user.name}</span>
        {user.isAdmin && <span className="rounded-sm border border-mist/40 px-1.5 text-[11px] uppercase tracking-wide text-mist">admin</span>}
      </Link>
      <button
        type="button"
        onClick={() => signOut.mutate()}
        disabled={signOut.isPending}
        className="rounded border border-mist/40 px-3 py-1 text-mist hover:bg-harbour-soft disabled:opacity-60"
      >
        Sign out
      </button>
    </div>
  );
}

/** Extra header links that only an organisation admin sees. */
export function useAdminNavItems(): { to: string; label: string; end?: boolean }[] {
  const session = useSession();
  if (!session.data?.signedIn || !session.data.user.isAdmin) return [];
  return [
    { to: '/audit', label: 'Audit trail' },
    { to: '/admin/people', label: 'People' },
    ...(session.data.mailbox ? [{ to: '/mailbox', label: 'Mailbox' }] : []),
  ];
}
