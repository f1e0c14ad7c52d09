import { useInfiniteQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { AuditEvent } from '../../../../shared/schemas/api/people';
export type { AuditEvent } from '../../../../shared/schemas/api/people';

export interface AuditFilters {
  action?: string;
  actorId?: number;
  projectId?: number;
  /** yyyy-mm-dd, inclusive, UTC. */
  from?: string;
  to?: string;
}

const pageSize = 50;

/** The admin's whole trail, or one project's trail for its owners; pages backwards by id. */
export const getAudit = (scope: { projectId?: number }, filters: AuditFilters, beforeId?: number) => {
  const query = new URLSearchParams({ limit: String(pageSize) });
  if (filters.action) query.set('action', filters.action);
  if (filters.actorId) query.set('actorId', String(filters.actorId));
  if (filters.projectId && !scope.projectId) query.set('projectId', String(filters.projectId));
  if (filters.from) query.set('from', `${filters.from}T00:00:00Z`);
  if (filters.to) query.set('to', `${filters.to}T23:59:59.999Z`);
  if (beforeId) query.set('beforeId', String(beforeId));
  const base = scope.projectId ? `/projects/${scope.projectId}/audit` : '/audit';
  return apiFetch<{ events: AuditEvent[] }>(`${base}?${query}`);
};

export const useAudit = (scope: { projectId?: number }, filters: AuditFilters) =>
  useInfiniteQuery({
    queryKey: ['audit', scope.projectId ?? 'all', filters],
    queryFn: ({ pageParam }) => getAudit(scope, filters, pageParam),
    initialPageParam: undefined as number | undefined,
    getNextPageParam: (last) => (last.events.length === pageSize ? last.events[last.events.length - 1].id : undefined),
    retry: false,
  });
