import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import type { RunListing } from '@/lib/api/runs';
import { compareRuns as compareResults, comparisonCsv, withResults } from '../../../shared/report/comparison';
import { formatMetric } from '@/lib/metric-text';
import { coolingLoadText, formatQuantity, toDisplay } from '@/lib/quantity';
import { DRY_BULB_BIN_GRIDS, dryBulbBins } from '../../../shared/report/dry-bulb-bins';
import { engineNoteText } from '@/lib/engine-notes';
import { solveState } from '@/features/calculator/lib/state-request';
import { stateRows } from '@/features/calculator/lib/state-rows';

const psychrolib = createRequire(import.meta.url)('psychrolib');
psychrolib.SetUnitSystem(psychrolib.SI);

function run(id: number, free: number, mechanical: number, partialPue: number, annualCoolingKwh: number): RunListing {
  return {
    id,
    projectId: 1,
    scenarioId: 1,
    createdBy: null,
    startedAt: '2026-12-01T00:01:00Z',
    climateFileId: 1,
    status: 'done',
    progress: 1,
    error: null,
    sweepId: null,
    sweepName: null,
    sweepPoint: null,
    engineVersion: 'scenario-engine 1.0.0',
    finishedAt: '2026-12-01T00:05:00Z',
    createdAt: '2026-12-01T00:00:00Z',
    // Only the fields the compare page reads; the rest of the scenario and climate snapshot is left out.
    scenario: { name: `Scenario ${id}`, system: { kind: 'direct-air' } } as RunListing['scenario'],
    climate: { name: 'synthetic', hours: 100, site: { name: 'Site' } } as RunListing['climate'],
    results: {
      hours: { free, adiabatic: 100 - free - mechanical, mechanical, noData: 0, total: 100, humidified: 0, partialMechanical: 0 },
      energy: {
        itKwh: 1000,
        fanKwh: 0,
        compressorKwh: 0,
        pumpKwh: 0,
        basinHeaterKwh: 0,
        coolingKwh: 0,
        partialPue,
        annual: { itKwh: 0, fanKwh: 0, compressorKwh: 0, pumpKwh: 0, basinHeaterKwh: 0, coolingKwh: annualCoolingKwh },
      },
      water: { evaporatedL: 0, humidificationL: 0, evaporativeCoolingL: 0, driftL: 0, blowdownL: 0, totalL: 0, annualL: 0, wueLPerKwh: 0 },
      peakMechanicalLoadKw: mechanical * 10,
      excursions: { hours: 0, lowHumidityHours: 0, supplyAboveMaxHours: 0, supplyBelowMinHours: 0, longestRunHours: 0 },
    },
  };
}

/** As the compare page does: runs without results are left out. */
const compareRuns = (list: RunListing[], baselineId: number) => compareResults(withResults(list), baselineId);

describe('comparing runs against a baseline', () => {
  const runs = [run(1, 80, 10, 1.1, 400_000), run(2, 60, 30, 1.25, 500_000), { ...run(3, 0, 0, 1, 0), status: 'running' as const, results: null }];

  it('gives each figure and its difference from the baseline, absolute and in per cent', () => {
    const rows = compareRuns(runs, 1);
    const free = rows.find((r) => r.metric.key === 'free')!;
    // Runs without results are left out.
    expect(free.cells.map((c) => c.runId)).toEqual([1, 2]);
    expect(free.cells[0]).toMatchObject({ value: 80, difference: null, differencePct: null, verdict: 'none' });
    expect(free.cells[1]).toMatchObject({ value: 60, difference: -20, verdict: 'worse' });
    expect(free.cells[1].differencePct).toBeCloseTo(-25, 12);
    const ppue = rows.find((r) => r.metric.key === 'ppue')!;
    expect(ppue.cells[1].difference).toBeCloseTo(0.15, 12);
    expect(ppue.cells[1].verdict).toBe('worse');
    const cooling = rows.find((r) => r.metric.key === 'coolingPerYear')!;
    expect(cooling.cells[1].differencePct).toBeCloseTo(25, 12);
  });

  it('turns the verdicts round when the baseline changes', () => {
    const rows = compareRuns(runs, 2);
    const mechanical = rows.find((r) => r.metric.key === 'mechanical')!;
    expect(mechanical.cells.find((c) => c.runId === 1)).toMatchObject({ difference: -20, verdict: 'better' });
  });

  it('writes the comparison as CSV with units, values and differences', () => {
    const csv = comparisonCsv(withResults(runs), 1, 'SI', (r) => `${r.scenario.name} at 24 °C`).split('\n');
    expect(csv[0]).toBe(
      'figure,unit,run 1 (baseline): Scenario 1 at 24 °C / synthetic,run 1 difference,run 2: Scenario 2 at 24 °C / synthetic,run 2 difference',
    );
    expect(csv[1]).toBe('Engine version,,scenario-engine 1.0.0,,scenario-engine 1.0.0,');
    expect(csv[2]).toBe('Free cooling,h,80,,60,-20');
    // Energy in kWh to 0.1 kWh, as the metric list gives it (shared/metrics.ts).
    expect(csv).toContain('"Cooling total per 8,760 h",kWh,400000,,500000,100000');
  });

  it('gives no percentage on a near-zero base, and small energies in kWh (issue 17: "0.0 MWh → 1.0 MWh, +2356.3 %")', () => {
    // 42.5 kWh of cooling per 8,760 h against 1,044 kWh: a percentage of so small a base says nothing.
    const small = [run(1, 80, 0, 1.0, 42.5), run(2, 80, 3, 1.001, 1044)];
    const cooling = compareRuns(small, 1).find((r) => r.metric.key === 'coolingPerYear')!;
    expect(cooling.cells[1].difference).toBeCloseTo(1001.5, 9);
    expect(cooling.cells[1].differencePct).toBeNull();
    // Mechanical hours 0 → 3: no percentage either (floor: a day of hours).
    expect(compareRuns(small, 1).find((r) => r.metric.key === 'mechanical')!.cells[1].differencePct).toBeNull();
    expect(formatMetric(cooling.metric, 'SI', 42.5)).toBe('43 kWh');
    expect(formatMetric(cooling.metric, 'SI', 1044)).toBe('1.0 MWh');
    expect(formatMetric(cooling.metric, 'SI', 1001.5, { signed: true })).toBe('+1.0 MWh');
    expect(formatMetric(cooling.metric, 'SI', -1001.5, { signed: true })).toBe('-1.0 MWh');
    expect(formatMetric(cooling.metric, 'SI', 0.4)).toBe('0.4 kWh');
    // A difference that rounds to nothing carries no sign.
    expect(formatMetric('mechanical', 'SI', 0.2, { signed: true })).toBe('0 h');
  });

  it('falls back to the first finished run when the baseline is not among them', () => {
    expect(compareRuns(runs, 99)[0].cells[0].difference).toBeNull();
    expect(compareRuns([], 1)).toEqual([]);
  });
});

describe('the air-state calculator', () => {
  it('gives the full state from dry-bulb and RH at an elevation, as psychrolib does', () => {
    const out = solveState({ basis: 'elevation', basisText: '0', properties: { dryBulbC: '30', rhPct: '50' }, saturated: false }, 'SI');
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    // psychrolib GetTWetBulbFromRelHum(30, 0.5, 101 325) = 22.005 °C.
    expect(out.state.wetBulbC).toBeCloseTo(psychrolib.GetTWetBulbFromRelHum(30, 0.5, 101_325), 2);
    expect(out.state.pressurePa).toBeCloseTo(101_325, 6);
  });

  it('reads IP inputs: 86 °F and 29.921 inHg are 30 °C and 101.32 kPa', () => {
    const out = solveState({ basis: 'pressure', basisText: '29.921', properties: { dryBulbC: '86', rhPct: '50' }, saturated: false }, 'IP');
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.state.dryBulbC).toBeCloseTo(30, 12);
    // 1 inHg = 3386.389 Pa (NIST SP 811, 2008, App. B).
    expect(out.state.pressurePa).toBeCloseTo(29.921 * 3386.38864, 3);
  });

  it('passes on the engine’s refusal of too few or too many properties', () => {
    const few = solveState({ basis: 'elevation', basisText: '0', properties: { dryBulbC: '30' }, saturated: false }, 'SI');
    expect(few).toMatchObject({ ok: false, problem: 'under-determined' });
    const many = solveState({ basis: 'elevation', basisText: '0', properties: { dryBulbC: '30', rhPct: '50', dewPointC: '10' }, saturated: false }, 'SI');
    expect(many).toMatchObject({ ok: false, problem: 'over-determined' });
    if (!many.ok) expect(many.message).toContain('moist air has three independent properties');
    const saturated = solveState({ basis: 'elevation', basisText: '0', properties: { dryBulbC: '20' }, saturated: true }, 'SI');
    expect(saturated.ok && saturated.state.rhPct).toBeCloseTo(100, 6);
  });

  it('names a box that is not a number', () => {
    expect(solveState({ basis: 'elevation', basisText: '0', properties: { dryBulbC: 'warm', rhPct: '50' }, saturated: false }, 'SI')).toMatchObject({
      ok: false,
      message: 'Dry-bulb is not a number.',
    });
  });

  it('reports dew point and RH over liquid water and gives the frost point apart, only below 0 °C', () => {
    // −5 °C with a −10 °C dew point over water (WMO-No. 8). Its vapour pressure, 286.56 Pa (Hyland–Wexler eq. 6 at −10 °C,
    // ASHRAE 2017 ch. 1), saturates over ice at −8.90 °C: psychrolib's sub-zero "dew point" is that frost point.
    const out = solveState({ basis: 'elevation', basisText: '0', properties: { dryBulbC: '-5', dewPointC: '-10' }, saturated: false }, 'SI');
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.state.dewPointC).toBeCloseTo(-10, 4);
    expect(out.state.frostPointC).toBeCloseTo(psychrolib.GetTDewPointFromHumRatio(-5, out.state.humidityRatio, out.state.pressurePa), 2);
    const rows = Object.fromEntries(stateRows(out.state, 'SI').map((r) => [r.label, r.value]));
    expect(rows['Dew point (over water)']).toMatch(/^−?-?10\.0/);
    expect(rows['Frost point (over ice)']).toMatch(/8\.9/);
    // In IP: −8.90 °C is 15.98 °F.
    expect(Object.fromEntries(stateRows(out.state, 'IP').map((r) => [r.label, r.value]))['Frost point (over ice)']).toMatch(/16\.0 °F/);
    const warm = solveState({ basis: 'elevation', basisText: '0', properties: { dryBulbC: '30', rhPct: '50' }, saturated: false }, 'SI');
    if (warm.ok) expect(Object.fromEntries(stateRows(warm.state, 'SI').map((r) => [r.label, r.value]))['Frost point (over ice)']).toBe('— (only below 0 °C)');
  });
});

describe('engine notes follow the unit switch (issue 17 defect 6)', () => {
  it('writes the supply-above-envelope note with the plain input name, in °F in IP', () => {
    const note = "supplyAirC 28 °C is above the envelope's maximum dry-bulb 27 °C (derated for 1400 m): every hour is an excursion.";
    // 28 °C × 9/5 + 32 = 82.4 °F; 27 °C = 80.6 °F; 1,400 m / 0.3048 = 4,593 ft (exact factors).
    expect(engineNoteText(note, 'IP')).toBe(
      "The supply setpoint 82.4 °F is above the envelope's maximum dry-bulb 80.6 °F (derated for the site's 4,593 ft): every hour is an excursion.",
    );
    expect(engineNoteText(note, 'SI')).toBe(
      "The supply setpoint 28.0 °C is above the envelope's maximum dry-bulb 27.0 °C (derated for the site's 1,400 m): every hour is an excursion.",
    );
    expect(engineNoteText('12 hours have no usable data and are counted as no data.', 'IP')).toBe('12 hours have no usable data and are counted as no data.');
  });
});

describe('IP that is whole (issue 17 defect 6)', () => {
  it('gives a cooling load in tons of refrigeration and kBtu/h in IP, kW alone in SI', () => {
    // 1 ton of refrigeration = 12,000 Btu/h = 3.516 852 842 kW; 1 kW = 3.412 141 6 kBtu/h (NIST SP 811, 2008, App. B).
    expect(coolingLoadText(1000, 'SI')).toBe('1,000 kW');
    expect(coolingLoadText(1000, 'IP')).toBe('1,000 kW (284 tons of refrigeration, 3,412 kBtu/h)');
  });

  it('bins IP dry-bulb in 5 °F bins with whole-degree edges, not 3.6 °F bins', () => {
    // 21.1 °C is 70 °F, 23.9 °C is 75 °F, 26.7 °C is 80 °F (°F = 1.8 °C + 32, exact).
    const dryBulbC = Float64Array.from([21.2, 21.5, 23.8, 24.0]);
    const { bins } = dryBulbBins([0, 0, 0, 2], dryBulbC, dryBulbC, DRY_BULB_BIN_GRIDS.IP.widthK, DRY_BULB_BIN_GRIDS.IP.originC);
    const edgesF = bins.map((b) => [
      Math.round(toDisplay('temperature', 'IP', b.fromC) * 1e6) / 1e6,
      Math.round(toDisplay('temperature', 'IP', b.toC) * 1e6) / 1e6,
    ]);
    expect(edgesF).toEqual([
      [75, 80],
      [70, 75],
    ]);
    expect(bins.map((b) => b.total)).toEqual([1, 3]);
  });

  it('writes a temperature difference as Δ°F', () => {
    expect(formatQuantity('temperatureDifference', 'IP', 12)).toBe('21.6 Δ°F');
  });
});

describe('calculator errors follow the unit switch (issue 17 defect 6)', () => {
  it('names the inputs plainly and gives the values in °F in IP', () => {
    // 86 °F = 30 °C and 77 °F = 25 °C (°F = 1.8 °C + 32, exact): a dew point above the dry-bulb is supersaturated.
    const out = solveState({ basis: 'elevation', basisText: '0', properties: { dryBulbC: '77', dewPointC: '86' }, saturated: false }, 'IP');
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.message).toContain('dew point = 86.0 °F is above dry-bulb = 77.0 °F');
    expect(out.message).not.toMatch(/dewPointC|°C/);
  });
});
