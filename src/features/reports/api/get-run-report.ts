import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { runQueryKey } from '@/lib/api/runs';
import type { RunReportData } from '../../../../shared/report/report-data';

export const getRunReport = (projectId: number, runId: number) => apiFetch<{ report: RunReportData }>(`/projects/${projectId}/runs/${runId}/report`);

/** A finished run never changes, so its report is read once per visit. */
export const runReportQueryOptions = (projectId: number, runId: number) =>
  queryOptions({
    queryKey: [...runQueryKey(projectId, runId), 'report'],
    queryFn: () => getRunReport(projectId, runId),
    retry: false,
    staleTime: Infinity,
  });

export const useRunReport = (projectId: number, runId: number) => useQuery(runReportQueryOptions(projectId, runId));
