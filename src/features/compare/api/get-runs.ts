import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { EnergyTotals, ModeHours } from '../../../../shared/scenario/results';

/** A run as the project's run list gives it: totals only, no per-month tables. */
export interface RunListing {
  id: number;
  scenarioId: number | null;
  climateFileId: number | null;
  status: 'queued' | 'running' | 'done' | 'failed' | 'cancelled';
  createdAt: string;
  scenario: { name: string; system: { kind: string } };
  climate: { name: string; hours: number; site: { name: string } };
  results: {
    hours: ModeHours;
    energy: EnergyTotals & { partialPue: number | null; annual: EnergyTotals | null };
    water: { totalL: number; annualL: number | null; wueLPerKwh: number | null };
    peakMechanicalLoadKw: number;
  } | null;
}

export const getRuns = (projectId: number) => apiFetch<{ runs: RunListing[] }>(`/projects/${projectId}/runs`);

export const runsQueryOptions = (projectId: number) =>
  queryOptions({
    queryKey: ['projects', projectId, 'runs'],
    queryFn: () => getRuns(projectId),
    // The list is shared by the overview, the compare page and the editor: read it afresh on every visit,
    // and follow runs still waiting or computing until they finish.
    staleTime: 0,
    refetchInterval: (query) => (query.state.data?.runs.some((r) => r.status === 'queued' || r.status === 'running') ? 2000 : false),
  });

export const useRuns = (projectId: number) => useQuery(runsQueryOptions(projectId));
