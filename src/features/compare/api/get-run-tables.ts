import { useQueries } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ModeHours, YearResults } from '../../../../shared/scenario/results';

type MonthRow = ModeHours & { month: number };

/** The per-month and per-year tables of one finished run (the run list leaves them out). */
export const getRunTables = async (projectId: number, runId: number) => {
  const { run } = await apiFetch<{ run: { id: number; scenario: unknown; results: { hoursByMonth: MonthRow[]; hoursByYear: YearResults[] } | null } }>(
    `/projects/${projectId}/runs/${runId}`,
  );
  // The scenario as run, for the inputs that differ between the compared runs.
  return { runId: run.id, scenario: run.scenario, hoursByMonth: run.results?.hoursByMonth ?? [], hoursByYear: run.results?.hoursByYear ?? [] };
};

export function useRunTables(projectId: number, runIds: number[]) {
  return useQueries({
    queries: runIds.map((runId) => ({
      // The same key as the run page's query would hold a different shape; keep these apart.
      queryKey: ['projects', projectId, 'runs', runId, 'tables'],
      queryFn: () => getRunTables(projectId, runId),
      staleTime: Infinity,
    })),
  });
}
