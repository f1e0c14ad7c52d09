import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SiteInput } from '../../../../shared/schemas/climate-file';
import { apiFetch } from '@/lib/api-client';
import { sitesQueryKey, type Site } from '@/lib/api/sites';

export const createSite = (projectId: number, input: SiteInput) =>
  apiFetch<{ site: Site }>(`/projects/${projectId}/sites`, {
    method: 'POST',
    body: JSON.stringify(input),
  });

export function useCreateSite(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SiteInput) => createSite(projectId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sitesQueryKey(projectId) }),
  });
}
