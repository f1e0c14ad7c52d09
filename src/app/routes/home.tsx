import { Link } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ApiError } from '@/lib/api-client';
import { useProjects } from '@/features/projects/api/get-projects';

export function HomeRoute() {
  const projects = useProjects();
  return (
    <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
      <Panel title="Projects">
        {projects.isPending && <div className="h-16 animate-pulse rounded bg-mist" aria-label="Loading projects" />}
        {projects.isError &&
          (projects.error instanceof ApiError && projects.error.status === 401 ? (
            <Notice title="You are not signed in">Your projects appear here once you sign in.</Notice>
          ) : (
            <Notice tone="bad" title="Projects could not be loaded">{projects.error.message}</Notice>
          ))}
        {projects.data && projects.data.projects.length === 0 && (
          <p className="text-sm text-ink-soft">No projects yet. Ask a project owner to invite you.</p>
        )}
        {projects.data && projects.data.projects.length > 0 && (
          <ul className="divide-y divide-rule">
            {projects.data.projects.map((p) => (
              <li key={p.id} className="py-2">
                <Link to={`/projects/${p.id}`} className="font-medium text-harbour underline-offset-2 hover:underline">
                  {p.name}
                </Link>
                <p className="text-sm text-ink-soft">{p.description}</p>
              </li>
            ))}
          </ul>
        )}
      </Panel>
      <Panel title="What Tramontane answers">
        <p className="text-sm leading-relaxed text-ink-soft">
          For a site and a cooling design: how many hours a year the IT halls run on outside air or water alone
          (free cooling), with evaporative help (adiabatic assist), or on compressors (mechanical), checked hour by
          hour against the IT inlet envelope, with the energy, water and back-up capacity that follows.
        </p>
      </Panel>
    </div>
  );
}
