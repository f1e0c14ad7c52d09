import { useQueries } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { YearResults } from '../../../../shared/scenario/results';

/** The per-year results of one finished run (the run list leaves them out). */
export const getRunByYear = async (projectId: number, runId: number) => {
  const { run } = await apiFetch<{ run: { id: number; results: { hoursByYear: YearResults[] } | null } }>(`/projects/${projectId}/runs/${runId}`);
  return { runId: run.id, hoursByYear: run.results?.hoursByYear ?? [] };
};

export function useRunsByYear(projectId: number, runIds: number[]) {
  return useQueries({
    queries: runIds.map((runId) => ({
      // Its own key: the run page's query for the same run holds a different shape.
      queryKey: ['projects', projectId, 'runs', runId, 'by-year'],
      queryFn: () => getRunByYear(projectId, runId),
      staleTime: Infinity,
    })),
  });
}
