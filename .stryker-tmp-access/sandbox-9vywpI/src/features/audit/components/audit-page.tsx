// @ts-nocheck
import { useMemo, useState } from 'react';
import { useParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { useAudit, type AuditEvent, type AuditFilters } from '../api/get-audit';

const actionGroups: { value: string; label: string }[] = [
  { value: '', label: 'Everything' },
  { value: 'auth.', label: 'Sign-ins and sign-outs' },
  { value: 'invite.', label: 'Invitations' },
  { value: 'member.', label: 'Members and roles' },
  { value: 'admin.', label: 'Admin rights' },
  { value: 'site.', label: 'Sites' },
  { value: 'climate.', label: 'Climate files and projections' },
  { value: 'envelope.', label: 'Envelopes' },
  { value: 'scenario.', label: 'Scenario changes' },
  { value: 'run.', label: 'Runs' },
  { value: 'sweep.', label: 'Sweeps' },
  { value: 'share.', label: 'Report share links' },
  { value: 'project.', label: 'Projects' },
];

const inputClass = 'mt-0.5 block rounded border border-rule bg-panel px-2 py-1.5 text-sm text-ink';

/** The audit trail: the whole installation for admins (/audit), one project for its owners (/projects/:id/audit). */
export function AuditPage() {
  const projectParam = useParams().projectId;
  const scope = useMemo(() => (projectParam ? { projectId: Number(projectParam) } : {}), [projectParam]);
  const [filters, setFilters] = useState<AuditFilters>({});
  const audit = useAudit(scope, filters);
  const events = audit.data?.pages.flatMap((p) => p.events) ?? [];
  // The choice lists grow from what has been seen, so they never offer a person or project with no events.
  const [seenActors, setSeenActors] = useState(new Map<number, string>());
  const [seenProjects, setSeenProjects] = useState(new Map<number, string>());
  const newActors = events.filter((e) => e.actorId !== null && !seenActors.has(e.actorId));
  if (newActors.length) setSeenActors(new Map([...seenActors, ...newActors.map((e) => [e.actorId!, e.actorName ?? `#${e.actorId}`] as const)]));
  const newProjects = events.filter((e) => e.projectId !== null && !seenProjects.has(e.projectId));
  if (newProjects.length) setSeenProjects(new Map([...seenProjects, ...newProjects.map((e) => [e.projectId!, e.projectName ?? `#${e.projectId}`] as const)]));

  const set = (patch: Partial<AuditFilters>) => setFilters((f) => ({ ...f, ...patch }));
  const title = scope.projectId ? `Audit trail · ${events[0]?.projectName ?? `project ${scope.projectId}`}` : 'Audit trail · whole organisation';

  return (
    <div className="space-y-4">
      <Panel title={title}>
        <form className="flex flex-wrap items-end gap-3" aria-label="Filters" onSubmit={(e) => e.preventDefault()}>
          <label className="text-xs text-ink-soft">
            What
            <select className={inputClass} value={filters.action ?? ''} onChange={(e) => set({ action: e.target.value || undefined })}>
              {actionGroups.map((g) => (
                <option key={g.value} value={g.value}>
                  {g.label}
                </option>
              ))}
            </select>
          </label>
          <label className="text-xs text-ink-soft">
            Who
            <select
              className={inputClass}
              value={filters.actorId ?? ''}
              onChange={(e) => set({ actorId: e.target.value ? Number(e.target.value) : undefined })}
            >
              <option value="">Anyone</option>
              {[...seenActors].map(([id, name]) => (
                <option key={id} value={id}>
                  {name}
                </option>
              ))}
            </select>
          </label>
          {!scope.projectId && (
            <label className="text-xs text-ink-soft">
              Project
              <select
                className={inputClass}
                value={filters.projectId ?? ''}
                onChange={(e) => set({ projectId: e.target.value ? Number(e.target.value) : undefined })}
              >
                <option value="">Any</option>
                {[...seenProjects].map(([id, name]) => (
                  <option key={id} value={id}>
                    {name}
                  </option>
                ))}
              </select>
            </label>
          )}
          <label className="text-xs text-ink-soft">
            From (UTC)
            <input type="date" className={inputClass} value={filters.from ?? ''} onChange={(e) => set({ from: e.target.value || undefined })} />
          </label>
          <label className="text-xs text-ink-soft">
            To (UTC)
            <input type="date" className={inputClass} value={filters.to ?? ''} onChange={(e) => set({ to: e.target.value || undefined })} />
          </label>
          {Object.values(filters).some(Boolean) && (
            <button type="button" onClick={() => setFilters({})} className="rounded px-2 py-1.5 text-sm text-harbour-soft underline">
              Clear filters
            </button>
          )}
        </form>
      </Panel>

      {audit.isError && (
        <Notice tone="bad" title="The audit trail could not be loaded">
          {audit.error.message}
        </Notice>
      )}
      {audit.isPending && <div role="progressbar" className="h-40 animate-pulse rounded bg-mist" aria-label="Loading audit trail" />}
      {audit.isSuccess && (
        <Panel>
          {events.length === 0 ? (
            <p className="text-sm text-ink-soft">Nothing recorded matches these filters.</p>
          ) : (
            <table className="w-full text-sm" data-testid="audit-table">
              <thead className="text-left text-xs text-ink-faint">
                <tr>
                  <th className="py-1 font-medium">When (UTC)</th>
                  <th className="py-1 font-medium">Who</th>
                  {!scope.projectId && <th className="py-1 font-medium">Project</th>}
                  <th className="py-1 font-medium">What</th>
                  <th className="py-1 font-medium">On</th>
                  <th className="py-1 font-medium">Details</th>
                </tr>
              </thead>
              <tbody className="divide-y divide-rule">
                {events.map((e) => (
                  <AuditRow key={e.id} event={e} showProject={!scope.projectId} />
                ))}
              </tbody>
            </table>
          )}
          {audit.hasNextPage && (
            <button
              type="button"
              onClick={() => void audit.fetchNextPage()}
              disabled={audit.isFetchingNextPage}
              className="mt-3 rounded border border-rule px-3 py-1.5 text-sm hover:bg-mist disabled:opacity-60"
            >
              Older events
            </button>
          )}
        </Panel>
      )}
    </div>
  );
}

function AuditRow({ event, showProject }: { event: AuditEvent; showProject: boolean }) {
  const details = Object.entries(event.detail)
    .map(([k, v]) => `${k}: ${typeof v === 'object' ? JSON.stringify(v) : String(v)}`)
    .join(' · ');
  return (
    <tr className="align-top">
      <td className="num whitespace-nowrap py-1.5 pr-3 text-xs">{event.at.slice(0, 19).replace('T', ' ')}</td>
      <td className="py-1.5 pr-3">{event.actorName ?? 'system'}</td>
      {showProject && <td className="py-1.5 pr-3 text-ink-soft">{event.projectName ?? '—'}</td>}
      <td className="py-1.5 pr-3">
        <code className="num rounded bg-mist px-1.5 py-0.5 text-xs">{event.action}</code>
      </td>
      <td className="py-1.5 pr-3">{event.target}</td>
      <td className="py-1.5 text-xs text-ink-faint">{details}</td>
    </tr>
  );
}
