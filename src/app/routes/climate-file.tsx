import { useParams } from 'react-router-dom';
import { ClimateFileView } from '@/features/climate-files/components/climate-file-view';
import { ProjectCrumb } from '@/features/projects/components/project-crumb';
import { NotFoundRoute } from './not-found';

/** /projects/:projectId/climate-files/:fileId */
export function ClimateFileRoute() {
  const params = useParams();
  const projectId = Number(params.projectId);
  const fileId = Number(params.fileId);
  if (!(Number.isInteger(projectId) && projectId > 0 && Number.isInteger(fileId) && fileId > 0)) return <NotFoundRoute />;
  return (
    <div className="space-y-3">
      <ProjectCrumb projectId={projectId} />
      <ClimateFileView projectId={projectId} fileId={fileId} />
    </div>
  );
}
