// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export const deleteEnvelope = (projectId: number, envelopeId: number) => apiFetch<void>(`/projects/${projectId}/envelopes/${envelopeId}`, { method: 'DELETE' });

export function useDeleteEnvelope(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (envelopeId: number) => deleteEnvelope(projectId, envelopeId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['projects', projectId] }),
  });
}
