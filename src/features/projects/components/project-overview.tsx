import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useProjectMembers } from '../api/get-project-members';
import { useProjects } from '@/lib/api/projects';
import { MembersPanel } from './members-panel';
import { RunsPanel } from './runs-panel';
import { ScenariosPanel } from './scenarios-panel';
import { StorageMeter } from './storage-meter';
import { SweepsPanel } from './sweeps-panel';

/**
 * The project overview: its name and the person's role, then sites, climate files, scenarios, recent
 * runs and members. Sites and climate files come from their own features, handed in by the route.
 */
export function ProjectOverview({
  projectId,
  renderSites,
  renderClimateFiles,
}: {
  projectId: number;
  renderSites: (canEdit: boolean) => ReactNode;
  renderClimateFiles: (canEdit: boolean) => ReactNode;
}) {
  const projects = useProjects();
  const members = useProjectMembers(projectId);
  const listed = projects.data?.projects.find((p) => p.id === projectId);
  const role = members.data?.yourRole ?? listed?.role;
  const canEdit = role === 'owner' || role === 'engineer';
  const name = members.data?.project.name ?? listed?.name;

  if (members.isError && members.error instanceof ApiError && (members.error.status === 403 || members.error.status === 404)) {
    return (
      <Notice tone="bad" title="This project is not open to you">
        It does not exist, or you are not a member.{' '}
        <Link to="/" className="underline">
          Back to your projects
        </Link>
        .
      </Notice>
    );
  }
  if (members.isError && members.error instanceof ApiError && members.error.status === 401) {
    return <Notice title="You are not signed in">Sign in to open this project.</Notice>;
  }

  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <p className="text-sm text-ink-soft">
            <Link to="/" className="underline hover:decoration-2">
              Projects
            </Link>{' '}
            /
          </p>
          <h1 className="text-xl font-semibold">{name ?? <span className="inline-block h-6 w-48 animate-pulse rounded bg-mist align-middle" />}</h1>
          {listed?.description && <p className="mt-1 max-w-3xl text-sm text-ink-soft">{listed.description}</p>}
          <nav aria-label="Project" className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-sm">
            <Link to={`/projects/${projectId}/compare`} className="text-harbour underline-offset-2 underline hover:decoration-2">
              Compare runs
            </Link>
            <Link to={`/projects/${projectId}/envelopes`} className="text-harbour underline-offset-2 underline hover:decoration-2">
              Inlet envelopes
            </Link>
            <Link to={`/projects/${projectId}/members`} className="text-harbour underline-offset-2 underline hover:decoration-2">
              Members and invitations
            </Link>
            {role === 'owner' && (
              <Link to={`/projects/${projectId}/audit`} className="text-harbour underline-offset-2 underline hover:decoration-2">
                Audit trail
              </Link>
            )}
          </nav>
        </div>
        <div className="flex flex-col items-end gap-2">
          {role && (
            <p className="rounded border border-rule bg-panel px-3 py-1 text-xs text-ink-soft">
              Your role: <span className="font-semibold text-ink">{role}</span>
              {!canEdit && ' · you can read everything here; editing is for engineers and owners'}
            </p>
          )}
          <StorageMeter projectId={projectId} />
        </div>
      </div>
      <div className="grid gap-5 xl:grid-cols-2">
        {renderSites(canEdit)}
        {renderClimateFiles(canEdit)}
        <ScenariosPanel projectId={projectId} canEdit={canEdit} />
        <MembersPanel projectId={projectId} members={members.data} error={members.isError ? members.error : null} />
        <SweepsPanel projectId={projectId} canEdit={canEdit} />
      </div>
      <RunsPanel projectId={projectId} />
    </div>
  );
}
