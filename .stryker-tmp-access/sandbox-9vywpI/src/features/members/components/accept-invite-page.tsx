// @ts-nocheck
import { Link, useLocation, useSearchParams } from 'react-router-dom';
import { signInHref } from '@/lib/sign-in';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { useAcceptInvite } from '../api/accept-invite';
import { useInvitePreview } from '../api/preview-invite';

/** Where an invitation link lands: what the invitation is and who sent it; signed out, the way to sign in; signed in, the button to take it. */
export function AcceptInvitePage() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const preview = useInvitePreview(token, token.length > 0);
  const accept = useAcceptInvite();
  const location = useLocation();
  if (!token)
    return (
      <Notice tone="bad" title="This link has no invitation in it">
        Open the link from the e-mail again, whole.
      </Notice>
    );
  if (preview.isPending) return <div role="progressbar" className="h-32 animate-pulse rounded bg-mist" aria-label="Loading invitation" />;
  if (preview.isError)
    return (
      <Notice tone="bad" title="This invitation cannot be used">
        {preview.error.message}
      </Notice>
    );
  const invite = preview.data;
  return (
    <div className="mx-auto max-w-lg py-6">
      <Panel title="Invitation">
        {accept.isSuccess ? (
          <div className="space-y-3 text-sm">
            <Notice title="You are in">
              You joined {invite.projectName} as {accept.data.role}.
            </Notice>
            <Link to="/" className="inline-block rounded bg-harbour px-4 py-2 text-paper hover:bg-harbour-soft">
              Go to your projects
            </Link>
          </div>
        ) : (
          <div className="space-y-3 text-sm">
            <p>
              {invite.invitedBy ?? 'A project owner'} invited <strong>{invite.email}</strong> to <strong>{invite.projectName}</strong> as{' '}
              <strong>{invite.role}</strong>.
            </p>
            <p className="num text-xs text-ink-faint">Valid until {invite.expiresAt.slice(0, 16).replace('T', ' ')} UTC, once.</p>
            {!invite.signedIn && (
              <div className="space-y-2" data-testid="invite-signed-out">
                <p>Sign in as {invite.email} to accept it; you come back here after signing in.</p>
                <a
                  href={signInHref(`${location.pathname}${location.search}`)}
                  className="inline-block rounded bg-harbour px-4 py-2 text-paper hover:bg-harbour-soft"
                >
                  Sign in to accept
                </a>
              </div>
            )}
            {invite.signedIn && !invite.forYou && (
              <Notice tone="warn" title="This invitation is for another address">
                Sign out and sign in as {invite.email} to accept it.
              </Notice>
            )}
            {accept.isError && (
              <Notice tone="bad" title="Not accepted">
                {accept.error.message}
              </Notice>
            )}
            {invite.signedIn && (
              <button
                type="button"
                disabled={!invite.forYou || accept.isPending}
                onClick={() => accept.mutate(token)}
                className="rounded bg-harbour px-4 py-2 text-paper hover:bg-harbour-soft disabled:opacity-50"
              >
                Accept and join
              </button>
            )}
          </div>
        )}
      </Panel>
    </div>
  );
}
