/**
 * Operating regions of a design: which outdoor states the scenario runs in free cooling, humidified free
 * cooling, adiabatic assist, partial mechanical or full mechanical. Found by evaluating the engine's own
 * classifier (classify.ts) on a grid of dry-bulb × humidity ratio at one pressure, so a region's boundary
 * is exactly where the classifier changes its answer (to within a grid cell). Typed arrays, one pass.
 */
// @ts-nocheck

import { bulkStates } from '../psychrometrics';
import { classifyHours, MODE, type ClassifierPlant, type InletLimits } from './classify';
import type { SingleSystem } from './schema';

/** Region codes, in the order tables list them; `none` for supersaturated states and cells outside the grid. */
export const REGION = { free: 0, humidified: 1, adiabatic: 2, partialMechanical: 3, mechanical: 4, none: 255 } as const;
export type RegionCode = (typeof REGION)[Exclude<keyof typeof REGION, 'none'>];
export const REGION_KEYS = ['free', 'humidified', 'adiabatic', 'partialMechanical', 'mechanical'] as const;
export type RegionKey = (typeof REGION_KEYS)[number];

/**
 * The region of one classified hour: a mechanical hour whose compressors carry less than the whole load is
 * partial mechanical; a free-cooling hour whose evaporative stage only adds moisture is humidified.
 * `none` for an hour without data.
 */
export function regionOfHour(mode: number, humidified: number, mechanicalFraction: number): number {
  if (mode === MODE.free) return humidified ? REGION.humidified : REGION.free;
  if (mode === MODE.adiabatic) return REGION.adiabatic;
  if (mode === MODE.mechanical) return mechanicalFraction < 1 ? REGION.partialMechanical : REGION.mechanical;
  return REGION.none;
}

/** A regular grid over dry-bulb (°C) and humidity ratio (kg/kg): nx × ny cells, cell (i, j) at index j·nx + i. */
export interface StateGrid {
  dryBulbMinC: number;
  dryBulbStepC: number;
  nx: number;
  humidityRatioMin: number;
  humidityRatioStep: number;
  ny: number;
}

export interface OperatingRegionGrid extends StateGrid {
  pressurePa: number;
  /** One REGION code per cell, for the state at the cell's centre. */
  regions: Uint8Array;
}

export interface DesignForRegions {
  system: SingleSystem;
  /** Envelope limits with the dry-bulb maximum already derated for the site's altitude. */
  limits: InletLimits;
  plant: ClassifierPlant;
}

/** Dry-bulb, °C, and humidity ratio, kg/kg, at the centre of cell (i, j). */
export function cellCentre(grid: StateGrid, i: number, j: number): { dryBulbC: number; humidityRatio: number } {
  return { dryBulbC: grid.dryBulbMinC + (i + 0.5) * grid.dryBulbStepC, humidityRatio: grid.humidityRatioMin + (j + 0.5) * grid.humidityRatioStep };
}

/** The cell index holding a state, or −1 outside the grid or for NaN. A state on an inner edge belongs to the cell above it. */
export function cellOf(grid: StateGrid, dryBulbC: number, humidityRatio: number): number {
  const i = Math.floor((dryBulbC - grid.dryBulbMinC) / grid.dryBulbStepC);
  const j = Math.floor((humidityRatio - grid.humidityRatioMin) / grid.humidityRatioStep);
  if (!(i >= 0 && i < grid.nx && j >= 0 && j < grid.ny)) return -1;
  return j * grid.nx + i;
}

function checkGrid(grid: StateGrid): void {
  for (const key of ['nx', 'ny'] as const) {
    if (!(Number.isInteger(grid[key]) && grid[key] > 0 && grid[key] <= 4096))
      throw new RangeError(`${key} must be a whole number from 1 to 4096 (got ${grid[key]})`);
  }
  if (!(grid.dryBulbStepC > 0)) throw new RangeError(`dryBulbStepC must be above 0 (got ${grid.dryBulbStepC})`);
  if (!(grid.humidityRatioStep > 0)) throw new RangeError(`humidityRatioStep must be above 0 (got ${grid.humidityRatioStep})`);
  if (!Number.isFinite(grid.dryBulbMinC)) throw new RangeError(`dryBulbMinC must be a number (got ${grid.dryBulbMinC})`);
  if (!(grid.humidityRatioMin >= 0)) throw new RangeError(`humidityRatioMin must be 0 or above (got ${grid.humidityRatioMin})`);
}

/** The moist-air state at every cell centre at one pressure: what the classifier reads. Depends on the grid only, so a chart computes it once and reuses it while the design changes. */
export interface GridStates extends StateGrid {
  pressurePa: number;
  dryBulbC: Float64Array;
  humidityRatio: Float64Array;
  /** NaN for a supersaturated centre. */
  wetBulbC: Float64Array;
}

/** Every cell centre's state at pressurePa (wet-bulb by ASHRAE Handbook—Fundamentals 2017 ch. 1 eq. 33/35 through bulkStates). */
export function gridStates(grid: StateGrid, pressurePa: number): GridStates {
  checkGrid(grid);
  const { nx, ny } = grid;
  const n = nx * ny;
  const dryBulbC = new Float64Array(n);
  const humidityRatio = new Float64Array(n);
  for (let j = 0, k = 0; j < ny; j++) {
    const w = grid.humidityRatioMin + (j + 0.5) * grid.humidityRatioStep;
    for (let i = 0; i < nx; i++, k++) {
      dryBulbC[k] = grid.dryBulbMinC + (i + 0.5) * grid.dryBulbStepC;
      humidityRatio[k] = w;
    }
  }
  const states = bulkStates({ dryBulbC, humidity: { kind: 'humidity-ratio-kgkg', values: humidityRatio }, pressurePa });
  return {
    dryBulbMinC: grid.dryBulbMinC,
    dryBulbStepC: grid.dryBulbStepC,
    nx,
    humidityRatioMin: grid.humidityRatioMin,
    humidityRatioStep: grid.humidityRatioStep,
    ny,
    pressurePa,
    dryBulbC,
    humidityRatio,
    wetBulbC: states.wetBulbC,
  };
}

/**
 * The design's region at the centre of every grid cell: each centre classified as an hour by classifyHours at
 * the grid's pressure. Supersaturated centres are REGION.none. Pass a StateGrid and a pressure, or GridStates
 * already computed for them (the wet-bulb solve is most of the time, and it does not depend on the design).
 */
export function operatingRegionGrid(design: DesignForRegions, grid: StateGrid | GridStates, pressurePa?: number): OperatingRegionGrid {
  const states = 'wetBulbC' in grid && (pressurePa === undefined || pressurePa === grid.pressurePa) ? grid : gridStates(grid, requirePressure(pressurePa));
  const n = states.nx * states.ny;
  const c = classifyHours(
    design.system,
    design.limits,
    { dryBulbC: states.dryBulbC, wetBulbC: states.wetBulbC, humidityRatio: states.humidityRatio, pressurePa: states.pressurePa },
    design.plant,
  );
  const regions = new Uint8Array(n);
  for (let k = 0; k < n; k++) regions[k] = regionOfHour(c.modes[k], c.humidified[k], c.mechanicalFraction[k]);
  const { dryBulbMinC, dryBulbStepC, nx, humidityRatioMin, humidityRatioStep, ny } = states;
  return { dryBulbMinC, dryBulbStepC, nx, humidityRatioMin, humidityRatioStep, ny, pressurePa: states.pressurePa, regions };
}

function requirePressure(pressurePa: number | undefined): number {
  if (pressurePa === undefined) throw new RangeError('pressurePa is needed with a StateGrid');
  return pressurePa;
}

/** Hours in each cell and, per cell, how many of them ran in each region (REGION_KEYS order), plus the uncounted. */
export interface CellHours extends StateGrid {
  /** Hours per cell. */
  hours: Uint32Array;
  /** Hours per cell and region: index cell·5 + region code (only when the hours carry their modes). */
  regionHours: Uint32Array | null;
  /** Hours per region over the whole series (REGION_KEYS order), from the hours' own modes; null without modes. */
  totals: Uint32Array | null;
  /** Hours with a state inside the grid. */
  binned: number;
  /** Hours with a state outside the grid, or without one. */
  outside: number;
  /** The largest count in one cell. */
  maxHours: number;
}

/** The hours a chart bins: plain typed arrays (or number arrays), one entry per hour. */
export interface HourColumns {
  dryBulbC: ArrayLike<number>;
  /** kg/kg dry air */
  humidityRatio: ArrayLike<number>;
  /** Mode code per hour (MODE); optional. */
  modes?: ArrayLike<number> | null;
  /** Share of the load carried by compressors per hour; tells partial from full mechanical hours. */
  mechanicalFraction?: ArrayLike<number> | null;
  /** 1 for a humidified free-cooling hour. */
  humidified?: ArrayLike<number> | null;
}

/**
 * Counts every hour into the grid's cells in one pass, with the region each hour actually ran in when its
 * mode is known. The count array's size depends on the grid only, never on the number of hours.
 */
export function binHours(hoursIn: HourColumns, grid: StateGrid): CellHours {
  checkGrid(grid);
  const { dryBulbC, humidityRatio, modes, mechanicalFraction, humidified } = hoursIn;
  const n = dryBulbC.length;
  if (humidityRatio.length !== n) throw new RangeError(`humidityRatio has ${humidityRatio.length} hours, dryBulbC has ${n}`);
  if (modes && modes.length !== n) throw new RangeError(`modes has ${modes.length} hours, dryBulbC has ${n}`);
  const cells = grid.nx * grid.ny;
  const hours = new Uint32Array(cells);
  const regionHours = modes ? new Uint32Array(cells * 5) : null;
  const totals = modes ? new Uint32Array(5) : null;
  let binned = 0;
  let maxHours = 0;
  for (let k = 0; k < n; k++) {
    let region: number = REGION.none;
    if (modes) {
      region = regionOfHour(modes[k], humidified ? humidified[k] : 0, mechanicalFraction ? mechanicalFraction[k] : 1);
      if (region !== REGION.none) totals![region]++;
    }
    const cell = cellOf(grid, dryBulbC[k], humidityRatio[k]);
    if (cell < 0) continue;
    binned++;
    const count = ++hours[cell];
    if (count > maxHours) maxHours = count;
    if (regionHours && region !== REGION.none) regionHours[cell * 5 + region]++;
  }
  return { ...grid, hours, regionHours, totals, binned, outside: n - binned, maxHours };
}

/**
 * Hours per region by the grid: each hour counted in the region of the cell it falls in (for hours whose own
 * modes are not known, as in the editor's preview). REGION_KEYS order; hours in no region are left out.
 */
export function hoursPerGridRegion(cells: CellHours, regions: OperatingRegionGrid): Uint32Array {
  if (cells.nx !== regions.nx || cells.ny !== regions.ny) throw new RangeError('the hours and the regions must be binned on the same grid');
  const out = new Uint32Array(5);
  for (let k = 0; k < cells.hours.length; k++) {
    const r = regions.regions[k];
    if (r !== REGION.none) out[r] += cells.hours[k];
  }
  return out;
}
