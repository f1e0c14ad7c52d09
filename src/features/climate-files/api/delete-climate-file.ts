import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { climateFilesQueryKey } from '@/lib/api/climate-files';

export const deleteClimateFile = (projectId: number, fileId: number) => apiFetch<void>(`/projects/${projectId}/climate-files/${fileId}`, { method: 'DELETE' });

export function useDeleteClimateFile(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (fileId: number) => deleteClimateFile(projectId, fileId),
    // Not awaited: the caller leaves the file's page first.
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: climateFilesQueryKey(projectId), exact: true });
    },
  });
}
