import { availableParallelism } from 'node:os';
import { Piscina } from 'piscina';
import type * as tasks from './tasks';

type Tasks = typeof tasks;
export type TaskName = keyof Tasks;

export interface WorkerPool {
  /** Runs one task on a pool thread; typed arrays named in transferList move without a copy. */
  run<K extends TaskName>(
    task: K,
    input: Parameters<Tasks[K]>[0],
    options?: { transferList?: Transferable[]; signal?: AbortSignal },
  ): Promise<Awaited<ReturnType<Tasks[K]>>>;
  readonly threads: number;
  destroy(): Promise<void>;
}

/**
 * The worker pool. Every thread loads workers/entry.mjs, which registers tsx and loads workers/tasks.ts,
 * so the task files stay TypeScript everywhere and there is no separate build of workers/.
 * To add a task: write workers/<task>.ts (a thin wrapper over shared/) and export it from workers/tasks.ts.
 */
export function createWorkerPool(options: { threads?: number } = {}): WorkerPool {
  const threads = options.threads && options.threads > 0 ? options.threads : availableParallelism();
  const piscina = new Piscina({
    filename: new URL('./entry.mjs', import.meta.url).href,
    minThreads: 1,
    maxThreads: threads,
    idleTimeout: 60_000,
  });
  return {
    threads,
    run: (task, input, { transferList, signal } = {}) =>
      piscina.run({ task, input }, { transferList: transferList as never, signal }),
    destroy: () => piscina.destroy(),
  };
}
