// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ProjectSummary } from '@/lib/projects';

export interface NewProject {
  name: string;
  description: string;
}

export const createProject = (input: NewProject) => apiFetch<{ project: ProjectSummary }>('/projects', { method: 'POST', body: JSON.stringify(input) });

export function useCreateProject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProject,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['projects'] }),
  });
}
