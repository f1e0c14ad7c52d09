/**
 * What a run page says while its run waits or computes, and after it stopped without results. A run is one task on
 * a worker thread, so there is no fraction done to show: the page says when it started, with no progress bar.
 */
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ComponentProps } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { RunStatus } from '@/features/runs/components/run-status';

type Run = ComponentProps<typeof RunStatus>['run'];

/** Only what the status reads of a run (synthetic). */
const runOf = (fields: Partial<Run>): Run =>
  ({ id: 9001, projectId: 7, status: 'running', error: null, startedAt: '2026-03-02T09:15:07Z', climate: { hours: 8760 }, ...fields }) as Run;

function show(run: Run, canEdit = true) {
  const client = new QueryClient({ defaultOptions: { mutations: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <RunStatus run={run} canEdit={canEdit} />
    </QueryClientProvider>,
  );
}

afterEach(() => vi.unstubAllGlobals());

describe('a run that has not finished', () => {
  it('says it is classifying the hours and when it started, with no progress bar', () => {
    show(runOf({}));
    const status = screen.getByRole('status');
    expect(status.textContent).toBe(`Classifying 8,760 hours…started ${new Date('2026-03-02T09:15:07Z').toLocaleTimeString('en-GB')}`);
    expect(screen.getByText(/^started \d{2}:\d{2}:\d{2}$/)).toBeTruthy();
    expect(screen.queryByRole('progressbar')).toBeNull();
  });

  it('says a queued run waits for a worker, with no start time yet', () => {
    show(runOf({ status: 'queued', startedAt: null }));
    expect(screen.getByRole('status').textContent).toBe('Waiting for a free worker…');
    expect(screen.queryByText(/^started/)).toBeNull();
  });

  it('offers Cancel only to those who may edit', () => {
    show(runOf({}), false);
    expect(screen.queryByRole('button', { name: 'Cancel run' })).toBeNull();
  });

  it('cancels with one POST to the run’s cancel route', async () => {
    const fetchMock = vi.fn(async () => new Response(JSON.stringify({ run: runOf({ status: 'cancelled' }) }), { status: 200 }));
    vi.stubGlobal('fetch', fetchMock);
    show(runOf({}));
    await userEvent.setup().click(screen.getByRole('button', { name: 'Cancel run' }));
    await vi.waitFor(() => expect(fetchMock).toHaveBeenCalledTimes(1));
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/projects/7/runs/9001/cancel');
    expect(init.method).toBe('POST');
  });

  it('shows the server’s reason when the cancel is refused', async () => {
    const refusal = { error: { code: 'conflict', message: 'Run 9001 has already finished.' } };
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => new Response(JSON.stringify(refusal), { status: 409 })),
    );
    show(runOf({}));
    await userEvent.setup().click(screen.getByRole('button', { name: 'Cancel run' }));
    expect(await screen.findByText('Run 9001 has already finished.')).toBeTruthy();
  });
});

describe('a run that stopped without results', () => {
  it('a failed run is an alert carrying the recorded error', () => {
    show(runOf({ status: 'failed', error: 'The run took longer than 600 s and was stopped.' }));
    const alert = screen.getByRole('alert');
    expect(alert.textContent).toContain('The run failed');
    expect(alert.textContent).toContain('The run took longer than 600 s and was stopped.');
    expect(screen.queryByRole('button', { name: 'Cancel run' })).toBeNull();
  });

  it('a cancelled run says so and offers nothing to cancel', () => {
    show(runOf({ status: 'cancelled' }));
    expect(screen.getByRole('note').textContent).toContain('The run was cancelled');
    expect(screen.queryByRole('status')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Cancel run' })).toBeNull();
  });
});
