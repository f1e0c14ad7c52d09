/**
 * Turns at the write lock among the pool threads that store runs (server/runs/write-turn.ts): a waiting thread is
 * woken when the holder's write ends, a turn is freed even when its write throws, and a turn left held by a stopped
 * thread is taken over after the wait limit instead of blocking every later write.
 */
import { Worker } from 'node:worker_threads';
import { describe, expect, it } from 'vitest';
import { createWriteTurn, withWriteTurn } from '../../server/runs/write-turn';

/** A thread that takes the turn, says so in `log[0]`, writes 1 into `log[1]` after `holdMs`, then gives the turn back. */
function holderThread(turn: Int32Array, log: Int32Array, holdMs: number): Worker {
  const source = `
    const { workerData } = require('node:worker_threads');
    const { turn, log, holdMs } = workerData;
    while (Atomics.compareExchange(turn, 0, 0, 1) !== 0) Atomics.wait(turn, 0, 1);
    Atomics.store(log, 0, 1);
    Atomics.notify(log, 0);
    Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, holdMs);
    Atomics.store(log, 1, 1);
    Atomics.store(turn, 0, 0);
    Atomics.notify(turn, 0, 1);
  `;
  return new Worker(source, { eval: true, workerData: { turn, log, holdMs } });
}

describe('a turn at the write lock', () => {
  it('waits for the thread that holds it and writes as soon as that write ends', async () => {
    const turn = createWriteTurn();
    const log = new Int32Array(new SharedArrayBuffer(8));
    const holder = holderThread(turn, log, 200);
    const exited = new Promise((resolve) => holder.once('exit', resolve));
    // wait until the other thread holds the turn
    while (Atomics.load(log, 0) === 0) Atomics.wait(log, 0, 0, 50);
    const seenByWrite = withWriteTurn(turn, () => Atomics.load(log, 1), 10_000);
    // the write ran after the holder had finished its own, not beside it
    expect(seenByWrite).toBe(1);
    expect(Atomics.load(turn, 0)).toBe(0);
    await exited;
  });

  it('is given back when the write throws, and returns what the write returns', () => {
    const turn = createWriteTurn();
    expect(() =>
      withWriteTurn(turn, () => {
        throw new Error('disk full');
      }),
    ).toThrow('disk full');
    expect(Atomics.load(turn, 0)).toBe(0);
    expect(withWriteTurn(turn, () => 42)).toBe(42);
  });

  it('is taken over when its holder never gives it back (a thread stopped mid-write)', () => {
    const turn = createWriteTurn();
    Atomics.store(turn, 0, 1);
    const start = performance.now();
    expect(withWriteTurn(turn, () => 'written', 30)).toBe('written');
    expect(performance.now() - start).toBeGreaterThanOrEqual(25);
    expect(Atomics.load(turn, 0)).toBe(0);
  });

  it('writes at once without a turn', () => {
    expect(withWriteTurn(undefined, () => 'alone')).toBe('alone');
  });
});
