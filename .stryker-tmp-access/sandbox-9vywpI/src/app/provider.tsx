// @ts-nocheck
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { UnitSystemProvider } from '@/lib/unit-system';

export function AppProvider({ children }: { children: ReactNode }) {
  const [queryClient] = useState(() => new QueryClient({ defaultOptions: { queries: { staleTime: 10_000, refetchOnWindowFocus: false } } }));
  return (
    <QueryClientProvider client={queryClient}>
      <UnitSystemProvider>{children}</UnitSystemProvider>
    </QueryClientProvider>
  );
}
