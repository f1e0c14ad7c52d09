import { SignInPage } from '@/features/auth/components/sign-in-page';

/** /sign-in */
export function SignInRoute() {
  return <SignInPage />;
}
