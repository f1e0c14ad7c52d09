import { useQuery } from '@tanstack/react-query';
import { projectRunsQueryOptions } from '@/lib/api/runs';

/** The runs of one scenario, from the project's run list (the same cache entry the compare page reads). */
export function useScenarioRuns(projectId: number, scenarioId: number | null) {
  const query = useQuery({ ...projectRunsQueryOptions(projectId), enabled: scenarioId !== null });
  return { ...query, runs: (query.data?.runs ?? []).filter((r) => r.scenarioId === scenarioId) };
}
