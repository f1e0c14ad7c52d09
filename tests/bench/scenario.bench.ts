/**
 * Scenario engine speed (issue #5):
 * - one scenario over a 30-year synthetic series, in hours per second (states, classification,
 *   energy, results), and the hourly CSV writer on the same hours;
 * - the command line itself on a 30-year canonical CSV writing the hourly CSV, wall time (target < 1 s);
 * - a 50-setpoint sweep over 10 years, one thread against the worker pool, and the speed-up.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { importClimateText } from '../../shared/climate';
import { hourlyCsvInput, parseScenario, runScenario, writeHourlyCsv, type Scenario, type ScenarioInput, type ScenarioSeries } from '../../shared/scenario';
import { createWorkerPool } from '../../workers/pool';
import { syntheticSeries, type SyntheticClimate } from '../unit/scenario/synthetic-climate';
import type { BenchContext, BenchSuite } from './suite';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const HOURS_PER_YEAR = 8760;

// Temperate synthetic climate (invented); arrays shared with the pool threads.
const TEMPERATE: SyntheticClimate = { name: 'temperate (synthetic)', elevationM: 100, meanC: 12, seasonalK: 11, dailyK: 5, rhMean: 68, rhSpread: 30 };
const syntheticYears = (years: number) => syntheticSeries(TEMPERATE, { hours: years * HOURS_PER_YEAR, seed: 5, shared: true });

function canonicalCsv(series: ScenarioSeries): string {
  const lines = ['timestamp,dry_bulb_c,relative_humidity_pct'];
  for (let i = 0; i < series.dryBulbC.length; i++) {
    lines.push(`${new Date(series.timestampsMs[i]).toISOString().slice(0, 16)}Z,${series.dryBulbC[i].toFixed(1)},${series.humidity.values[i].toFixed(0)}`);
  }
  return `${lines.join('\n')}\n`;
}

const SCENARIO_INPUT: ScenarioInput = {
  name: 'bench direct air',
  elevationM: 100,
  envelope: { dryBulbMinC: 18, dryBulbMaxC: 27, dewPointMinC: -9, dewPointMaxC: 15, rhMinPct: 0, rhMaxPct: 70 },
  system: { kind: 'direct-air', supplyAirC: 24, itDeltaTK: 12, evaporativeEffectiveness: 0.8 },
  // Engine 1.0.0 ran this bench with fanHeatK 1 and copSlopePerK −0.08; fanPowerFraction 1/12 is its migration.
  energy: { itLoadKw: 1000, mechanicalCop: 4, fanPowerFraction: 1 / 12 },
};

function scenarioWithSupply(supplyAirC: number): Scenario {
  const parsed = parseScenario({ ...SCENARIO_INPUT, system: { ...SCENARIO_INPUT.system, supplyAirC } });
  if (!parsed.ok) throw new Error(parsed.errors.join('; '));
  return parsed.scenario;
}

const best = (times: number[]) => Math.min(...times);

function timeOneScenario(log: BenchContext['log']) {
  const series = syntheticYears(30);
  const n = series.dryBulbC.length;
  const scenario = scenarioWithSupply(24);
  const runTimes: number[] = [];
  const csvTimes: number[] = [];
  let csvBytes = 0;
  for (let round = 0; round < 3; round++) {
    const start = performance.now();
    const run = runScenario(scenario, series);
    runTimes.push(performance.now() - start);
    const csvStart = performance.now();
    csvBytes = 0;
    writeHourlyCsv(hourlyCsvInput(series, run), (bytes) => {
      csvBytes += bytes.length;
    });
    csvTimes.push(performance.now() - csvStart);
  }
  log(`scenario: 30 years (${n} h) in ${best(runTimes).toFixed(0)} ms; hourly CSV ${(csvBytes / 1e6).toFixed(1)} MB in ${best(csvTimes).toFixed(0)} ms`);
  return { series, scenarioRunMs30y: best(runTimes), scenarioHoursPerSecond: (n / best(runTimes)) * 1000, hourlyCsvMs30y: best(csvTimes) };
}

/** The importer, the engine and the CSV writer in one process, as the command line chains them. */
function timePipeline(text: string, log: BenchContext['log']) {
  const start = performance.now();
  const imported = importClimateText(text);
  const importedAt = performance.now();
  if (!imported.series) throw new Error(`bench weather did not import: ${imported.report.summary}`);
  runScenario(scenarioWithSupply(24), imported.series);
  const ranAt = performance.now();
  log(`pipeline in process: import ${(importedAt - start).toFixed(0)} ms, run ${(ranAt - importedAt).toFixed(0)} ms`);
  return { importMs30y: importedAt - start };
}

function timeCommandLine(csvText: string, log: BenchContext['log']) {
  const dir = mkdtempSync(path.join(tmpdir(), 'scenario-bench-'));
  try {
    const weather = path.join(dir, 'weather-30y.csv');
    const scenarioFile = path.join(dir, 'scenario.json');
    const hourly = path.join(dir, 'hourly.csv');
    writeFileSync(weather, csvText);
    writeFileSync(scenarioFile, JSON.stringify(SCENARIO_INPUT));
    const times: number[] = [];
    for (let round = 0; round < 2; round++) {
      const start = performance.now();
      const result = spawnSync('npm', ['run', '--silent', 'estimate', '--', '--weather', weather, '--scenario', scenarioFile, '--hourly', hourly], {
        cwd: root,
        encoding: 'utf8',
      });
      times.push(performance.now() - start);
      if (result.status !== 0) throw new Error(`estimate failed: ${result.stderr}`);
    }
    const rows = readFileSync(hourly, 'utf8').split('\n').length - 2;
    log(`command line, 30 years with --hourly (${rows} rows): ${best(times).toFixed(0)} ms wall (target < 1000 ms)`);
    return { estimateCli30ySeconds: best(times) / 1000 };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

async function timeSweep(log: BenchContext['log']) {
  const series = syntheticYears(10);
  const n = series.dryBulbC.length;
  const setpoints = Array.from({ length: 50 }, (_, k) => 18 + (k * 14) / 49);
  const scenarios = setpoints.map(scenarioWithSupply);

  const singleStart = performance.now();
  const single = scenarios.map((scenario) => runScenario(scenario, series).results.hours.free);
  const singleMs = performance.now() - singleStart;

  const pool = createWorkerPool({ threads: availableParallelism() });
  try {
    // Warm every thread before timing: its loader and modules, and enough runs for the JIT to settle, as the
    // one-thread reference above is warm from the 30-year runs (one run per thread left the pool ~30 % slow).
    await Promise.all(scenarios.slice(0, pool.threads * 6).map((scenario) => pool.run('executeRun', { scenario, series })));
    const poolStart = performance.now();
    const pooled = await Promise.all(scenarios.map((scenario) => pool.run('executeRun', { scenario, series })));
    const poolMs = performance.now() - poolStart;
    if (pooled.some((out, k) => out.results.hours.free !== single[k])) throw new Error('pool and single-thread sweeps disagree');
    const hours = n * scenarios.length;
    log(`sweep: 50 setpoints × 10 years, one thread ${singleMs.toFixed(0)} ms, pool of ${pool.threads} ${poolMs.toFixed(0)} ms`);
    return {
      sweepSingleThreadHoursPerSecond: (hours / singleMs) * 1000,
      sweepPoolHoursPerSecond: (hours / poolMs) * 1000,
      sweepPoolSpeedup: singleMs / poolMs,
      sweepPoolThreads: pool.threads,
    };
  } finally {
    await pool.destroy();
  }
}

async function run({ log }: BenchContext): Promise<Record<string, number | string>> {
  const one = timeOneScenario(log);
  const text = canonicalCsv(one.series);
  const pipeline = timePipeline(text, log);
  const cli = timeCommandLine(text, log);
  const sweep = await timeSweep(log);
  return {
    scenarioHoursPerSecond: Math.round(one.scenarioHoursPerSecond),
    scenarioRunMs30y: Math.round(one.scenarioRunMs30y),
    hourlyCsvMs30y: Math.round(one.hourlyCsvMs30y),
    importMs30y: Math.round(pipeline.importMs30y),
    estimateCli30ySeconds: Number(cli.estimateCli30ySeconds.toFixed(2)),
    sweepSingleThreadHoursPerSecond: Math.round(sweep.sweepSingleThreadHoursPerSecond),
    sweepPoolHoursPerSecond: Math.round(sweep.sweepPoolHoursPerSecond),
    sweepPoolSpeedup: Number(sweep.sweepPoolSpeedup.toFixed(2)),
    sweepPoolThreads: sweep.sweepPoolThreads,
  };
}

export const suite: BenchSuite = { name: 'scenario', run };
