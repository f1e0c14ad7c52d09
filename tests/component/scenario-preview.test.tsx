import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, renderHook, waitFor } from '@testing-library/react';
import type { ReactNode } from 'react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { useScenarioPreview } from '@/features/scenarios/api/preview-scenario';
import { newScenarioValues } from '@/features/scenarios/lib/scenario-form';
import { scenarioSchema, type Scenario } from '../../shared/scenario/schema';

const base = scenarioSchema.parse(newScenarioValues);

const withSupply = (supplyAirC: number): Scenario => ({
  ...base,
  system: { ...(base.system as Extract<Scenario['system'], { kind: 'direct-air' }>), supplyAirC },
});

describe('the quick preview while editing', () => {
  let calls: { body: { scenario: Scenario }; signal: AbortSignal; resolve: (hours: number) => void }[];

  beforeEach(() => {
    calls = [];
    vi.stubGlobal(
      'fetch',
      vi.fn((_url: string, init: RequestInit) => {
        return new Promise<Response>((resolve, reject) => {
          init.signal?.addEventListener('abort', () => reject(new DOMException('aborted', 'AbortError')));
          calls.push({
            body: JSON.parse(String(init.body)),
            signal: init.signal!,
            resolve: (free) =>
              resolve(new Response(JSON.stringify({ hours: { free, adiabatic: 0, mechanical: 0, noData: 0, total: free }, energy: {}, water: {} }))),
          });
        });
      }),
    );
  });
  afterEach(() => vi.unstubAllGlobals());

  it('aborts the request for a scenario that was edited again, and shows the newest answer only', async () => {
    const client = new QueryClient({ defaultOptions: { queries: { gcTime: 0 } } });
    const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
    const preview = renderHook(({ scenario }) => useScenarioPreview(7, 3, scenario), { wrapper, initialProps: { scenario: withSupply(24) } });
    await waitFor(() => expect(calls).toHaveLength(1));
    preview.rerender({ scenario: withSupply(20) });
    await waitFor(() => expect(calls).toHaveLength(2));
    expect((calls[1].body.scenario.system as { supplyAirC: number }).supplyAirC).toBe(20);
    // The first request's signal fires once its query has no one watching it.
    await waitFor(() => expect(calls[0].signal.aborted).toBe(true));
    expect(calls[1].signal.aborted).toBe(false);
    await act(async () => calls[1].resolve(60));
    await waitFor(() => expect(preview.result.current.data?.hours.free).toBe(60));
  });
});
