/**
 * A sweep through the server's own queue (issue 14): 50 setpoints × 10 synthetic years posted to the sweeps API of an
 * app on a one-thread pool and on a two-thread pool, timed from the POST until the queue is idle (every point stored).
 * Each measurement starts the app afresh on the same database — a new pool and queue, as a server restart does — and
 * times its first sweep ("right after a start") and then a second one (warm). One thread and two threads take turns,
 * three times each, the order swapped every round; the figures are medians. Target: two threads ≥ 1.8× one thread.
 * The process's CPU time per warm sweep is given too: on a machine whose cores are taken by other work, two threads
 * cannot run faster than one, and the CPU figures show what the second thread costs beyond the first.
 */
// @ts-nocheck

import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { createApp } from '../../server/app';
import { openDatabase, type Db } from '../../server/db/client';
import { runs } from '../../server/db/schema';
import { createRunQueue } from '../../server/runs/queue';
import { createWorkerPool } from '../../workers/pool';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { BENCH_SCENARIO, canonicalCsv, HOURS_PER_YEAR, syntheticYears } from './bench-inputs';
import type { BenchContext, BenchSuite } from './suite';

const YEARS = 10;
const POINTS = 50;
const ROUNDS = 3;
// 18, 18.25, …, 30.25 °C: 50 points
const AXES = [{ input: 'system.supplyAirC', from: 18, to: 18 + (POINTS - 1) * 0.25, step: 0.25 }];

interface Study {
  db: Db;
  dataDir: string;
  engineer: TestPerson;
  projectId: number;
  scenarioId: number;
  climateFileId: number;
}

/** One database with a site, the 10-year file and the scenario, made through the API of a first app. */
export async function prepareStudy(): Promise<Study> {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'sweep-bench-'));
  const db = openDatabase(path.join(dataDir, 'tramontane.db'));
  const engineer = personWithSession(db, 'bench.engineer@example.test');
  const projectId = projectWithMembers(db, 'Sweep bench', [[engineer, 'engineer']]);
  const pool = createWorkerPool({ threads: 1 });
  try {
    const app = createApp({ db, pool, runQueue: createRunQueue({ db, pool }) });
    const as = asPerson(engineer);
    const site = await request(app).post(`/api/projects/${projectId}/sites`).set(as).send({ name: 'Bench site', elevationM: 100 }).expect(201);
    const file = await request(app)
      .post(`/api/projects/${projectId}/sites/${site.body.site.id}/climate-files?fileName=ten-years.csv`)
      .set(as)
      .set('content-type', 'text/csv')
      .send(canonicalCsv(syntheticYears(YEARS)))
      .expect(201);
    const scenario = await request(app).post(`/api/projects/${projectId}/scenarios`).set(as).send({ scenario: BENCH_SCENARIO }).expect(201);
    return { db, dataDir, engineer, projectId, scenarioId: scenario.body.scenario.id, climateFileId: file.body.climateFile.id };
  } finally {
    await pool.destroy();
  }
}

/** Starts an app on `threads` pool threads and times its first and second sweep, POST to idle, in ms. */
export async function timeStartAndSweeps(study: Study, threads: number): Promise<{ firstMs: number; warmMs: number; warmCpuMs: number; free: number[] }> {
  const { db, engineer, projectId, scenarioId, climateFileId } = study;
  const pool = createWorkerPool({ threads });
  const runQueue = createRunQueue({ db, pool });
  const app = createApp({ db, pool, runQueue });
  const as = asPerson(engineer);
  const sweepOnce = async () => {
    const cpuStart = process.cpuUsage();
    const start = performance.now();
    const res = await request(app).post(`/api/projects/${projectId}/sweeps`).set(as).send({ scenarioId, climateFileId, axes: AXES }).expect(202);
    await runQueue.idle();
    const ms = performance.now() - start;
    const cpu = process.cpuUsage(cpuStart);
    const sweepId = res.body.sweep.id as number;
    const points = db.select({ status: runs.status, resultsJson: runs.resultsJson }).from(runs).where(eq(runs.sweepId, sweepId)).orderBy(runs.id).all();
    if (points.length !== POINTS || points.some((p) => p.status !== 'done')) throw new Error(`sweep ${sweepId}: not every point is done`);
    const free = points.map((p) => (JSON.parse(p.resultsJson!) as { hours: { free: number } }).hours.free);
    await request(app).delete(`/api/projects/${projectId}/sweeps/${sweepId}`).set(as).expect(204);
    return { ms, cpuMs: (cpu.user + cpu.system) / 1000, free };
  };
  try {
    const first = await sweepOnce();
    const warm = await sweepOnce();
    if (first.free.some((f, k) => f !== warm.free[k])) throw new Error('two sweeps of the same points disagree');
    return { firstMs: first.ms, warmMs: warm.ms, warmCpuMs: warm.cpuMs, free: warm.free };
  } finally {
    await runQueue.idle();
    await pool.destroy();
  }
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

async function run({ log }: BenchContext): Promise<Record<string, number | string>> {
  const study = await prepareStudy();
  try {
    const times = {
      1: { first: [] as number[], warm: [] as number[], cpu: [] as number[] },
      2: { first: [] as number[], warm: [] as number[], cpu: [] as number[] },
    };
    let reference: number[] | null = null;
    for (let round = 0; round < ROUNDS; round++) {
      for (const threads of round % 2 === 0 ? [1, 2] : [2, 1]) {
        const measured = await timeStartAndSweeps(study, threads);
        reference ??= measured.free;
        if (measured.free.some((f, k) => f !== reference![k])) throw new Error(`the ${threads}-thread sweep disagrees with the first`);
        times[threads as 1 | 2].first.push(measured.firstMs);
        times[threads as 1 | 2].warm.push(measured.warmMs);
        times[threads as 1 | 2].cpu.push(measured.warmCpuMs);
        log(`sweep round ${round + 1}, ${threads} thread(s): first after start ${measured.firstMs.toFixed(0)} ms, warm ${measured.warmMs.toFixed(0)} ms`);
      }
    }
    const hours = POINTS * YEARS * HOURS_PER_YEAR;
    const oneWarm = median(times[1].warm);
    const twoWarm = median(times[2].warm);
    const oneFirst = median(times[1].first);
    const twoFirst = median(times[2].first);
    log(
      `sweep 50 × 10 years through the queue: two threads ${(oneWarm / twoWarm).toFixed(2)}× one thread warm, ${(oneFirst / twoFirst).toFixed(2)}× right after a start (target ≥ 1.8)`,
    );
    return {
      'sweep.oneThreadMs': Math.round(oneWarm),
      'sweep.twoThreadsMs': Math.round(twoWarm),
      'sweep.twoThreadsSpeedup': Number((oneWarm / twoWarm).toFixed(2)),
      'sweep.oneThreadFirstAfterStartMs': Math.round(oneFirst),
      'sweep.twoThreadsFirstAfterStartMs': Math.round(twoFirst),
      'sweep.twoThreadsSpeedupFirstAfterStart': Number((oneFirst / twoFirst).toFixed(2)),
      'sweep.twoThreadsHoursPerSecond': Math.round((hours / twoWarm) * 1000),
      // CPU time of the whole process (main thread and pool threads) for a warm sweep: what two threads cost beyond one
      'sweep.oneThreadCpuMs': Math.round(median(times[1].cpu)),
      'sweep.twoThreadsCpuMs': Math.round(median(times[2].cpu)),
    };
  } finally {
    study.db.$client.close();
    rmSync(study.dataDir, { recursive: true, force: true });
  }
}

export const suite: BenchSuite = { name: 'sweep', run };
