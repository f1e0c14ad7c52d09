import { EnvelopesPage } from '@/features/envelopes/components/envelopes-page';

/** /projects/:projectId/envelopes */
export function EnvelopesRoute() {
  return <EnvelopesPage />;
}
