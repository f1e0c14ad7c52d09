import { useQueries } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { runTablesQueryKey } from '@/lib/api/runs';
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

type RunTables = Awaited<ReturnType<typeof getRunTables>>;

/**
 * Each run's tables, `undefined` until they arrive. Query results are combined into the tables alone, and
 * TanStack Query hands back the same array until a run's tables change, so memos and charts built on it
 * are not rebuilt on every render. (Stable reference: an inline `combine` would run on every render.)
 */
const tablesOnly = (results: { data?: RunTables }[]) => results.map((q) => q.data);

export function useRunTables(projectId: number, runIds: number[]) {
  return useQueries({
    queries: runIds.map((runId) => ({
      queryKey: runTablesQueryKey(projectId, runId),
      queryFn: () => getRunTables(projectId, runId),
      staleTime: Infinity,
    })),
    combine: tablesOnly,
  });
}
