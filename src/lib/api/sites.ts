/** Sites of a project: the list and its query key. Types from shared/schemas/api. */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import type { siteListResponse } from '../../../shared/schemas/api/sites';
import { apiFetch } from '../api-client';

export type { Site } from '../../../shared/schemas/api/sites';

export const sitesQueryKey = (projectId: number) => ['projects', projectId, 'sites'] as const;

export const getSites = (projectId: number) => apiFetch<z.infer<typeof siteListResponse>>(`/projects/${projectId}/sites`);

export const sitesQueryOptions = (projectId: number) => queryOptions({ queryKey: sitesQueryKey(projectId), queryFn: () => getSites(projectId), retry: false });

export const useSites = (projectId: number) => useQuery(sitesQueryOptions(projectId));
