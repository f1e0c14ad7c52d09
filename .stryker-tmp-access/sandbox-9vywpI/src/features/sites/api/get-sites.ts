// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export interface Site {
  id: number;
  projectId: number;
  name: string;
  latitude: number | null;
  longitude: number | null;
  elevationM: number;
  timeZone: string;
  createdAt: string | number;
}

export const sitesQueryKey = (projectId: number) => ['projects', projectId, 'sites'] as const;

export const getSites = (projectId: number) => apiFetch<{ sites: Site[] }>(`/projects/${projectId}/sites`);

export const sitesQueryOptions = (projectId: number) => queryOptions({ queryKey: sitesQueryKey(projectId), queryFn: () => getSites(projectId), retry: false });

export const useSites = (projectId: number) => useQuery(sitesQueryOptions(projectId));
