/**
 * Scenario engine speed (issue #5): one scenario over a 30-year synthetic series, in hours per second (states,
 * classification, energy, results), the hourly CSV writer on the same hours, and the importer on their canonical CSV.
 * The command line as a whole is command-line.bench.ts; a sweep through the run queue is sweep.bench.ts.
 */
// @ts-nocheck

import { importClimateText } from '../../shared/climate';
import { hourlyCsvInput, parseScenario, runScenario, writeHourlyCsv, type Scenario } from '../../shared/scenario';
import { BENCH_SCENARIO, canonicalCsv, syntheticYears } from './bench-inputs';
import type { BenchContext, BenchSuite } from './suite';

function scenarioWithSupply(supplyAirC: number): Scenario {
  const parsed = parseScenario({ ...BENCH_SCENARIO, system: { ...BENCH_SCENARIO.system, supplyAirC } });
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

async function run({ log }: BenchContext): Promise<Record<string, number | string>> {
  const one = timeOneScenario(log);
  const text = canonicalCsv(one.series);
  const pipeline = timePipeline(text, log);
  return {
    scenarioHoursPerSecond: Math.round(one.scenarioHoursPerSecond),
    scenarioRunMs30y: Math.round(one.scenarioRunMs30y),
    hourlyCsvMs30y: Math.round(one.hourlyCsvMs30y),
    importMs30y: Math.round(pipeline.importMs30y),
  };
}

export const suite: BenchSuite = { name: 'scenario', run };
