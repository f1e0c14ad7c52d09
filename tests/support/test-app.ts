import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { createApp, type AppDeps } from '../../server/app';
import { openDatabase, type Db } from '../../server/db/client';
import { createRunQueue, type RunQueue } from '../../server/runs/queue';
import { createWorkerPool, type WorkerPool } from '../../workers/pool';
import { checkJsonAnswers } from './answer-check';

export interface TestApp {
  app: ReturnType<typeof createApp>;
  db: Db;
  pool: WorkerPool;
  runQueue: RunQueue;
  dataDir: string;
  close: () => Promise<void>;
}

/**
 * A fresh app on its own SQLite file in a temporary folder, one per test file. Every JSON answer it gives under /api is
 * checked against its schema in shared/schemas/api (tests/support/answer-check.ts; `answerCheck: undefined` turns it off).
 */
export function createTestApp(overrides: Partial<AppDeps> = {}, poolSize: { threads?: number; interactiveThreads?: number } = { threads: 2 }): TestApp {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'tramontane-test-'));
  const db = openDatabase(path.join(dataDir, 'tramontane.db'));
  const pool = createWorkerPool(poolSize);
  const runQueue = createRunQueue({ db, pool, mailer: overrides.mailer, publicUrl: overrides.publicUrl });
  const app = createApp({ db, pool, runQueue, answerCheck: checkJsonAnswers, ...overrides });
  return {
    app,
    db,
    pool,
    runQueue,
    dataDir,
    close: async () => {
      await runQueue.idle();
      await pool.destroy();
      db.$client.close();
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
