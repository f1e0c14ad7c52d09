// @ts-nocheck
import { useParams } from 'react-router-dom';
import { ClimateFilesPanel } from '@/features/climate-files/components/climate-files-panel';
import { ProjectOverview } from '@/features/projects/components/project-overview';
import { SitesPanel } from '@/features/sites/components/sites-panel';
import { NotFoundRoute } from './not-found';

/** /projects/:projectId — the overview, composed from the projects, sites and climate-files features. */
export function ProjectOverviewRoute() {
  const projectId = Number(useParams().projectId);
  if (!Number.isInteger(projectId) || projectId <= 0) return <NotFoundRoute />;
  return (
    <ProjectOverview
      projectId={projectId}
      renderSites={(canEdit) => <SitesPanel projectId={projectId} canEdit={canEdit} />}
      renderClimateFiles={(canEdit) => <ClimateFilesPanel projectId={projectId} canEdit={canEdit} />}
    />
  );
}
