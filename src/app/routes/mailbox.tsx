import { MailboxPage } from '@/features/auth/components/mailbox-page';

/** /mailbox — the local mailbox. */
export function MailboxRoute() {
  return <MailboxPage />;
}
