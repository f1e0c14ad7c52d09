import { RequireSignIn } from '@/features/auth/components/require-sign-in';

/** The pages below it open only when signed in; signed out, a notice offers sign-in. */
export function SignedInRoute() {
  return <RequireSignIn />;
}
