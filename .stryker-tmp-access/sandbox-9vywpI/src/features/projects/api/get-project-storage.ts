// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ProjectStorage } from '../../../../shared/schemas/project-storage';

export const getProjectStorage = (projectId: number) => apiFetch<{ storage: ProjectStorage }>(`/projects/${projectId}/storage`);

export const projectStorageQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'storage'], queryFn: () => getProjectStorage(projectId), retry: false });

export const useProjectStorage = (projectId: number) => useQuery(projectStorageQueryOptions(projectId));
