// @ts-nocheck
import type { Server } from 'node:http';
import { loadEnv } from './env';
import { openDatabase } from './db/client';
import { prepareStoredData } from './start-up';
import { createApp } from './app';
import { appRoot, clientDistFolder } from './paths';
import { createWorkerPool } from '../workers/pool';
import { createRunQueue } from './runs/queue';
import { startAuthRuntime } from './auth/runtime';
import { BYTES_PER_MB } from './storage/quota';

async function main(): Promise<void> {
  const env = loadEnv();
  const db = openDatabase(env.databaseFile);
  const { seeded, migratedScenarios, migratedSweeps, skipped, requeuedDemoRuns } = prepareStoredData(db, { demo: env.TRAMONTANE_DEMO });
  if (migratedScenarios + migratedSweeps > 0)
    console.log(`Brought ${migratedScenarios} saved scenario(s) and ${migratedSweeps} sweep base(s) up to the current inputs`);
  if (skipped.length > 0) console.log(`Left unreadable scenario JSON as it was: ${skipped.join(', ')}`);
  if (requeuedDemoRuns > 0) console.log(`Queued ${requeuedDemoRuns} demo run(s) again for the current engine`);
  const pool = createWorkerPool({ threads: env.TRAMONTANE_WORKERS });

  let devMiddleware;
  let closeVite = async () => {};
  if (env.NODE_ENV === 'development') {
    const { createServer } = await import('vite');
    const vite = await createServer({ root: appRoot, server: { middlewareMode: true }, appType: 'spa' });
    devMiddleware = vite.middlewares;
    closeVite = () => vite.close();
  }

  const auth = await startAuthRuntime(env, (line) => console.log(line));
  const runQueue = createRunQueue({ db, pool, mailer: auth.deps.mailer, publicUrl: auth.deps.publicUrl, logError: (e) => console.error(e) });
  const resumed = runQueue.resume();
  if (resumed > 0) console.log(`Resuming ${resumed} run(s) left pending`);

  const app = createApp({
    db,
    pool,
    runQueue,
    clientDist: clientDistFolder,
    devMiddleware,
    adminEmails: env.TRAMONTANE_ADMIN_EMAILS,
    storageLimitBytes: env.TRAMONTANE_PROJECT_STORAGE_MB * BYTES_PER_MB,
    ...auth.deps,
  });
  const server: Server = app.listen(env.PORT, env.HOST, () => {
    const address = server.address();
    const port = typeof address === 'object' && address ? address.port : env.PORT;
    console.log(
      `Tramontane (${env.NODE_ENV}${env.TRAMONTANE_DEMO ? ', demo mode' : ''}) on http://localhost:${port}  data: ${env.TRAMONTANE_DATA_DIR}${seeded ? '  (demo data loaded)' : ''}`,
    );
  });

  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`${signal}: stopping`);
    server.close();
    server.closeIdleConnections();
    await Promise.allSettled([pool.destroy(), closeVite(), auth.close()]);
    db.$client.close();
    process.exit(0);
  };
  process.on('SIGTERM', () => void stop('SIGTERM'));
  process.on('SIGINT', () => void stop('SIGINT'));
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
