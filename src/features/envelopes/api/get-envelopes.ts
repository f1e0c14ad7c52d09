import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { EnvelopePreset } from '../../../../shared/scenario/envelopes';
import type { ProjectEnvelope } from '../../../../shared/schemas/api/envelopes';
export type { ProjectEnvelope } from '../../../../shared/schemas/api/envelopes';

export const getEnvelopePresets = () => apiFetch<{ presets: EnvelopePreset[] }>('/envelope-presets');
export const getProjectEnvelopes = (projectId: number) => apiFetch<{ envelopes: ProjectEnvelope[] }>(`/projects/${projectId}/envelopes`);

export const envelopePresetsQueryOptions = () => queryOptions({ queryKey: ['envelope-presets'], queryFn: getEnvelopePresets, staleTime: Infinity });

export const projectEnvelopesQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'envelopes'], queryFn: () => getProjectEnvelopes(projectId) });

export const useEnvelopePresets = () => useQuery(envelopePresetsQueryOptions());
export const useProjectEnvelopes = (projectId: number) => useQuery(projectEnvelopesQueryOptions(projectId));
