import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { Health } from '../../../../shared/schemas/api/health';
export type { Health } from '../../../../shared/schemas/api/health';

export const getHealth = () => apiFetch<Health>('/health');

export const healthQueryOptions = () => queryOptions({ queryKey: ['health'], queryFn: getHealth, refetchInterval: 15_000, retry: false });

export const useHealth = () => useQuery(healthQueryOptions());
