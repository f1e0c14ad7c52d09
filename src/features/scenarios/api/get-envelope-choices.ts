import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { EnvelopePreset } from '../../../../shared/scenario/envelopes';
import type { ProjectEnvelope } from '../../../../shared/schemas/api/envelopes';
export type { ProjectEnvelope } from '../../../../shared/schemas/api/envelopes';

export interface EnvelopeChoices {
  presets: EnvelopePreset[];
  envelopes: ProjectEnvelope[];
}

/** The published presets and the project's own envelopes, for the editor's envelope picker. */
export async function getEnvelopeChoices(projectId: number): Promise<EnvelopeChoices> {
  const [{ presets }, { envelopes }] = await Promise.all([
    apiFetch<{ presets: EnvelopePreset[] }>('/envelope-presets'),
    apiFetch<{ envelopes: ProjectEnvelope[] }>(`/projects/${projectId}/envelopes`),
  ]);
  return { presets, envelopes };
}

export const envelopeChoicesQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'envelope-choices'], queryFn: () => getEnvelopeChoices(projectId), staleTime: 60_000 });

export const useEnvelopeChoices = (projectId: number) => useQuery(envelopeChoicesQueryOptions(projectId));
