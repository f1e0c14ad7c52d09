import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

import type { SharedReport } from '../../../../shared/schemas/api/reports';
export type { SharedReport } from '../../../../shared/schemas/api/reports';

export const getSharedReport = (token: string) => apiFetch<SharedReport>(`/shared/${encodeURIComponent(token)}`);

export const sharedReportQueryOptions = (token: string) =>
  queryOptions({ queryKey: ['shared-report', token], queryFn: () => getSharedReport(token), retry: false });

export const useSharedReport = (token: string) => useQuery(sharedReportQueryOptions(token));
