// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ComparisonReportData } from '../../../../shared/report/report-data';

/** `runs=1,2&baseline=1`, as the compare page writes it. */
export const comparisonSearch = (runIds: number[], baselineId: number) => `runs=${runIds.join(',')}&baseline=${baselineId}`;

export const getComparisonReport = (projectId: number, runIds: number[], baselineId: number) =>
  apiFetch<{ report: ComparisonReportData }>(`/projects/${projectId}/compare/report?${comparisonSearch(runIds, baselineId)}`);

export const comparisonReportQueryOptions = (projectId: number, runIds: number[], baselineId: number) =>
  queryOptions({
    queryKey: ['projects', projectId, 'compare-report', runIds.join(','), baselineId],
    queryFn: () => getComparisonReport(projectId, runIds, baselineId),
    retry: false,
    staleTime: Infinity,
  });

/** Asks only once there are two runs to compare. */
export const useComparisonReport = (projectId: number, runIds: number[], baselineId: number) =>
  useQuery({ ...comparisonReportQueryOptions(projectId, runIds, baselineId), enabled: runIds.length >= 2 });
