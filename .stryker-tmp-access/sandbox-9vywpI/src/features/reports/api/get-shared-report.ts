// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ReportData } from '../../../../shared/report/report-data';

export interface SharedReport {
  link: { title: string; target: 'run' | 'comparison'; publicUntil: string | null };
  report: ReportData;
}

export const getSharedReport = (token: string) => apiFetch<SharedReport>(`/shared/${encodeURIComponent(token)}`);

export const sharedReportQueryOptions = (token: string) =>
  queryOptions({ queryKey: ['shared-report', token], queryFn: () => getSharedReport(token), retry: false });

export const useSharedReport = (token: string) => useQuery(sharedReportQueryOptions(token));
