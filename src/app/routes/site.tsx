import { useNavigate, useParams } from 'react-router-dom';
import { ClimateFilesPanel } from '@/features/climate-files/components/climate-files-panel';
import { useProjects } from '@/lib/api/projects';
import { ProjectCrumb } from '@/components/ui/project-crumb';
import { SiteView } from '@/features/sites/components/site-view';
import { NotFoundRoute } from './not-found';

/** /projects/:projectId/sites/:siteId — the site, with its climate files from the climate-files feature. */
export function SiteRoute() {
  const params = useParams();
  const projectId = Number(params.projectId);
  const siteId = Number(params.siteId);
  const navigate = useNavigate();
  const role = useProjects().data?.projects.find((p) => p.id === projectId)?.role;
  const canEdit = role === 'owner' || role === 'engineer';
  if (!(Number.isInteger(projectId) && projectId > 0 && Number.isInteger(siteId) && siteId > 0)) return <NotFoundRoute />;
  return (
    <div className="space-y-3">
      <ProjectCrumb projectId={projectId} />
      <SiteView
        projectId={projectId}
        siteId={siteId}
        canEdit={canEdit}
        onDeleted={() => navigate(`/projects/${projectId}`)}
        climateFiles={<ClimateFilesPanel projectId={projectId} canEdit={canEdit} siteId={siteId} title="Climate files of this site" />}
      />
    </div>
  );
}
