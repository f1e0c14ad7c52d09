// @ts-nocheck
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export interface Settings {
  /** Lower-case on the wire; the unit-system context uses 'SI' | 'IP'. */
  unitSystem: 'si' | 'ip';
  runNotices: boolean;
}

export interface Me {
  user: { id: number; email: string; name: string; isAdmin: boolean };
  settings: Settings;
  projects: { id: number; name: string; role: 'owner' | 'engineer' | 'viewer' }[];
}

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
