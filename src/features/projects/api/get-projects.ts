import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export interface ProjectSummary {
  id: number;
  name: string;
  description: string;
  role: 'owner' | 'engineer' | 'viewer';
}

export const getProjects = () => apiFetch<{ projects: ProjectSummary[] }>('/projects');

export const projectsQueryOptions = () => queryOptions({ queryKey: ['projects'], queryFn: getProjects, retry: false });

export const useProjects = () => useQuery(projectsQueryOptions());
