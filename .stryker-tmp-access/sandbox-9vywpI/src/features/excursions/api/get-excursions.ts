// @ts-nocheck
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ExcursionAnalysis, XFactorPoint } from '../../../../shared/excursions';
import type { ChosenEnvelope, ProposalQuery } from '../../../../shared/excursions/proposal-query';

import type { ModeHours } from '../../../../shared/scenario/results';

export interface ExcursionsResponse {
  run: {
    id: number;
    scenarioName: string;
    systemKind: 'direct-air' | 'indirect-air' | 'water-side';
    evaporativeEffectiveness: number;
    heatRejection: 'dry-cooler' | 'cooling-tower' | null;
    supplyAirC: number;
    climateName: string;
    siteName: string;
    elevationM: number;
    utcOffsetMinutes: number;
    hours: ModeHours | null;
  };
  proposal: { supplyAirC: number; floatUpToC: number | null; control: ChosenEnvelope; recommended: ChosenEnvelope; allowable: ChosenEnvelope };
  /** JSON turns NaN into null: a run without data hours has null X-factor and inlet range. */
  analysis: ExcursionAnalysis;
  reference: { xFactorTable: XFactorPoint[]; hourlyRateLimitK: number; durationBins: { fromHours: number; toHours: number | null }[] };
}

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
    queryKey: ['projects', projectId, 'runs', runId, 'excursions', query],
    queryFn: () => getExcursions(projectId, runId, query),
    // A finished run's hours never change, so one answer per proposal is enough.
    staleTime: Infinity,
    retry: false,
  });

/** Keeps the previous proposal's figures on screen while the next one is worked out. */
export const useExcursions = (projectId: number, runId: number, query: ProposalQuery) =>
  useQuery({ ...excursionsQueryOptions(projectId, runId, query), placeholderData: keepPreviousData });
