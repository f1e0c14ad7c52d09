import { lazy, Suspense } from 'react';
import { Link } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ApiError } from '@/lib/api-client';
import { useProjects } from '@/lib/api/projects';
// The form brings the form and schema libraries; they load with it, not with the first page.
const NewProjectForm = lazy(() => import('@/features/projects/components/new-project-form').then((m) => ({ default: m.NewProjectForm })));

const roleWords = { owner: 'Owner', engineer: 'Engineer', viewer: 'Viewer' } as const;

export function HomeRoute() {
  const projects = useProjects();
  const signedOut = projects.data?.signedIn === false || (projects.error instanceof ApiError && projects.error.status === 401);
  return (
    <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
      <div className="grid content-start gap-6">
        <Panel title="Projects">
          {projects.isPending && <div role="progressbar" className="h-16 animate-pulse rounded bg-mist" aria-label="Loading projects" />}
          {signedOut ? (
            <Notice title="You are not signed in">
              <Link to="/sign-in" className="font-medium text-harbour underline">
                Sign in
              </Link>{' '}
              to see your projects.
            </Notice>
          ) : (
            projects.isError && (
              <Notice tone="bad" title="Projects could not be loaded">
                {projects.error.message}
              </Notice>
            )
          )}
          {!signedOut && projects.data && projects.data.projects.length === 0 && (
            <p className="text-sm text-ink-soft">No projects yet. Start one below, or ask a project owner to invite you.</p>
          )}
          {projects.data && projects.data.projects.length > 0 && (
            <table className="w-full text-sm">
              <thead>
                <tr className="border-b border-rule text-left text-xs text-ink-soft">
                  <th scope="col" className="py-1.5 font-medium">
                    Project
                  </th>
                  <th scope="col" className="py-1.5 font-medium">
                    Your role
                  </th>
                </tr>
              </thead>
              <tbody className="divide-y divide-rule">
                {projects.data.projects.map((p) => (
                  <tr key={p.id}>
                    <td className="py-2 pr-4">
                      <Link to={`/projects/${p.id}`} className="font-medium text-harbour underline-offset-2 underline hover:decoration-2">
                        {p.name}
                      </Link>
                      {p.description && <p className="text-ink-soft">{p.description}</p>}
                    </td>
                    <td className="py-2 align-top text-ink-soft">{roleWords[p.role]}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
        </Panel>
        {projects.data && !signedOut && (
          <Panel title="Start a project">
            <Suspense fallback={<div role="progressbar" className="h-24 animate-pulse rounded bg-mist" aria-label="Loading the form" />}>
              <NewProjectForm />
            </Suspense>
          </Panel>
        )}
      </div>
      <Panel title="What Tramontane answers">
        <p className="text-sm leading-relaxed text-ink-soft">
          For a site and a cooling design: how many hours a year the IT halls run on outside air or water alone (free cooling), with evaporative help (adiabatic
          assist), or on compressors (mechanical), checked hour by hour against the IT inlet envelope, with the energy, water and back-up capacity that follows.
        </p>
      </Panel>
    </div>
  );
}
