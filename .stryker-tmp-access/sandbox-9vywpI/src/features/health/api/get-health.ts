// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export interface Health {
  status: 'ok';
  /** The app's release (package.json). */
  version: string;
  /** The engine new runs are made by, e.g. 'scenario-engine 2.0.0'. */
  engineVersion: string;
  database: { reachable: boolean; latencyMs: number };
  time: string;
}

export const getHealth = () => apiFetch<Health>('/health');

export const healthQueryOptions = () => queryOptions({ queryKey: ['health'], queryFn: getHealth, refetchInterval: 15_000, retry: false });

export const useHealth = () => useQuery(healthQueryOptions());
