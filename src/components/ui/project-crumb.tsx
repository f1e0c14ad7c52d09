import { Link } from 'react-router-dom';
import { useProjectRole } from '@/lib/api/projects';

/** "Projects / <project name> /" above every page inside a project. */
export function ProjectCrumb({ projectId }: { projectId: number }) {
  const { projectName } = useProjectRole(projectId);
  return (
    <nav aria-label="Breadcrumb" className="text-sm text-ink-soft">
      <Link to="/" className="underline hover:decoration-2">
        Projects
      </Link>{' '}
      /{' '}
      <Link to={`/projects/${projectId}`} className="underline hover:decoration-2">
        {projectName ?? 'Project'}
      </Link>{' '}
      /
    </nav>
  );
}
