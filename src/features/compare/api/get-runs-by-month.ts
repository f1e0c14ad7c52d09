import { useQueries } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ModeHours } from '../../../../shared/scenario/results';

export type MonthRow = ModeHours & { month: number };

/** The per-month hours of one finished run (the run list leaves them out). */
export const getRunByMonth = async (projectId: number, runId: number) => {
  const { run } = await apiFetch<{ run: { id: number; results: { hoursByMonth: MonthRow[] } | null } }>(`/projects/${projectId}/runs/${runId}`);
  return { runId: run.id, hoursByMonth: run.results?.hoursByMonth ?? [] };
};

export function useRunsByMonth(projectId: number, runIds: number[]) {
  return useQueries({
    queries: runIds.map((runId) => ({
      // The same key as the run page's query would hold a different shape; keep these apart.
      queryKey: ['projects', projectId, 'runs', runId, 'by-month'],
      queryFn: () => getRunByMonth(projectId, runId),
      staleTime: Infinity,
    })),
  });
}
