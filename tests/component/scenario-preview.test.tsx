import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act } from 'react';
import { createRoot, type Root } from 'react-dom/client';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { useScenarioPreview } from '@/features/scenarios/api/preview-scenario';
import { newScenarioValues } from '@/features/scenarios/utils/scenario-form';
import { scenarioSchema, type Scenario } from '../../shared/scenario/schema';

(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;

const base = scenarioSchema.parse(newScenarioValues);
/** Waits for a condition inside act, so the query's state updates on the way are flushed as React expects. */
const settle = (check: () => void) => act(async () => vi.waitFor(check));

const withSupply = (supplyAirC: number): Scenario => ({
  ...base,
  system: { ...(base.system as Extract<Scenario['system'], { kind: 'direct-air' }>), supplyAirC },
});

describe('the quick preview while editing', () => {
  let host: HTMLDivElement;
  let root: Root;
  let calls: { body: { scenario: Scenario }; signal: AbortSignal; resolve: (hours: number) => void }[];
  let shown: () => number | undefined;

  function Probe({ scenario }: { scenario: Scenario }) {
    const preview = useScenarioPreview(7, 3, scenario);
    shown = () => preview.data?.hours.free;
    return null;
  }

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
    host = document.createElement('div');
    root = createRoot(host);
  });
  afterEach(() => {
    act(() => root.unmount());
    vi.unstubAllGlobals();
  });

  it('aborts the request for a scenario that was edited again, and shows the newest answer only', async () => {
    const client = new QueryClient({ defaultOptions: { queries: { gcTime: 0 } } });
    const render = (scenario: Scenario) =>
      act(() =>
        root.render(
          <QueryClientProvider client={client}>
            <Probe scenario={scenario} />
          </QueryClientProvider>,
        ),
      );
    render(withSupply(24));
    await settle(() => expect(calls).toHaveLength(1));
    render(withSupply(20));
    await settle(() => expect(calls).toHaveLength(2));
    expect((calls[1].body.scenario.system as { supplyAirC: number }).supplyAirC).toBe(20);
    // The first request's signal fires once its query has no one watching it.
    await settle(() => expect(calls[0].signal.aborted).toBe(true));
    expect(calls[1].signal.aborted).toBe(false);
    await act(async () => calls[1].resolve(60));
    await settle(() => expect(shown()).toBe(60));
  });
});
