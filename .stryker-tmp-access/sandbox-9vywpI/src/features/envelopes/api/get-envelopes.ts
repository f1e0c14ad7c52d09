// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { EnvelopeLimits, EnvelopePreset } from '../../../../shared/scenario/envelopes';

export interface ProjectEnvelope {
  id: number;
  projectId: number;
  name: string;
  note: string;
  limits: EnvelopeLimits;
  createdAt: string;
}

export const getEnvelopePresets = () => apiFetch<{ presets: EnvelopePreset[] }>('/envelope-presets');
export const getProjectEnvelopes = (projectId: number) => apiFetch<{ envelopes: ProjectEnvelope[] }>(`/projects/${projectId}/envelopes`);

export const envelopePresetsQueryOptions = () => queryOptions({ queryKey: ['envelope-presets'], queryFn: getEnvelopePresets, staleTime: Infinity });

export const projectEnvelopesQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'envelopes'], queryFn: () => getProjectEnvelopes(projectId) });

export const useEnvelopePresets = () => useQuery(envelopePresetsQueryOptions());
export const useProjectEnvelopes = (projectId: number) => useQuery(projectEnvelopesQueryOptions(projectId));
