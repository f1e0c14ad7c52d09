import { availableParallelism } from 'node:os';
import { pathToFileURL } from 'node:url';
import { Piscina } from 'piscina';
import type * as tasks from './tasks';
import { freshBundle } from './fresh-bundle.mjs';

type Tasks = typeof tasks;

/**
 * Longest one pool task may run before it is stopped and its thread freed: far above any real task (a 99-year run
 * or import takes seconds), so only a stuck or hostile input meets it. A caller's own signal (a closed request)
 * stops a task sooner.
 */
export const TASK_TIME_LIMIT_MS = 120_000;

/** A pool task stopped at its time limit. */
export class TaskTimeLimitError extends Error {
  constructor(
    readonly task: string,
    readonly timeLimitMs: number,
  ) {
    super(`The ${task} task was stopped after ${Math.round(timeLimitMs / 1000)} s, its time limit.`);
  }
}

/** Set to true by esbuild in the production server bundle (server/build.mjs); undefined when run from source. */
declare const __TRAMONTANE_BUNDLE__: boolean | undefined;

/**
 * The production bundle's threads run dist/workers.cjs, built beside it; from source, a bundle built when stale.
 * CommonJS, not an ES module: piscina loads a thread's file with require() first, and Node 20's require() of an ES
 * module can abort the whole process with a V8 fatal error ("Module::IsGraphAsync must be used on an instantiated
 * module") when threads start and stop in quick succession, as they do under cancels, time limits and restarts.
 */
function workerBundleUrl(): string {
  if (typeof __TRAMONTANE_BUNDLE__ !== 'undefined') return new URL('./workers.cjs', import.meta.url).href;
  return pathToFileURL(freshBundle({ entry: 'workers/dispatch.ts', name: 'workers', format: 'cjs' }).file).href;
}
export type TaskName = keyof Tasks;

/**
 * Which queue a task waits in. `long`: imports, runs, sweeps, projections — work a person starts and then waits
 * for. `interactive`: what a page needs to draw or a person is looking at now (previews, a file's hours and
 * summary, downloads) — its own few threads, so it never waits behind a queue of long work.
 */
export type PoolLane = 'long' | 'interactive';

export interface PoolRunOptions {
  transferList?: Transferable[];
  /** Stops the task (and frees its thread) when aborted: pass closedRequestSignal(res) for work done for one request. */
  signal?: AbortSignal;
  timeLimitMs?: number;
  /** Default `long`. */
  lane?: PoolLane;
}

export interface WorkerPool {
  /** Runs one task on a pool thread; typed arrays named in transferList move without a copy. */
  run<K extends TaskName>(task: K, input: Parameters<Tasks[K]>[0], options?: PoolRunOptions): Promise<Awaited<ReturnType<Tasks[K]>>>;
  /** Threads of the long lane (the run queue runs at most this many runs at once). */
  readonly threads: number;
  /** Threads of the interactive lane. */
  readonly interactiveThreads: number;
  destroy(): Promise<void>;
}

/** The interactive lane's size when not given: a quarter of the long lane's threads, at least 1 and at most 2. */
export function defaultInteractiveThreads(longThreads: number): number {
  return Math.max(1, Math.min(2, Math.floor(longThreads / 4)));
}

/**
 * How the pool's threads are kept, in one place (another pool for interactive work takes the same settings with its
 * own thread count):
 * - `execArgv: []`: the threads run a plain-JavaScript bundle, so they start without the parent's flags (under the
 *   tsx command line those are tsx's loader hooks, which every thread would otherwise load before its first task);
 * - every thread starts with the pool and stays up (`minThreads` = `maxThreads`), so the first sweep after a
 *   start already runs on all of them instead of waiting for a second thread to boot mid-sweep;
 * - `idleTimeout` only matters for threads above `minThreads` (none here); kept long so a pool configured with
 *   fewer warm threads still keeps them between the runs of a queue.
 */
export function poolSettings(threads: number) {
  return { minThreads: threads, maxThreads: threads, idleTimeout: 10 * 60_000, execArgv: [] as string[] };
}

/**
 * The worker pool. Every thread loads one bundle of workers/dispatch.ts and the tasks it names, built by
 * esbuild when a source changed (workers/fresh-bundle.mjs): threads start quickly and run plain JavaScript,
 * the same way in development, tests and production. (Loading TypeScript in each thread through tsx made a
 * 50-run sweep on two threads 10–20 % slower than the same bundle.)
 * To add a task: write workers/<task>.ts (a thin wrapper over shared/) and export it from workers/tasks.ts.
 * Two lanes, each its own piscina over the same bundle: `long` (`threads`, one per core by default) and a small
 * `interactive` one, so a preview or a page's data never queues behind a batch of imports or runs.
 */
export function createWorkerPool(options: { threads?: number; interactiveThreads?: number } = {}): WorkerPool {
  const threads = options.threads && options.threads > 0 ? options.threads : availableParallelism();
  const interactiveThreads = options.interactiveThreads && options.interactiveThreads > 0 ? options.interactiveThreads : defaultInteractiveThreads(threads);
  const filename = workerBundleUrl();
  const lanes: Record<PoolLane, Piscina> = {
    long: new Piscina({ filename, ...poolSettings(threads) }),
    interactive: new Piscina({ filename, ...poolSettings(interactiveThreads) }),
  };
  return {
    threads,
    interactiveThreads,
    run: async (task, input, { transferList, signal, timeLimitMs = TASK_TIME_LIMIT_MS, lane = 'long' } = {}) => {
      // One controller for the time limit and the caller's signal, joined by hand: AbortSignal.timeout and
      // AbortSignal.any cost more per task than the main thread should spend on each point of a sweep.
      const stop = new AbortController();
      let timedOut = false;
      const timer = setTimeout(() => {
        timedOut = true;
        stop.abort(new DOMException(`The ${task} task reached its time limit.`, 'TimeoutError'));
      }, timeLimitMs);
      timer.unref();
      const passOn = () => stop.abort(signal!.reason);
      if (signal?.aborted) passOn();
      else signal?.addEventListener('abort', passOn, { once: true });
      try {
        return await lanes[lane].run({ task, input }, { transferList: transferList as never, signal: stop.signal });
      } catch (error) {
        if (timedOut && !signal?.aborted) throw new TaskTimeLimitError(task, timeLimitMs);
        throw error;
      } finally {
        clearTimeout(timer);
        signal?.removeEventListener('abort', passOn);
      }
    },
    destroy: async () => {
      await Promise.all([lanes.long.destroy(), lanes.interactive.destroy()]);
    },
  };
}
