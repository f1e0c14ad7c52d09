import { Link, useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { useProjectRole } from '@/lib/api/projects';
import { Notice } from '@/components/ui/notice';
import { UploadWizard } from '@/features/climate-files/components/upload-wizard';
import { useSites } from '@/lib/api/sites';
import { SiteForm } from '@/features/sites/components/site-form';
import { ProjectCrumb } from '@/components/ui/project-crumb';
import { NotFoundRoute } from './not-found';

/** /projects/:projectId/climate-files/new — the upload wizard, with the site list and site form from the sites feature. */
export function ClimateFileUploadRoute() {
  const projectId = Number(useParams().projectId);
  const navigate = useNavigate();
  const [search] = useSearchParams();
  const sites = useSites(projectId);
  const { role, canEdit } = useProjectRole(projectId);
  if (!Number.isInteger(projectId) || projectId <= 0) return <NotFoundRoute />;
  return (
    <div className="space-y-4">
      <div>
        <ProjectCrumb projectId={projectId} />
        <h1 className="text-xl font-semibold">Upload a climate file</h1>
      </div>
      {sites.isPending && <div role="progressbar" className="h-40 animate-pulse rounded bg-mist" aria-label="Loading sites" />}
      {sites.isError && (
        <Notice tone="bad" title="The project's sites could not be loaded">
          {sites.error.message}
        </Notice>
      )}
      {role && !canEdit && (
        <Notice title="Viewers can read climate files but not upload them">
          <span data-testid="upload-read-only">
            Your role in this project is {role}. Ask an engineer or owner to upload the file, or{' '}
            <Link className="underline" to={`/projects/${projectId}`}>
              go back to the project
            </Link>{' '}
            to read the files it has.
          </span>
        </Notice>
      )}
      {sites.data && canEdit && (
        <UploadWizard
          projectId={projectId}
          sites={sites.data.sites}
          initialSiteId={Number(search.get('siteId')) || undefined}
          renderNewSite={(onCreated, prefill) => <SiteForm projectId={projectId} initial={prefill} onCreated={(site) => onCreated(site.id)} />}
          onStored={(fileId) => navigate(`/projects/${projectId}/climate-files/${fileId}`)}
        />
      )}
    </div>
  );
}
