/**
 * The command line on 30 synthetic years with --hourly (issue 14), as whole processes in the same run:
 * - ours: `tramontane-estimate` (the package's bin, the file `npm run estimate` calls);
 * - a straightforward psychrolib re-implementation of the same rules (command-line/psychrolib-estimate.mjs);
 *   target: ours ≤ 0.25× its wall time;
 * - the read-split-parse-write floor (command-line/read-split-parse-write.mjs); target: ours ≤ 1.6× it;
 * - `npm run --silent estimate`, to show what npm adds.
 * Every command gets the same number of passes, taken in turn (ours, re-implementation, floor, npm, ours, …); the
 * figures are medians of the per-pass ratios, of wall time (the targets) and of CPU time (every Node process the command
 * started, summed: steadier than wall time when other work shares the machine). The re-implementation's hourly file is checked against ours hour by hour.
 */
// @ts-nocheck

import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { BENCH_SCENARIO, canonicalCsv, syntheticYears } from './bench-inputs';
import type { BenchContext, BenchSuite } from './suite';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const here = path.dirname(fileURLToPath(import.meta.url));
const PASSES = 3;

interface Timing {
  wallMs: number;
  /** CPU time of every Node process the command started, ms (command-line/report-cpu.cjs). */
  cpuMs: number;
}

/** Wall and CPU time of one command, as whole processes; throws with its stderr when it fails. */
function timed(command: string, args: string[], cpuFile: string): Timing {
  writeFileSync(cpuFile, '');
  const env = {
    ...process.env,
    TRAMONTANE_BENCH_CPU_FILE: cpuFile,
    NODE_OPTIONS: `--require ${JSON.stringify(path.join(here, 'command-line/report-cpu.cjs'))}`,
  };
  const start = performance.now();
  const result = spawnSync(command, args, { cwd: root, encoding: 'utf8', maxBuffer: 64 * 1024 * 1024, env });
  const wallMs = performance.now() - start;
  if (result.status !== 0) throw new Error(`${command} ${args.join(' ')} failed: ${result.stderr}`);
  const cpuMs = readFileSync(cpuFile, 'utf8')
    .split('\n')
    .filter(Boolean)
    .reduce((sum, line) => sum + Number(line), 0);
  return { wallMs, cpuMs };
}

/** Allowed difference per column of the hourly file (its last written digit, or the solvers' tolerance). */
const TOLERANCE: Record<string, number> = {
  dry_bulb_c: 0,
  wet_bulb_c: 0.011,
  dew_point_c: 0.011,
  relative_humidity_pct: 0,
  humidity_ratio_gkg: 0.0011,
  enthalpy_kjkg: 0.011,
  mechanical_fraction: 0.0011,
};

/**
 * Ours against the psychrolib re-implementation, hour by hour: the same times, modes and humidified flags, and every
 * number within its tolerance. One documented exception: where the wet-bulb is within 0.5 K of 0 °C both the ice and the
 * water form of the psychrometric equation have a root; the engine takes the water root (DEVELOPERS.md, "Wet-bulb"),
 * psychrolib the ice root, so those hours' wet-bulbs may differ by up to 0.5 K. Returns how many hours that was.
 */
function compareHourByHour(oursText: string, referenceText: string): { hours: number; wetBulbRootHours: number } {
  const ours = oursText.split('\n');
  const reference = referenceText.split('\n');
  if (ours.length !== reference.length) throw new Error(`hourly files differ in length: ${ours.length} and ${reference.length} lines`);
  if (ours[0] !== reference[0]) throw new Error('hourly files differ in their header');
  const columns = ours[0].split(',');
  let wetBulbRootHours = 0;
  for (let i = 1; i < ours.length; i++) {
    if (ours[i] === reference[i]) continue;
    const a = ours[i].split(',');
    const b = reference[i].split(',');
    for (let k = 0; k < columns.length; k++) {
      const name = columns[k];
      const limit = TOLERANCE[name];
      if (limit === undefined) {
        if (a[k] !== b[k]) throw new Error(`line ${i + 1}, ${name}: ours ${a[k]}, reference ${b[k]}`);
        continue;
      }
      const difference = Math.abs(Number(a[k]) - Number(b[k]));
      if (difference <= limit) continue;
      if (name === 'wet_bulb_c' && Math.abs(Number(a[k])) <= 0.5 && difference <= 0.5) {
        wetBulbRootHours++;
        continue;
      }
      throw new Error(`line ${i + 1}, ${name}: ours ${a[k]}, reference ${b[k]} (allowed ±${limit})`);
    }
  }
  return { hours: ours.length - 2, wetBulbRootHours };
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

async function run({ log }: BenchContext): Promise<Record<string, number | string>> {
  const dir = mkdtempSync(path.join(tmpdir(), 'command-line-bench-'));
  try {
    const weather = path.join(dir, 'weather-30y.csv');
    const scenario = path.join(dir, 'scenario.json');
    const out = (name: string) => path.join(dir, `${name}.csv`);
    writeFileSync(weather, canonicalCsv(syntheticYears(30)));
    writeFileSync(scenario, JSON.stringify(BENCH_SCENARIO));
    const cpuFile = path.join(dir, 'cpu.txt');
    const ours = ['server/cli/estimate-launcher.mjs', '--weather', weather, '--scenario', scenario, '--hourly', out('ours')];
    // a first call builds the bundle if a source changed, and gives the floor its bytes
    timed('node', ours, cpuFile);
    const commands = {
      ours: () => timed('node', ours, cpuFile),
      psychrolib: () => timed('node', [path.join(here, 'command-line/psychrolib-estimate.mjs'), weather, scenario, out('psychrolib')], cpuFile),
      floor: () => timed('node', [path.join(here, 'command-line/read-split-parse-write.mjs'), weather, out('ours'), out('floor')], cpuFile),
      npm: () => timed('npm', ['run', '--silent', 'estimate', '--', '--weather', weather, '--scenario', scenario, '--hourly', out('npm')], cpuFile),
    };
    const passes: Record<keyof typeof commands, Timing[]> = { ours: [], psychrolib: [], floor: [], npm: [] };
    for (let pass = 0; pass < PASSES; pass++) {
      for (const name of Object.keys(commands) as (keyof typeof commands)[]) passes[name].push(commands[name]());
      log(
        `command line pass ${pass + 1}: ${Object.entries(passes)
          .map(([name, t]) => `${name} ${t[pass].wallMs.toFixed(0)} ms wall, ${t[pass].cpuMs.toFixed(0)} ms CPU`)
          .join('; ')}`,
      );
    }
    const times = Object.fromEntries(Object.entries(passes).map(([name, t]) => [name, t.map((x) => x.wallMs)])) as Record<keyof typeof commands, number[]>;
    const cpu = Object.fromEntries(Object.entries(passes).map(([name, t]) => [name, t.map((x) => x.cpuMs)])) as Record<keyof typeof commands, number[]>;
    const oursText = readFileSync(out('ours'), 'utf8');
    if (readFileSync(out('npm'), 'utf8') !== oursText || readFileSync(out('floor'), 'utf8') !== oursText)
      throw new Error('the npm call or the floor wrote other bytes');
    const checked = compareHourByHour(oursText, readFileSync(out('psychrolib'), 'utf8'));
    const ratio = (ours: number[], other: number[]) => median(ours.map((t, k) => t / other[k]));
    const vsPsychrolib = ratio(times.ours, times.psychrolib);
    const vsFloor = ratio(times.ours, times.floor);
    log(
      `command line, 30 years --hourly: ${median(times.ours).toFixed(0)} ms; ${vsPsychrolib.toFixed(2)}× the psychrolib re-implementation (target ≤ 0.25), ` +
        `${vsFloor.toFixed(2)}× the read-split-parse-write floor (target ≤ 1.6); in CPU time ${ratio(cpu.ours, cpu.psychrolib).toFixed(2)}× and ${ratio(cpu.ours, cpu.floor).toFixed(2)}×; ` +
        `npm run adds ${(median(cpu.npm) - median(cpu.ours)).toFixed(0)} ms of CPU; ` +
        `${checked.hours} hours checked against the re-implementation (${checked.wetBulbRootHours} with the wet-bulb's other root near 0 °C)`,
    );
    return {
      'commandLine.ms30y': Math.round(median(times.ours)),
      'commandLine.psychrolibMs30y': Math.round(median(times.psychrolib)),
      'commandLine.floorMs30y': Math.round(median(times.floor)),
      'commandLine.npmRunMs30y': Math.round(median(times.npm)),
      'commandLine.vsPsychrolib': Number(vsPsychrolib.toFixed(2)),
      'commandLine.vsFloor': Number(vsFloor.toFixed(2)),
      'commandLine.cpuMs30y': Math.round(median(cpu.ours)),
      'commandLine.cpuVsPsychrolib': Number(ratio(cpu.ours, cpu.psychrolib).toFixed(2)),
      'commandLine.cpuVsFloor': Number(ratio(cpu.ours, cpu.floor).toFixed(2)),
      'commandLine.npmAddsCpuMs': Math.round(median(cpu.npm) - median(cpu.ours)),
      'commandLine.hoursChecked': checked.hours,
      'commandLine.wetBulbOtherRootHours': checked.wetBulbRootHours,
      'commandLine.passes': PASSES,
    };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

export const suite: BenchSuite = { name: 'command-line', run };
