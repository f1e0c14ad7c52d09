import { createRequire } from 'node:module';
import { render as renderUi, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { UnitSystemProvider } from '@/lib/unit-system';
import { ModeHoursPanel } from '@/features/runs/components/mode-hours-panel';
import { EnergyWaterCards } from '@/features/runs/components/energy-water-cards';
import { ModeHoursTable, WaterTable } from '@/features/reports/components/results-tables';
import { mixedEngineNote, subsetHours } from '../../shared/report/mode-subsets';
import { comparisonRows, runSummaryRows, shapeReportRun, type ReportRunSource } from '../../shared/report';
import { ENGINE_VERSION, runScenario, type ScenarioResults } from '../../shared/scenario';
import { makeScenario } from '../unit/scenario/fixtures';

const psychrolib = createRequire(import.meta.url)('psychrolib');
psychrolib.SetUnitSystem(psychrolib.SI);

const US_GALLON_L = 3.785411784; // NIST SP 811 (2008), App. B: 1 US gallon = 3.785 411 784 L exactly.

/** Ten synthetic days (demo data, not a station), one state per day: two cold dry days, then warmer and warmer. */
const DAYS = [
  [-5, 30],
  [2, 20],
  [10, 40],
  [18, 50],
  [22, 60],
  [26, 50],
  [29, 40],
  [32, 30],
  [35, 20],
  [38, 15],
] as const;

function syntheticRun(): ScenarioResults {
  const n = 24 * DAYS.length;
  const t0 = Date.UTC(2024, 0, 1);
  return runScenario(makeScenario('direct-air', {}), {
    timestampsMs: Float64Array.from({ length: n }, (_, i) => t0 + i * 3_600_000),
    dryBulbC: Float64Array.from({ length: n }, (_, i) => DAYS[Math.floor(i / 24)][0]),
    humidity: { kind: 'relative-humidity-pct', values: Float64Array.from({ length: n }, (_, i) => DAYS[Math.floor(i / 24)][1]) },
    pressurePa: null,
  }).results;
}

/** The same results as an engine-1.0.0 run stored them: no subset counts, no water split. */
function asOldRun(results: ScenarioResults): ScenarioResults {
  const strip = <T extends object>(row: T) => {
    const { humidified: _h, partialMechanical: _p, ...rest } = row as T & { humidified?: number; partialMechanical?: number };
    return rest as T;
  };
  const { humidificationL: _a, evaporativeCoolingL: _b, driftL: _c, ...water } = results.water;
  return {
    ...results,
    hours: strip(results.hours),
    hoursByMonth: results.hoursByMonth.map(strip),
    hoursByYear: results.hoursByYear.map(strip),
    water: water as ScenarioResults['water'],
  };
}

const results = syntheticRun();
const directAir = makeScenario('direct-air').system;

afterEach(() => localStorage.clear());

/** Renders in the person's unit system, remembered as the app remembers it. */
function render(ui: React.ReactNode, units: 'SI' | 'IP' = 'SI') {
  localStorage.setItem('tramontane.unitSystem', units);
  return renderUi(<UnitSystemProvider>{ui}</UnitSystemProvider>);
}
const text = (testId: string) => screen.queryByTestId(testId)?.textContent ?? '';

describe('the engine’s counts on the synthetic days', () => {
  it('humidifies exactly the two days drier than the envelope’s lowest dew point, and economises part of the mechanical hours', () => {
    // Dew points by psychrolib (the reference library): −5 °C at 30 % and 2 °C at 20 % lie near −19 °C, below the
    // recommended range's −9 °C (ASHRAE TC 9.9, 2021, recalled from memory); 10 °C at 40 % lies near −3 °C, above it.
    expect(psychrolib.GetTDewPointFromRelHum(-5, 0.3)).toBeLessThan(-9);
    expect(psychrolib.GetTDewPointFromRelHum(2, 0.2)).toBeLessThan(-9);
    expect(psychrolib.GetTDewPointFromRelHum(10, 0.4)).toBeGreaterThan(-9);
    expect(results.hours.humidified).toBe(48);
    expect(results.hours.partialMechanical).toBeGreaterThan(0);
    expect(results.hours.partialMechanical).toBeLessThanOrEqual(results.hours.mechanical);
    expect(results.water.humidificationL).toBeGreaterThan(0);
  });
});

describe('"of which" rows on the run page', () => {
  it('show the humidified and partly economised hours under their modes, with their shares', () => {
    render(<ModeHoursPanel results={results} engineVersion={ENGINE_VERSION} />);
    const h = results.hours;
    expect(text('subset-humidified')).toBe(`of which with humidification${h.humidified.toLocaleString('en')}${((100 * h.humidified) / h.total).toFixed(1)} %`);
    expect(text('subset-partialMechanical')).toContain(h.partialMechanical.toLocaleString('en'));
    // The rows sit right after their mode's row.
    const rows = within(screen.getByTestId('mode-hours'))
      .getAllByRole('rowheader')
      .map((th) => th.textContent);
    expect(rows.slice(0, 6)).toEqual([
      'Free cooling',
      'of which with humidification',
      'Adiabatic assist',
      'Mechanical',
      'of which partly economised',
      'No data',
    ]);
    expect(screen.queryByTestId('not-counted-note')).toBeNull();
  });

  it('give the water for humidification and for evaporative cooling in m³ (SI) and US gallons (IP)', () => {
    const w = results.water;
    const si = render(<EnergyWaterCards results={results} engineVersion={ENGINE_VERSION} system={directAir} />, 'SI');
    expect(text('water-humidificationL')).toBe(
      `of which for humidification${(w.humidificationL / 1000).toLocaleString('en', { minimumFractionDigits: 2, maximumFractionDigits: 2 })} m³`,
    );
    expect(text('water-evaporativeCoolingL')).toContain(
      `${(w.evaporativeCoolingL / 1000).toLocaleString('en', { minimumFractionDigits: 2, maximumFractionDigits: 2 })} m³`,
    );
    si.unmount();
    render(<EnergyWaterCards results={results} engineVersion={ENGINE_VERSION} system={directAir} />, 'IP');
    const gallons = Math.round(w.humidificationL / US_GALLON_L).toLocaleString('en');
    expect(text('water-humidificationL')).toBe(`of which for humidification${gallons} US gal`);
    // The two parts make up the evaporated water.
    expect(w.humidificationL + w.evaporativeCoolingL).toBeCloseTo(w.evaporatedL, 6);
  });

  it('are the same numbers in the report and the summary CSV, per month and per year', () => {
    render(
      <>
        <ModeHoursTable results={results} engineVersion={ENGINE_VERSION} />
        <WaterTable results={results} unitSystem="IP" engineVersion={ENGINE_VERSION} />
      </>,
      'IP',
    );
    expect(text('report-mode-hours')).toContain(`of which with humidification${results.hours.humidified.toLocaleString('en')}`);
    expect(text('report-water')).toContain(`of which for humidification${Math.round(results.water.humidificationL / US_GALLON_L).toLocaleString('en')} US gal`);
    const rows = runSummaryRows(shapeReportRunLike({ id: 3, engineVersion: ENGINE_VERSION }));
    const figure = (name: string) => rows.find((r) => r.figure === name)?.value;
    expect(figure('Free cooling: of which with humidification')).toBe(results.hours.humidified);
    expect(figure('Mechanical: of which partly economised')).toBe(results.hours.partialMechanical);
    expect(figure('Jan: Free cooling: of which with humidification')).toBe(subsetHours(results.hoursByMonth[0], 'humidified'));
    expect(figure('2024: Mechanical: of which partly economised')).toBe(results.hoursByYear[0].partialMechanical);
  });
});

describe('a run made before these were counted', () => {
  const old = asOldRun(results);

  it('shows — with a note naming the engine that made it, on the run page', () => {
    render(<ModeHoursPanel results={old} engineVersion="scenario-engine 1.0.0" />);
    expect(text('subset-humidified')).toBe('of which with humidification—');
    expect(text('subset-partialMechanical')).toBe('of which partly economised—');
    expect(text('not-counted-note')).toContain('the engine that made this run (scenario-engine 1.0.0) did not count');
    // Its modes are shown as they were.
    expect(text('mode-hours')).toContain(results.hours.free.toLocaleString('en'));
  });

  it('shows — for its water split, in IP too, and in the report', () => {
    render(
      <>
        <EnergyWaterCards results={old} engineVersion="scenario-engine 1.0.0" system={directAir} />
        <ModeHoursTable results={old} engineVersion="scenario-engine 1.0.0" />
      </>,
      'IP',
    );
    expect(text('water-humidificationL')).toBe('of which for humidification—');
    expect(text('water-evaporativeCoolingL')).toBe('of which for evaporative cooling—');
    expect(screen.queryByTestId('water-driftL')).toBeNull();
    expect(text('report-not-counted')).toContain('scenario-engine 1.0.0');
  });

  it('is compared with — against a new run, and the comparison says the engines differ', () => {
    const a = { ...shapeReportRunLike({ id: 1, engineVersion: 'scenario-engine 1.0.0' }), results: old };
    const b = { ...shapeReportRunLike({ id: 2, engineVersion: ENGINE_VERSION }), results };
    const humidified = comparisonRows([a, b], 1).find((r) => r.key === 'humidified')!;
    expect(humidified).toMatchObject({ notInOldRuns: true, part: true });
    expect(humidified.cells).toEqual([
      { runId: 1, value: null, difference: null },
      { runId: 2, value: results.hours.humidified, difference: null },
    ]);
    expect(mixedEngineNote([a, b])).toContain(`scenario-engine 1.0.0: run 1; ${ENGINE_VERSION}: run 2`);
    expect(mixedEngineNote([b, { ...b, id: 4 }])).toBeNull();
  });
});

/** A report run with only what the summaries read beside the results (names and the engine). */
function shapeReportRunLike(source: Pick<ReportRunSource, 'id' | 'engineVersion'>) {
  const scenario = makeScenario('direct-air', {});
  return shapeReportRun({
    id: source.id,
    engineVersion: source.engineVersion,
    createdAt: new Date(Date.UTC(2026, 0, 1)),
    finishedAt: null,
    scenario,
    sweepPoint: null,
    climate: {
      name: 'Synthetic ten days',
      sha256: '0'.repeat(64),
      hours: 240,
      firstHourMs: 0,
      lastHourMs: 0,
      site: { name: 'Invented site', elevationM: 0, timeZone: 'UTC' },
      elevationM: 0,
      utcOffsetMinutes: 0,
    },
    results,
    file: null,
    siteNow: null,
  });
}
