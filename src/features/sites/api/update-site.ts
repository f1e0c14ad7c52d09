import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SiteInput } from '../../../../shared/schemas/climate-file';
import { apiFetch } from '@/lib/api-client';
import { sitesQueryKey, type Site } from '@/lib/api/sites';

export const updateSite = (projectId: number, siteId: number, input: SiteInput) =>
  apiFetch<{ site: Site }>(`/projects/${projectId}/sites/${siteId}`, {
    method: 'PATCH',
    body: JSON.stringify(input),
  });

export function useUpdateSite(projectId: number, siteId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SiteInput) => updateSite(projectId, siteId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sitesQueryKey(projectId) }),
  });
}
