import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { runQueryKey } from '@/lib/api/runs';
import type { ProposalQuery } from '../../../../shared/excursions/proposal-query';
import type { ExcursionsResponse } from '../../../../shared/schemas/api/studies';
export type { ExcursionsResponse } from '../../../../shared/schemas/api/studies';

/** The proposal as address parameters, leaving out what is not set (the server fills in the run's own). */
export function proposalSearch(query: ProposalQuery): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value !== undefined && value !== null) params.set(key, String(value));
  const text = params.toString();
  return text ? `?${text}` : '';
}

export const getExcursions = (projectId: number, runId: number, query: ProposalQuery) =>
  apiFetch<ExcursionsResponse>(`/projects/${projectId}/runs/${runId}/excursions${proposalSearch(query)}`);

export const excursionsQueryOptions = (projectId: number, runId: number, query: ProposalQuery) =>
  queryOptions({
    queryKey: [...runQueryKey(projectId, runId), 'excursions', query],
    queryFn: () => getExcursions(projectId, runId, query),
    // A finished run's hours never change, so one answer per proposal is enough.
    staleTime: Infinity,
    retry: false,
  });

/** Keeps the previous proposal's figures on screen while the next one is worked out. */
export const useExcursions = (projectId: number, runId: number, query: ProposalQuery) =>
  useQuery({ ...excursionsQueryOptions(projectId, runId, query), placeholderData: keepPreviousData });
