import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { Settings, Me } from '../../../../shared/schemas/api/people';
export type { Settings, Me } from '../../../../shared/schemas/api/people';

export const getMe = () => apiFetch<Me>('/me');
export const updateSettings = (patch: Partial<Settings>) => apiFetch<Me>('/me', { method: 'PATCH', body: JSON.stringify(patch) });

export const meQueryOptions = () => queryOptions({ queryKey: ['me'], queryFn: getMe, retry: false });

export const useMe = () => useQuery(meQueryOptions());

export function useUpdateSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSettings,
    onSuccess: (me) => queryClient.setQueryData(['me'], me),
  });
}
