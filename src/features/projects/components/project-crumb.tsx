import { Link } from 'react-router-dom';
import { useProjects } from '../api/get-projects';

/** "Projects / <project name> /" above a page inside a project. */
export function ProjectCrumb({ projectId }: { projectId: number }) {
  const projects = useProjects();
  const name = projects.data?.projects.find((p) => p.id === projectId)?.name ?? 'Project';
  return (
    <nav aria-label="Breadcrumb" className="text-sm text-ink-soft">
      <Link to="/" className="hover:underline">Projects</Link> / <Link to={`/projects/${projectId}`} className="hover:underline">{name}</Link> /
    </nav>
  );
}
