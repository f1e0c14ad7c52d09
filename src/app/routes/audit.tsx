import { AuditPage } from '@/features/audit/components/audit-page';

/** /projects/:projectId/audit and /audit — the audit trail of a project or of everything. */
export function AuditRoute() {
  return <AuditPage />;
}
