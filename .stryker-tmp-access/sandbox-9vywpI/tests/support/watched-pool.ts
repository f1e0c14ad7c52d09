// @ts-nocheck
import type { PoolRunOptions, TaskName, WorkerPool } from '../../workers/pool';

export interface TaskCall {
  task: TaskName;
  options: PoolRunOptions;
  /** Resolves when the real task has finished on its thread (before the hold, if any, is released). */
  computed: Promise<void>;
}

/**
 * A pool that passes every task to the real one and lets a test watch and hold them: `started(task)` resolves
 * with the call when the task is handed to the pool; while `hold(task)` is on, its result is kept back until
 * `release(task)`, so a test can check what the server does while that work is in flight without timing anything.
 */
export function watchedPool(real: WorkerPool) {
  const calls: TaskCall[] = [];
  const waiters: Array<{ task: TaskName; resolve: (call: TaskCall) => void }> = [];
  const conditions: Array<{ holds: (calls: TaskCall[]) => boolean; resolve: () => void }> = [];
  const holds = new Map<TaskName, { promise: Promise<void>; release: () => void }>();
  const pool: WorkerPool = {
    get threads() {
      return real.threads;
    },
    get interactiveThreads() {
      return real.interactiveThreads;
    },
    destroy: () => real.destroy(),
    run: (async (task: TaskName, input: never, options: PoolRunOptions = {}) => {
      let computedResolve!: () => void;
      const call: TaskCall = { task, options, computed: new Promise((r) => (computedResolve = r)) };
      calls.push(call);
      for (const w of waiters.filter((x) => x.task === task)) {
        waiters.splice(waiters.indexOf(w), 1);
        w.resolve(call);
      }
      for (const c of conditions.filter((x) => x.holds(calls))) {
        conditions.splice(conditions.indexOf(c), 1);
        c.resolve();
      }
      const hold = holds.get(task)?.promise;
      try {
        return await real.run(task, input, options);
      } finally {
        computedResolve();
        await hold;
      }
    }) as WorkerPool['run'],
  };
  return {
    pool,
    calls,
    started: (task: TaskName) =>
      new Promise<TaskCall>((resolve) => {
        waiters.push({ task, resolve });
      }),
    /** Resolves once the calls made so far satisfy `holds` (at once if they already do). */
    whenCalls: (holds: (calls: TaskCall[]) => boolean) =>
      new Promise<void>((resolve) => {
        if (holds(calls)) resolve();
        else conditions.push({ holds, resolve });
      }),
    hold(task: TaskName) {
      let release!: () => void;
      const promise = new Promise<void>((r) => (release = r));
      holds.set(task, { promise, release });
    },
    release(task: TaskName) {
      holds.get(task)?.release();
      holds.delete(task);
    },
  };
}
