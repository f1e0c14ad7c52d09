/**
 * Operating regions on a grid: every cell's region is what a run gives for that state as an hour (runScenario
 * end to end, not the classifier alone), and the boundaries sit where the rules in README.md put them, with the
 * moisture limits from psychrolib.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import {
  binHours,
  cellCentre,
  cellOf,
  designAtSite,
  hoursPerGridRegion,
  operatingRegionGrid,
  REGION,
  regionOfHour,
  runScenario,
  type Scenario,
  type StateGrid,
} from '../../../shared/scenario';
import { makeScenario, psy, wFromDewPoint, wFromRh } from './fixtures';

const HOUR = 3_600_000;
const grid: StateGrid = { dryBulbMinC: -10, dryBulbStepC: 0.75, nx: 72, humidityRatioMin: 0, humidityRatioStep: 0.0005, ny: 56 };

/** Every cell centre run as one hour of a climate series through runScenario, at the given station pressure. */
function runCellsAsHours(scenario: Scenario, pressurePa: number, elevationM: number): number[] {
  const n = grid.nx * grid.ny;
  const dryBulbC = new Float64Array(n);
  const w = new Float64Array(n);
  for (let j = 0; j < grid.ny; j++) {
    for (let i = 0; i < grid.nx; i++) {
      const c = cellCentre(grid, i, j);
      dryBulbC[j * grid.nx + i] = c.dryBulbC;
      w[j * grid.nx + i] = c.humidityRatio;
    }
  }
  const run = runScenario(
    scenario,
    {
      timestampsMs: Float64Array.from(dryBulbC, (_, k) => Date.UTC(2023, 0, 1) + k * HOUR),
      dryBulbC,
      humidity: { kind: 'humidity-ratio-kgkg', values: w },
      pressurePa: new Float64Array(n).fill(pressurePa),
    },
    { elevationM },
  );
  const c = run.classification;
  return Array.from(c.modes, (mode, k) => regionOfHour(mode, c.humidified[k], c.mechanicalFraction[k]));
}

const designs: Array<[string, Scenario, number]> = [
  ['direct air at sea level', makeScenario('direct-air', { envelope: { dewPointMinC: -9, rhMinPct: 8 } }), 0],
  [
    'direct air at 2,100 m (envelope derated)',
    makeScenario('direct-air', { system: { supplyAirC: 26 }, envelope: { altitudeDerating: { aboveElevationM: 1800, metresPerKelvin: 300 } } }),
    2100,
  ],
  ['indirect air', makeScenario('indirect-air'), 300],
  ['water side, wetted dry cooler', makeScenario('water-side'), 0],
  ['water side, cooling tower', makeScenario('water-side', { system: { heatRejection: 'cooling-tower', approachK: 4 } }), 0],
];

describe('operatingRegionGrid', () => {
  it.each(designs)('gives each cell the region a run gives its centre as an hour (%s)', (_, scenario, elevationM) => {
    const pressurePa = psy.GetStandardAtmPressure(elevationM);
    const regions = operatingRegionGrid(designAtSite(scenario, elevationM), grid, pressurePa);
    const asHours = runCellsAsHours(scenario, pressurePa, elevationM);
    expect(Array.from(regions.regions)).toEqual(asHours);
    // The grid is not trivially one region: at least three regions appear on it.
    expect(new Set(regions.regions).size).toBeGreaterThanOrEqual(3);
  });

  it('puts the direct-air free-cooling edges at the off-coil temperature and at the moisture limits (psychrolib)', () => {
    // Supply 24 °C, 1 K fan heat: free cooling up to 23 °C outdoor; moisture between the limits at the supply.
    const scenario = makeScenario('direct-air', { envelope: { dewPointMinC: -9, rhMinPct: 8 } });
    const p = 101_325;
    const fine: StateGrid = { dryBulbMinC: 15, dryBulbStepC: 0.1, nx: 180, humidityRatioMin: 0, humidityRatioStep: 0.0001, ny: 150 };
    const g = operatingRegionGrid(designAtSite(scenario, 0), fine, p);
    // Upper limit: the smaller of W at 15 °C dew point and W at 24 °C, 70 % RH (ASHRAE 2017 ch. 1 eq. 20, 22 by psychrolib).
    const highW = Math.min(wFromDewPoint(15, p), wFromRh(24, 70, p));
    const lowW = Math.max(wFromDewPoint(-9, p), wFromRh(24, 8, p));
    const at = (t: number, w: number) => g.regions[cellOf(fine, t, w)];
    expect(at(22.95, highW - 0.0003)).toBe(REGION.free);
    expect(at(23.05, highW - 0.0003)).not.toBe(REGION.free);
    expect(at(20, highW - 0.0002)).toBe(REGION.free);
    expect(at(20, highW + 0.0002)).toBe(REGION.partialMechanical);
    expect(at(20, lowW + 0.0002)).toBe(REGION.free);
    expect(at(20, lowW - 0.0002)).toBe(REGION.humidified);
    // Hot and dry: the evaporative stage (ε 0.8) brings 30 °C air with a 15 °C wet-bulb to 18 °C: adiabatic assist.
    expect(at(30, psy.GetHumRatioFromTWetBulb(30, 15, p))).toBe(REGION.adiabatic);
  });

  it('leaves supersaturated states out', () => {
    const g = operatingRegionGrid(designAtSite(makeScenario('direct-air'), 0), grid, 101_325);
    // 10 °C holds at most about 7.7 g/kg at sea level (psychrolib): 20 g/kg there is fog, in no region.
    expect(psy.GetSatHumRatio(10, 101_325)).toBeLessThan(0.008);
    expect(g.regions[cellOf(grid, 10, 0.02)]).toBe(REGION.none);
  });

  it('refuses a grid without cells', () => {
    expect(() => operatingRegionGrid(designAtSite(makeScenario('direct-air'), 0), { ...grid, nx: 0 }, 101_325)).toThrow(RangeError);
  });
});

describe('binHours', () => {
  it('counts hours per cell and per region of their own modes, whatever their number', () => {
    const hours = {
      dryBulbC: Float64Array.from([20.1, 20.2, 20.3, 30, Number.NaN, 80]),
      humidityRatio: Float64Array.from([0.008, 0.008, 0.008, 0.01, 0.01, 0.01]),
      modes: Uint8Array.from([0, 0, 2, 1, 3, 2]),
      mechanicalFraction: Float64Array.from([0, 0, 0.4, 0, 0, 1]),
    };
    const cells = binHours(hours, grid);
    const c = cellOf(grid, 20.1, 0.008);
    expect(cells.hours[c]).toBe(3);
    expect(cells.regionHours![c * 5 + REGION.free]).toBe(2);
    expect(cells.regionHours![c * 5 + REGION.partialMechanical]).toBe(1);
    expect(Array.from(cells.totals!)).toEqual([2, 0, 1, 1, 1]);
    expect(cells.binned).toBe(4);
    expect(cells.outside).toBe(2);
    expect(cells.maxHours).toBe(3);
    expect(cells.hours.length).toBe(grid.nx * grid.ny);
  });

  it('counts hours per region by the grid when their modes are unknown', () => {
    const scenario = makeScenario('direct-air');
    const regions = operatingRegionGrid(designAtSite(scenario, 0), grid, 101_325);
    // 10 °C and 5 g/kg is free cooling, 35 °C and 20 g/kg mechanical (above the 15 °C dew-point limit, psychrolib ≈ 10.7 g/kg).
    const cells = binHours({ dryBulbC: [10, 10, 35], humidityRatio: [0.005, 0.005, 0.02] }, grid);
    expect(Array.from(hoursPerGridRegion(cells, regions))).toEqual([2, 0, 0, 0, 1]);
  });
});
