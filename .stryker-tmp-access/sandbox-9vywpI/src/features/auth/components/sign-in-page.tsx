// @ts-nocheck
import { useSearchParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { signInHref, useSession } from '../api/get-session';

const problems: Record<string, string> = {
  state_mismatch: 'This sign-in was started in another tab or browser. Start again from here.',
  no_sign_in_started: 'This browser has no sign-in in progress (it may have taken longer than ten minutes). Start again.',
  missing_verifier: 'This sign-in has expired or was already completed. Start again.',
  sign_in_expired: 'This sign-in took too long. Start again.',
  code_rejected: "The sign-in provider's answer could not be verified. Start again; if it keeps happening, tell your admin.",
  provider_refused: 'Sign-in was cancelled at the provider.',
  provider_error: 'The sign-in provider reported an error. Try again in a moment.',
  incomplete_callback: 'The sign-in provider sent back an incomplete answer. Start again.',
  email_taken: 'Your e-mail address already belongs to another sign-in account here. Ask an admin to sort it out.',
};

export function SignInPage() {
  const [params] = useSearchParams();
  const session = useSession();
  const problem = params.get('problem');
  const returnTo = params.get('returnTo') ?? '/';
  return (
    <div className="mx-auto max-w-md space-y-4 py-8">
      {problem && (
        <Notice tone="bad" title="Sign-in did not complete">
          {problems[problem] ?? 'Sign-in did not complete. Start again.'}
        </Notice>
      )}
      <Panel title="Sign in to Tramontane">
        {session.data?.signedIn ? (
          <p className="text-sm text-ink-soft">You are signed in as {session.data.user.name}.</p>
        ) : session.data && !session.data.signInAvailable ? (
          <Notice tone="warn" title="Sign-in is not set up on this server">
            An admin needs to set the OIDC settings described in the README.
          </Notice>
        ) : (
          <div className="space-y-3 text-sm">
            <p className="text-ink-soft">
              Tramontane signs you in through your organisation's identity provider. Your projects, roles and settings follow you from there.
            </p>
            <a href={signInHref(returnTo)} className="inline-block rounded bg-harbour px-4 py-2 text-paper hover:bg-harbour-soft">
              Continue to sign-in
            </a>
          </div>
        )}
      </Panel>
    </div>
  );
}
