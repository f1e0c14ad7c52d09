/**
 * Read speed and load (issue 15 "Load"): the demo workspace (synthetic; every run done) served by the app in this process, as a browser asks for it (a session cookie, gzip and brotli accepted).
 * - Per request, one keep-alive connection, the reads taken in turn: the project's run listing (what the project
 *   overview shows) and one run with its results, each as a ratio to /api/health in the same run, so the figures
 *   hold on a busy machine: of median wall times, and of mean CPU times (which waiting for a core does not
 *   inflate). "Cold" reads follow a write to the database, so nothing remembered from the previous read can answer
 *   them.
 * - Load: 100 connections for 20 s on the run listing from a worker thread; requests per second, latency
 *   percentiles, timeouts (no answer within 10 s) and errors (any status but 200); then the same on one run and on
 *   /api/health, for each read's throughput as a share of health's.
 */
// @ts-nocheck

import http from 'node:http';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import { and, asc, eq, isNull } from 'drizzle-orm';
import { createApp } from '../../server/app';
import { openDatabase, type Db } from '../../server/db/client';
import { memberships, projects, runs } from '../../server/db/schema';
import { seedDemo } from '../../server/demo/seed';
import { createRunQueue } from '../../server/runs/queue';
import { createWorkerPool } from '../../workers/pool';
import { personWithSession } from '../support/people';
import type { BenchContext, BenchSuite } from './suite';

const WARM_UP_TURNS = 50;
const TIMED_TURNS = 400;
const LOAD_CONNECTIONS = 100;
const LOAD_DURATION_MS = 20_000;
const LOAD_TIMEOUT_MS = 10_000;
/** What Chromium sends with a fetch. */
const BROWSER_ENCODINGS = 'gzip, deflate, br, zstd';

/** What http-load-client.mjs takes and answers. */
interface LoadOptions {
  port: number;
  path: string;
  headers: Record<string, string>;
  connections: number;
  durationMs: number;
  timeoutMs: number;
}
interface LoadOutcome {
  requests: number;
  errors: number;
  timeouts: number;
  bytes: number;
  elapsedMs: number;
  latenciesMs: number[];
}

const median = (values: number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
};
const percentile = (values: number[], p: number) => {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
};

interface DemoServer {
  port: number;
  db: Db;
  cookie: string;
  projectId: number;
  runId: number;
  close: () => Promise<void>;
}

/** The demo workspace in a fresh database, every run finished, served on a free loopback port. */
async function demoServer(log: BenchContext['log']): Promise<DemoServer> {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'load-bench-'));
  const db = openDatabase(path.join(dataDir, 'tramontane.db'));
  const pool = createWorkerPool({ threads: 2 });
  const runQueue = createRunQueue({ db, pool });
  seedDemo(db);
  const started = performance.now();
  const queued = runQueue.resume();
  await runQueue.idle();
  const project = db.select({ id: projects.id }).from(projects).get()!;
  const done = db.select({ id: runs.id, status: runs.status }).from(runs).where(eq(runs.projectId, project.id)).all();
  if (done.length !== queued || done.some((r) => r.status !== 'done')) throw new Error(`demo runs did not all finish: ${JSON.stringify(done)}`);
  log(`load: demo workspace with ${queued} runs done in ${((performance.now() - started) / 1000).toFixed(1)} s`);
  const run = db
    .select({ id: runs.id })
    .from(runs)
    .where(and(eq(runs.projectId, project.id), isNull(runs.sweepId)))
    .orderBy(asc(runs.id))
    .get()!;
  // A viewer: the least a person needs to read both.
  const person = personWithSession(db, 'load-bench@example.test');
  db.insert(memberships).values({ projectId: project.id, userId: person.id, role: 'viewer' }).run();

  const server = createApp({ db, pool, runQueue }).listen(0, '127.0.0.1');
  await new Promise<void>((resolve) => server.once('listening', () => resolve()));
  const address = server.address();
  if (!address || typeof address === 'string') throw new Error('no port');
  return {
    port: address.port,
    db,
    cookie: person.cookie,
    projectId: project.id,
    runId: run.id,
    close: async () => {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await runQueue.idle();
      await pool.destroy();
      db.$client.close();
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

function timedGet(port: number, agent: http.Agent, pathname: string, headers: Record<string, string>): Promise<{ ms: number; bytes: number }> {
  return new Promise((resolve, reject) => {
    const sentAt = performance.now();
    const request = http.get({ host: '127.0.0.1', port, path: pathname, agent, headers }, (response) => {
      let bytes = 0;
      response.on('data', (chunk: Buffer) => {
        bytes += chunk.length;
      });
      response.on('end', () => {
        if (response.statusCode !== 200) reject(new Error(`${pathname} answered ${response.statusCode}`));
        else resolve({ ms: performance.now() - sentAt, bytes });
      });
    });
    request.on('error', reject);
  });
}

interface ReadTarget {
  name: string;
  path: string;
  /** Run before each timed request (not timed). */
  before?: () => void;
}

/**
 * Median per-request time of each target, one connection, the targets taken in turn request by request, so a busy
 * spell of the machine falls on all of them alike (batches per target let it fall on one and skew the ratios).
 */
async function perRequest(s: DemoServer, targets: ReadTarget[]) {
  const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
  const headers = { cookie: s.cookie, 'accept-encoding': BROWSER_ENCODINGS };
  const bytes: Record<string, number> = {};
  const times: Record<string, number[]> = Object.fromEntries(targets.map((t) => [t.name, []]));
  const cpuMs: Record<string, number[]> = Object.fromEntries(targets.map((t) => [t.name, []]));
  for (let turn = 0; turn < WARM_UP_TURNS + TIMED_TURNS; turn++) {
    for (const t of targets) {
      t.before?.();
      const cpuBefore = process.cpuUsage();
      const answer = await timedGet(s.port, agent, t.path, headers);
      const cpu = process.cpuUsage(cpuBefore);
      bytes[t.name] = answer.bytes;
      // The first turns warm up modules, the JIT and the connection.
      if (turn >= WARM_UP_TURNS) {
        times[t.name].push(answer.ms);
        cpuMs[t.name].push((cpu.user + cpu.system) / 1000);
      }
    }
  }
  agent.destroy();
  const ms = (name: string) => median(times[name]);
  const meanCpuMs = (name: string) => cpuMs[name].reduce((sum, v) => sum + v, 0) / cpuMs[name].length;
  return {
    ms,
    /** Median wall time per request, as a share of the reference's. */
    ratioTo: (name: string, reference: string) => ms(name) / ms(reference),
    meanCpuMs,
    /**
     * Mean CPU time of this process per request (server and client sides), as a share of the reference's: on a
     * machine shared with other work, waiting for a core inflates long requests' wall time more than short ones'.
     */
    cpuRatioTo: (name: string, reference: string) => meanCpuMs(name) / meanCpuMs(reference),
    bytes,
  };
}

function loadFromWorker(options: LoadOptions): Promise<LoadOutcome> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(new URL('./http-load-client.mjs', import.meta.url), { workerData: options });
    worker.once('message', (outcome: LoadOutcome) => {
      resolve(outcome);
      void worker.terminate();
    });
    worker.once('error', reject);
  });
}

async function run({ log }: BenchContext): Promise<Record<string, number | string>> {
  const s = await demoServer(log);
  try {
    const overviewPath = `/api/projects/${s.projectId}/runs`;
    const runPath = `/api/projects/${s.projectId}/runs/${s.runId}`;
    // A write that changes nothing a reader sees, as a session touch or another project's edit would.
    const touch = s.db.$client.prepare('UPDATE projects SET name = name WHERE id = ?');
    const write = () => touch.run(s.projectId);
    const warm = await perRequest(s, [
      { name: 'health', path: '/api/health' },
      { name: 'overview', path: overviewPath },
      { name: 'run', path: runPath },
    ]);
    // Apart, so the writes fall only before the cold reads (and the health reads taken in turn with them).
    const cold = await perRequest(s, [
      { name: 'health', path: '/api/health', before: write },
      { name: 'overview', path: overviewPath, before: write },
      { name: 'run', path: runPath, before: write },
    ]);
    log(
      `load: per request (median of ${TIMED_TURNS}, taken in turn): health ${warm.ms('health').toFixed(2)} ms, run listing ${warm.ms('overview').toFixed(2)} ms ` +
        `(${warm.bytes.overview} B on the wire; ${cold.ms('overview').toFixed(2)} ms after a write, health then ${cold.ms('health').toFixed(2)} ms), ` +
        `run ${warm.ms('run').toFixed(2)} ms (${warm.bytes.run} B; ${cold.ms('run').toFixed(2)} ms after a write)`,
    );
    log(
      `load: CPU per request (mean): health ${warm.meanCpuMs('health').toFixed(2)} ms, run listing ${warm.meanCpuMs('overview').toFixed(2)} ms ` +
        `(${cold.meanCpuMs('overview').toFixed(2)} ms after a write), run ${warm.meanCpuMs('run').toFixed(2)} ms (${cold.meanCpuMs('run').toFixed(2)} ms after a write)`,
    );

    const underLoad = async (pathname: string) => {
      const outcome = await loadFromWorker({
        port: s.port,
        path: pathname,
        headers: { cookie: s.cookie, 'accept-encoding': BROWSER_ENCODINGS },
        connections: LOAD_CONNECTIONS,
        durationMs: LOAD_DURATION_MS,
        timeoutMs: LOAD_TIMEOUT_MS,
      });
      const figures = {
        perSecond: (outcome.requests / outcome.elapsedMs) * 1000,
        p50: percentile(outcome.latenciesMs, 50),
        p99: percentile(outcome.latenciesMs, 99),
        timeouts: outcome.timeouts,
        errors: outcome.errors,
      };
      log(
        `load: ${pathname}, ${LOAD_CONNECTIONS} connections for ${LOAD_DURATION_MS / 1000} s: ${figures.perSecond.toFixed(0)} requests/s, ` +
          `p50 ${figures.p50.toFixed(1)} ms, p99 ${figures.p99.toFixed(1)} ms, ${figures.timeouts} timeouts, ${figures.errors} errors`,
      );
      return figures;
    };
    const overviewLoad = await underLoad(overviewPath);
    const runLoad = await underLoad(runPath);
    const healthLoad = await underLoad('/api/health');
    return {
      loadHealthMs: Number(warm.ms('health').toFixed(2)),
      loadOverviewMs: Number(warm.ms('overview').toFixed(2)),
      loadOverviewToHealth: Number(warm.ratioTo('overview', 'health').toFixed(2)),
      loadOverviewColdToHealth: Number(cold.ratioTo('overview', 'health').toFixed(2)),
      loadOverviewCpuToHealth: Number(warm.cpuRatioTo('overview', 'health').toFixed(2)),
      loadOverviewColdCpuToHealth: Number(cold.cpuRatioTo('overview', 'health').toFixed(2)),
      loadOverviewWireBytes: warm.bytes.overview,
      loadRunMs: Number(warm.ms('run').toFixed(2)),
      loadRunToHealth: Number(warm.ratioTo('run', 'health').toFixed(2)),
      loadRunColdToHealth: Number(cold.ratioTo('run', 'health').toFixed(2)),
      loadRunCpuToHealth: Number(warm.cpuRatioTo('run', 'health').toFixed(2)),
      loadRunColdCpuToHealth: Number(cold.cpuRatioTo('run', 'health').toFixed(2)),
      loadRunWireBytes: warm.bytes.run,
      loadOverviewRequestsPerSecond100: Math.round(overviewLoad.perSecond),
      loadOverviewP50Ms100: Number(overviewLoad.p50.toFixed(1)),
      loadOverviewP99Ms100: Number(overviewLoad.p99.toFixed(1)),
      loadOverviewTimeouts100: overviewLoad.timeouts,
      loadOverviewErrors100: overviewLoad.errors,
      loadHealthRequestsPerSecond100: Math.round(healthLoad.perSecond),
      loadOverviewThroughputToHealth: Number((overviewLoad.perSecond / healthLoad.perSecond).toFixed(2)),
      loadRunRequestsPerSecond100: Math.round(runLoad.perSecond),
      loadRunP99Ms100: Number(runLoad.p99.toFixed(1)),
      loadRunTimeouts100: runLoad.timeouts,
      loadRunThroughputToHealth: Number((runLoad.perSecond / healthLoad.perSecond).toFixed(2)),
    };
  } finally {
    await s.close();
  }
}

export const suite: BenchSuite = { name: 'load', run };
