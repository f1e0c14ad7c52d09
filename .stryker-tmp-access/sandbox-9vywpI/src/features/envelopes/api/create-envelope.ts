// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { EnvelopeLimits } from '../../../../shared/scenario/envelopes';
import type { ProjectEnvelope } from './get-envelopes';

export interface NewEnvelope {
  name: string;
  note: string;
  limits: EnvelopeLimits;
}

export const createEnvelope = (projectId: number, envelope: NewEnvelope) =>
  apiFetch<{ envelope: ProjectEnvelope }>(`/projects/${projectId}/envelopes`, {
    method: 'POST',
    body: JSON.stringify(envelope),
  });

export function useCreateEnvelope(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (envelope: NewEnvelope) => createEnvelope(projectId, envelope),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['projects', projectId] }),
  });
}
