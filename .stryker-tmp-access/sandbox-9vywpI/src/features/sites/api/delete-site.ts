// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export const deleteSite = (projectId: number, siteId: number) => apiFetch<void>(`/projects/${projectId}/sites/${siteId}`, { method: 'DELETE' });

export function useDeleteSite(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (siteId: number) => deleteSite(projectId, siteId),
    // Its climate files go with it. Not awaited: the caller leaves the site's page first.
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: ['projects', projectId] });
    },
  });
}
