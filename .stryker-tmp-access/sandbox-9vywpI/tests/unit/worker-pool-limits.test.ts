// @ts-nocheck
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createWorkerPool, TaskTimeLimitError, type WorkerPool } from '../../workers/pool';

let pool: WorkerPool;
beforeAll(() => {
  pool = createWorkerPool({ threads: 1 });
});
afterAll(() => pool.destroy());

/** Ten synthetic years of canonical CSV: a task that takes far longer than a millisecond. */
function tenYears(): string {
  const lines = ['timestamp,dry_bulb_c,relative_humidity_pct'];
  const start = Date.UTC(2001, 0, 1);
  for (let i = 0; i < 87_600; i++) lines.push(`${new Date(start + i * 3_600_000).toISOString().slice(0, 16)}Z,${(10 + (i % 17)).toFixed(1)},60`);
  return lines.join('\n');
}

describe('every pool task has a time limit and can be called off', () => {
  it('stops a task at its time limit, frees the thread and says which task and limit', async () => {
    const text = tenYears();
    const stopped = await pool.run('importClimate', { text, options: {} }, { timeLimitMs: 1 }).catch((e: unknown) => e);
    expect(stopped).toBeInstanceOf(TaskTimeLimitError);
    expect((stopped as Error).message).toBe('The importClimate task was stopped after 0 s, its time limit.');
    // The thread is free again: the same work finishes within the default limit.
    const done = await pool.run('importClimate', { text, options: {} });
    expect(done.ok).toBe(true);
    expect(done.report.counts.hours).toBe(87_600);
    // a ten-year import on a machine shared with other work: allow it time
  }, 60_000);

  it('stops a task when its caller aborts (a closed request), with the caller’s reason rather than a time limit', async () => {
    const controller = new AbortController();
    const running = pool.run('importClimate', { text: tenYears(), options: {} }, { signal: controller.signal }).catch((e: unknown) => e);
    controller.abort(new Error('The client closed the request.'));
    const outcome = await running;
    expect(outcome).toBeInstanceOf(Error);
    expect(outcome).not.toBeInstanceOf(TaskTimeLimitError);
  });
});
