import { describe, expect, it } from 'vitest';
import { pickerViewOptions, runsInView, defaultPickerView } from '@/features/compare/lib/run-picker-view';
import { foldSweepPoints, freeShareText, sweepRowSummary, type FoldableRun } from '@/lib/run-list-folding';
import { runDisplayName, sweepPointParts } from '@/lib/sweep-value';

const words = (point: Parameters<typeof sweepPointParts>[0], system: 'SI' | 'IP') =>
  sweepPointParts(point, system)
    .map((p) => `${p.label} = ${p.value}`)
    .join(', ');

type Status = FoldableRun['status'];
type Run = FoldableRun & { label: string };

/** A run as the list gives it; `free` of 100 hours when done. Newest first is the caller's order. */
function run(id: number, sweep: [number, string] | null, status: Status = 'done', free = 50): Run {
  return {
    id,
    label: `run ${id}`,
    status,
    sweepId: sweep ? sweep[0] : null,
    sweepName: sweep ? sweep[1] : null,
    results: status === 'done' ? { hours: { free, adiabatic: 0, mechanical: 100 - free, noData: 0, total: 100 } } : null,
  } as Run;
}

const setpoints: [number, string] = [7, 'Supply setpoint 18–30 °C'];
const loads: [number, string] = [8, 'IT load'];

describe('folding sweep points in a run list', () => {
  // Newest first, as the API lists them: a plain run, a sweep of 13 points, two plain runs, a sweep of 3, one plain run.
  const list: Run[] = [
    run(30, null),
    ...Array.from({ length: 13 }, (_, i) => run(29 - i, setpoints, i < 2 ? 'running' : i === 2 ? 'failed' : 'done', 10 + 5 * i)),
    run(16, null),
    run(15, null, 'queued'),
    ...Array.from({ length: 3 }, (_, i) => run(14 - i, loads, 'done', 80)),
    run(11, null),
  ];

  it('puts one row per sweep where its newest point sat, keeping the plain runs in order', () => {
    const { entries, hiddenRuns, hiddenSweeps } = foldSweepPoints(list, { runs: 10, sweeps: 5 });
    expect(entries.map((e) => (e.kind === 'run' ? e.run.id : `sweep ${e.sweep.sweepId}`))).toEqual([30, 'sweep 7', 16, 15, 'sweep 8', 11]);
    expect([hiddenRuns, hiddenSweeps]).toEqual([0, 0]);
  });

  it("counts a sweep's points by status and spans its free-cooling share over the finished ones", () => {
    const row = foldSweepPoints(list, { runs: 10, sweeps: 5 }).entries.find((e) => e.kind === 'sweep')!;
    if (row.kind !== 'sweep') throw new Error('expected a sweep row');
    expect(row.sweep).toMatchObject({ name: 'Supply setpoint 18–30 °C', points: 13, done: 10, failed: 1, cancelled: 0, active: 2 });
    expect(row.sweep.lead.id).toBe(29);
    // Done points are i = 3…12, free = 10 + 5i hours of 100: 25 … 70 hours.
    expect(row.sweep.freeShare!.min).toBeCloseTo(0.25, 12);
    expect(row.sweep.freeShare!.max).toBeCloseTo(0.7, 12);
    expect(sweepRowSummary(row.sweep)).toBe('13 points, 10 done, 1 failed, 2 to go');
    expect(freeShareText(row.sweep.freeShare!)).toBe('25–70 % free');
  });

  it("never lets sweep rows take the plain runs' places, and hides sweeps older than the last run shown", () => {
    const { entries, hiddenRuns, hiddenSweeps } = foldSweepPoints(list, { runs: 2, sweeps: 5 });
    // Two plain runs (30, 16) and the sweep between them; sweep 8 and runs 15, 11 are older than run 16.
    expect(entries.map((e) => (e.kind === 'run' ? e.run.id : `sweep ${e.sweep.sweepId}`))).toEqual([30, 'sweep 7', 16]);
    expect([hiddenRuns, hiddenSweeps]).toEqual([2, 1]);
    const capped = foldSweepPoints(list, { runs: 10, sweeps: 1 });
    expect(capped.entries.filter((e) => e.kind === 'sweep')).toHaveLength(1);
    expect(capped.hiddenSweeps).toBe(1);
  });

  it('names a sweep whose name is missing by its id, and says "1 point" in the singular', () => {
    const [entry] = foldSweepPoints([{ ...run(5, [3, 'x']), sweepName: null }], { runs: 10, sweeps: 5 }).entries;
    if (entry.kind !== 'sweep') throw new Error('expected a sweep row');
    expect(entry.sweep.name).toBe('Sweep 3');
    expect(sweepRowSummary(entry.sweep)).toBe('1 point, 1 done');
    expect(freeShareText(entry.sweep.freeShare!)).toBe('50 % free');
  });
});

describe("the compare picker's choice of runs", () => {
  const runs = [run(9, null), run(8, setpoints), run(7, setpoints), run(6, loads), run(5, null)];

  it('offers plain, all, then each sweep, with counts; nothing to choose without sweep points', () => {
    expect(pickerViewOptions(runs)).toEqual([
      { value: 'plain', label: 'Plain runs, sweep points hidden', count: 2 },
      { value: 'all', label: 'All runs, with sweep points', count: 5 },
      { value: 'sweep-7', label: 'Points of sweep Supply setpoint 18–30 °C', count: 2 },
      { value: 'sweep-8', label: 'Points of sweep IT load', count: 1 },
    ]);
    expect(pickerViewOptions([run(1, null)])).toEqual([]);
  });

  it('hides sweep points by default but keeps a ticked one listed', () => {
    expect(defaultPickerView(runs)).toBe('plain');
    expect(runsInView(runs, 'plain', []).map((r) => r.id)).toEqual([9, 5]);
    expect(runsInView(runs, 'plain', [7]).map((r) => r.id)).toEqual([9, 7, 5]);
    expect(runsInView(runs, 'sweep-7', [9]).map((r) => r.id)).toEqual([9, 8, 7]);
    expect(runsInView(runs, 'all', []).map((r) => r.id)).toEqual([9, 8, 7, 6, 5]);
    // Only sweep points finished: list them rather than an empty table.
    expect(defaultPickerView([run(3, loads)])).toBe('all');
  });
});

describe('a sweep point in words', () => {
  it('follows the SI/IP switch for temperatures and keeps kW and effectiveness as they are', () => {
    const point = { 'system.supplyAirC': 24, 'energy.itLoadKw': 1500 };
    expect(words(point, 'SI')).toBe('Supply air setpoint = 24.0 °C, IT load = 1,500 kW');
    // 24 °C × 9/5 + 32 = 75.2 °F (exact, by the definition of the Fahrenheit scale, NIST SP 811).
    expect(words(point, 'IP')).toBe('Supply air setpoint = 75.2 °F, IT load = 1,500 kW');
    expect(sweepPointParts(point, 'IP').map((p) => [p.short, p.value])).toEqual([
      ['supply air', '75.2 °F'],
      ['IT load', '1,500 kW'],
    ]);
    // A temperature difference converts as one: 4 K × 9/5 = 7.2 °F (exact), no 32 °F offset.
    expect(words({ 'system.approachK': 4 }, 'IP')).toBe('Approach = 7.2 Δ°F');
    expect(words({ 'system.evaporativeEffectiveness': 0.85 }, 'IP')).toBe('Evaporative effectiveness = 0.85');
  });

  it('names an envelope preset by its label and skips an input it does not know', () => {
    const text = words({ 'envelope.presetId': 'ashrae-2021-a2', 'system.unknown': 3 } as never, 'SI');
    expect(text).toBe('Inlet envelope preset = Allowable A2 (2021)');
    expect(text).not.toContain('unknown');
  });
});

describe("a sweep point's run name as shown", () => {
  it("writes the point's values again in the reader's units; other names stay as they are", () => {
    const point = { 'system.supplyAirC': 24 };
    // 24 °C × 9/5 + 32 = 75.2 °F (exact).
    expect(runDisplayName('Direct air, A1 · supply air 24 °C', point, 'IP')).toBe('Direct air, A1 · supply air 75.2 °F');
    expect(runDisplayName('Direct air, A1 · supply air 24 °C', point, 'SI')).toBe('Direct air, A1 · supply air 24.0 °C');
    expect(runDisplayName('Direct air, A1', null, 'IP')).toBe('Direct air, A1');
  });
});
