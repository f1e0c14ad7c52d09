// @ts-nocheck
import { Link } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import type { ProjectMembers } from '../api/get-project-members';

const roleWords = { owner: 'owner', engineer: 'engineer', viewer: 'viewer (read only)' };

export function MembersPanel({ projectId, members, error }: { projectId: number; members: ProjectMembers | undefined; error: Error | null }) {
  return (
    <Panel
      title="Members"
      actions={
        members?.canManage ? (
          <Link to={`/projects/${projectId}/members`} className="rounded border border-rule px-2.5 py-1 text-xs hover:bg-mist">
            Manage and invite
          </Link>
        ) : undefined
      }
    >
      {error && (
        <Notice tone="bad" title="Members could not be loaded">
          {error.message}
        </Notice>
      )}
      {!members && !error && <div role="progressbar" className="h-16 animate-pulse rounded bg-mist" aria-label="Loading members" />}
      {members && (
        <ul className="divide-y divide-rule/60 text-sm">
          {members.members.map((m) => (
            <li key={m.userId} className="flex items-baseline justify-between gap-3 py-1.5">
              <span>
                <span className="font-medium">{m.name || m.email}</span>
                {m.name && <span className="ml-2 text-xs text-ink-soft">{m.email}</span>}
              </span>
              <span className="text-xs text-ink-soft">{roleWords[m.role]}</span>
            </li>
          ))}
        </ul>
      )}
    </Panel>
  );
}
