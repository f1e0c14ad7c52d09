// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export const setAdmin = (userId: number, isAdmin: boolean) =>
  apiFetch<{ id: number; isAdmin: boolean }>(`/admin/people/${userId}`, { method: 'PATCH', body: JSON.stringify({ isAdmin }) });

export function useSetAdmin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, isAdmin }: { userId: number; isAdmin: boolean }) => setAdmin(userId, isAdmin),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['admin', 'people'] }),
  });
}
