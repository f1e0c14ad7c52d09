import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export interface Health {
  status: 'ok';
  version: string;
  database: { reachable: boolean; latencyMs: number };
  time: string;
}

export const getHealth = () => apiFetch<Health>('/health');

export const healthQueryOptions = () =>
  queryOptions({ queryKey: ['health'], queryFn: getHealth, refetchInterval: 15_000, retry: false });

export const useHealth = () => useQuery(healthQueryOptions());
