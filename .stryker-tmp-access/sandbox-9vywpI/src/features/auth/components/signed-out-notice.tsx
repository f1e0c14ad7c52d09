// @ts-nocheck
import { useLocation } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { signInHref } from '../api/get-session';

/** What a page shows a signed-out visitor: why, and the way in that comes back here. */
export function SignedOutNotice({ what }: { what: string }) {
  const location = useLocation();
  return (
    <div className="mx-auto max-w-md py-8">
      <Notice title="You are not signed in">
        Sign in to see {what}.{' '}
        <a className="text-harbour-soft underline" href={signInHref(`${location.pathname}${location.search}`)}>
          Sign in
        </a>
      </Notice>
    </div>
  );
}
