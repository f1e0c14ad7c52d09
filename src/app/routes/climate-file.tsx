import { useNavigate, useParams } from 'react-router-dom';
import { ClimateFileView } from '@/features/climate-files/components/climate-file-view';
import { useProjects } from '@/lib/api/projects';
import { ProjectCrumb } from '@/components/ui/project-crumb';
import { NotFoundRoute } from './not-found';

/** /projects/:projectId/climate-files/:fileId */
export function ClimateFileRoute() {
  const params = useParams();
  const projectId = Number(params.projectId);
  const fileId = Number(params.fileId);
  const navigate = useNavigate();
  const role = useProjects().data?.projects.find((p) => p.id === projectId)?.role;
  if (!(Number.isInteger(projectId) && projectId > 0 && Number.isInteger(fileId) && fileId > 0)) return <NotFoundRoute />;
  return (
    <div className="space-y-3">
      <ProjectCrumb projectId={projectId} />
      <ClimateFileView
        projectId={projectId}
        fileId={fileId}
        canEdit={role === 'owner' || role === 'engineer'}
        onDeleted={() => navigate(`/projects/${projectId}`)}
      />
    </div>
  );
}
