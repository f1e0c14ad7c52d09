// @ts-nocheck
import { useQuery } from '@tanstack/react-query';
import { projectsQueryOptions } from '@/lib/projects';

export { getProjects, projectsQueryOptions, type ProjectSummary } from '@/lib/projects';

export const useProjects = () => useQuery(projectsQueryOptions());
