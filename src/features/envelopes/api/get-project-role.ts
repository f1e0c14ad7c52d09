import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

/** Whether the signed-in person may change the project's envelopes (engineer or owner). */
export function useCanEditEnvelopes(projectId: number): boolean {
  const query = useQuery({
    queryKey: ['projects'],
    queryFn: () => apiFetch<{ projects: { id: number; role: string }[] }>('/projects'),
    retry: false,
  });
  const role = query.data?.projects.find((p) => p.id === projectId)?.role;
  return role === 'engineer' || role === 'owner';
}
