/**
 * Data shaping for the moist-air chart, free of React and Plot: the chart window, the display
 * coordinates in either projection and unit system, envelope polygons, density bins, and the
 * per-hour states shown on hover. Geometry comes from shared/psychrometrics/chart.ts.
 */
import {
  bulkStates,
  chartGeometry,
  humidityRatioFromDewPoint,
  humidityRatioFromRh,
  projectPoint,
  saturationHumidityRatio,
  type BulkState,
  type ChartLine,
  type ChartPoint,
  type ChartProjection,
  type ChartWindow,
} from '../../../shared/psychrometrics';
import { CP_DRY_AIR, CP_VAPOUR } from '../../../shared/psychrometrics/constants';
import { enthalpyIpToSiKJPerKg, fahrenheitToCelsius } from '../../../shared/units';
import { toDisplay } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import type { EnvelopeLimits } from '../../../shared/scenario/envelopes';
import { envelopeTest } from '../../../shared/scenario/inside-envelope';

/** The six limits the chart draws; derating is already applied by whoever hands them in. */
export type EnvelopeLimitsInput = Omit<EnvelopeLimits, 'altitudeDerating'>;

export interface ChartHours {
  dryBulbC: ArrayLike<number>;
  /** kg/kg dry air */
  humidityRatio: ArrayLike<number>;
  /** 0 free cooling, 1 adiabatic assist, 2 mechanical, 3 no data */
  modes?: ArrayLike<number>;
  /** Share of the load on compressors per hour (tells partial from full mechanical hours). */
  mechanicalFraction?: ArrayLike<number>;
  /** 1 for a humidified free-cooling hour. */
  humidified?: ArrayLike<number>;
}

export interface ChartMarker {
  label: string;
  dryBulbC: number;
  humidityRatio: number;
}

/**
 * The window: at least −10…40 °C and 0…20 g/kg, widened in 5 K steps to hold every hour, envelope and
 * marker, and never beyond −50…60 °C or 60 g/kg.
 */
export function chartWindowFor(pressurePa: number, hours: ChartHours, envelopes: EnvelopeLimitsInput[] = [], markers: ChartMarker[] = []): ChartWindow {
  let tMin = -10;
  let tMax = 40;
  let wMax = 0;
  const take = (t: number, w: number) => {
    if (t === t) {
      tMin = Math.min(tMin, t);
      tMax = Math.max(tMax, t);
    }
    if (w === w) wMax = Math.max(wMax, w);
  };
  for (let i = 0; i < hours.dryBulbC.length; i++) take(hours.dryBulbC[i], hours.humidityRatio[i]);
  for (const m of markers) take(m.dryBulbC, m.humidityRatio);
  for (const e of envelopes) {
    take(e.dryBulbMinC, Number.NaN);
    take(e.dryBulbMaxC, Number.NaN);
    if (Number.isFinite(e.dewPointMaxC))
      take(
        Number.NaN,
        safeW(() => humidityRatioFromDewPoint(e.dewPointMaxC, pressurePa)),
      );
  }
  tMin = Math.max(-50, Math.floor(tMin / 5) * 5);
  tMax = Math.min(60, Math.ceil(tMax / 5) * 5);
  // A little room above the moistest hour, envelope or marker.
  wMax = Math.min(0.06, Math.max(0.02, wMax * 1.12));
  return { pressurePa, dryBulbMinC: tMin, dryBulbMaxC: tMax, humidityRatioMax: Math.ceil(wMax * 500) / 500 };
}

function safeW(f: () => number): number {
  try {
    return f();
  } catch {
    return Number.NaN;
  }
}

/**
 * Maps a projected point (shared/psychrometrics/chart.ts coordinates, SI) to what the chart draws:
 * dry-bulb / humidity-ratio chart: x = dry-bulb, y = humidity ratio, in the person's units;
 * h–x: x = humidity ratio; y = (h − 2501·W)/1.006, i.e. the dry-bulb an isotherm has at W = 0, in °C or °F.
 * The last step is linear, so the oblique enthalpy lines and the horizontal 0 °C isotherm are kept.
 */
export function toChartXY(point: ChartPoint, projection: ChartProjection, system: UnitSystem): ChartPoint {
  if (projection === 'h-x') {
    return { x: toDisplay('humidityRatio', system, point.x), y: toDisplay('temperature', system, point.y / CP_DRY_AIR) };
  }
  return { x: toDisplay('temperature', system, point.x), y: toDisplay('humidityRatio', system, point.y) };
}

/** A moist-air state (°C, kg/kg) straight to chart coordinates. */
export function stateToChartXY(dryBulbC: number, humidityRatio: number, projection: ChartProjection, system: UnitSystem): ChartPoint {
  return toChartXY(projectPoint({ dryBulbC, humidityRatio }, projection), projection, system);
}

/** Bulk form: every hour's chart coordinates, NaN for hours without data. */
export function hoursToChartXY(hours: ChartHours, projection: ChartProjection, system: UnitSystem): { x: Float64Array; y: Float64Array } {
  const n = hours.dryBulbC.length;
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  const gramScale = toDisplay('humidityRatio', system, 1);
  const tempScale = toDisplay('temperature', system, 1) - toDisplay('temperature', system, 0);
  const tempZero = toDisplay('temperature', system, 0);
  for (let i = 0; i < n; i++) {
    const t = hours.dryBulbC[i];
    const w = hours.humidityRatio[i];
    if (!(t === t && w === w)) {
      x[i] = y[i] = Number.NaN;
      continue;
    }
    // Same as stateToChartXY, unrolled so a year of hours makes no object per hour.
    if (projection === 'h-x') {
      x[i] = w * gramScale;
      y[i] = tempZero + tempScale * ((CP_DRY_AIR * t + CP_VAPOUR * t * w) / CP_DRY_AIR);
    } else {
      x[i] = tempZero + tempScale * t;
      y[i] = w * gramScale;
    }
  }
  return { x, y };
}

/** Round values for the line families in the person's unit system, returned in SI. */
export function lineValues(system: UnitSystem): { rhPcts: number[]; wetBulbsC: number[]; enthalpiesKJPerKg: number[] } {
  const rhPcts = [10, 20, 30, 40, 50, 60, 70, 80, 90];
  if (system === 'IP') {
    return {
      rhPcts,
      wetBulbsC: [10, 20, 30, 40, 50, 60, 70, 80, 90].map((f) => fahrenheitToCelsius(f)),
      enthalpiesKJPerKg: [5, 10, 15, 20, 25, 30, 35, 40, 45, 50, 55, 60].map((btu) => enthalpyIpToSiKJPerKg(btu)),
    };
  }
  return {
    rhPcts,
    wetBulbsC: [-10, -5, 0, 5, 10, 15, 20, 25, 30, 35],
    enthalpiesKJPerKg: [-10, 0, 10, 20, 30, 40, 50, 60, 70, 80, 90, 100, 110, 120, 130],
  };
}

export interface DisplayLine {
  kind: ChartLine['kind'] | 'isotherm';
  /** The constant in SI (RH %, °C, kJ/kg). */
  value: number;
  points: ChartPoint[];
}

/** Every background line of the chart, in display coordinates. In h–x the isotherms are drawn too (in the other projection they are the x grid). */
export function backgroundLines(window: ChartWindow, projection: ChartProjection, system: UnitSystem): DisplayLine[] {
  const lines: DisplayLine[] = chartGeometry({ ...window, projection, stepC: 0.5, ...lineValues(system) }).map((line) => ({
    kind: line.kind,
    value: line.value,
    points: line.points.map((p) => toChartXY(p, projection, system)),
  }));
  if (projection === 'h-x') {
    const step = system === 'IP' ? 10 : 5;
    const first = Math.ceil(toDisplay('temperature', system, window.dryBulbMinC) / step) * step;
    const last = toDisplay('temperature', system, window.dryBulbMaxC);
    for (let shown = first; shown <= last + 1e-9; shown += step) {
      const t = system === 'IP' ? fahrenheitToCelsius(shown) : shown;
      const wEnd = Math.min(
        window.humidityRatioMax,
        safeW(() => saturationHumidityRatio(t, window.pressurePa)),
      );
      if (!(wEnd > 0)) continue;
      lines.push({
        kind: 'isotherm',
        value: t,
        points: [stateToChartXY(t, 0, projection, system), stateToChartXY(t, wEnd, projection, system)],
      });
    }
  }
  return lines;
}

/**
 * The envelope as a closed polygon of states (°C, kg/kg): between the dry-bulb limits, above the
 * higher of the dew-point and RH floors, below the lower of the dew-point and RH ceilings.
 * Empty when the limits leave no room. Sampled every 0.25 K.
 */
export function envelopePolygon(limits: EnvelopeLimitsInput, window: ChartWindow): Array<{ dryBulbC: number; humidityRatio: number }> {
  const p = window.pressurePa;
  const wDpMin = Number.isFinite(limits.dewPointMinC) ? safeW(() => humidityRatioFromDewPoint(limits.dewPointMinC, p)) : 0;
  const wDpMax = Number.isFinite(limits.dewPointMaxC) ? safeW(() => humidityRatioFromDewPoint(limits.dewPointMaxC, p)) : window.humidityRatioMax;
  const tFrom = Math.max(limits.dryBulbMinC, window.dryBulbMinC);
  const tTo = Math.min(limits.dryBulbMaxC, window.dryBulbMaxC);
  const upper: Array<{ dryBulbC: number; humidityRatio: number }> = [];
  const lower: Array<{ dryBulbC: number; humidityRatio: number }> = [];
  if (!(tTo > tFrom)) return [];
  const n = Math.max(2, Math.ceil((tTo - tFrom) / 0.25) + 1);
  for (let i = 0; i < n; i++) {
    const t = tFrom + ((tTo - tFrom) * i) / (n - 1);
    const hi = Math.min(
      wDpMax,
      safeW(() => humidityRatioFromRh(t, Math.min(100, limits.rhMaxPct), p)),
      window.humidityRatioMax,
    );
    const lo = Math.max(wDpMin || 0, safeW(() => humidityRatioFromRh(t, Math.max(0, limits.rhMinPct), p)) || 0);
    if (hi >= lo) {
      upper.push({ dryBulbC: t, humidityRatio: hi });
      lower.push({ dryBulbC: t, humidityRatio: lo });
    }
  }
  if (!upper.length) return [];
  return [...upper, ...lower.reverse()];
}

export interface DensityCell {
  x1: number;
  x2: number;
  y1: number;
  y2: number;
  hours: number;
}

/**
 * Counts points in an nx × ny grid over the given domains; points outside or NaN are skipped.
 * Returns only cells holding at least one point, and the count of points binned.
 */
export function densityBins(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  xDomain: [number, number],
  yDomain: [number, number],
  nx: number,
  ny: number,
): { cells: DensityCell[]; binned: number } {
  if (!(Number.isInteger(nx) && nx > 0)) throw new RangeError(`nx must be a positive whole number (got ${nx})`);
  if (!(Number.isInteger(ny) && ny > 0)) throw new RangeError(`ny must be a positive whole number (got ${ny})`);
  const [x0, x1] = xDomain;
  const [y0, y1] = yDomain;
  if (!(x1 > x0)) throw new RangeError(`xDomain must rise (got ${x0}…${x1})`);
  if (!(y1 > y0)) throw new RangeError(`yDomain must rise (got ${y0}…${y1})`);
  const counts = new Uint32Array(nx * ny);
  const dx = (x1 - x0) / nx;
  const dy = (y1 - y0) / ny;
  let binned = 0;
  for (let i = 0; i < x.length; i++) {
    const xi = x[i];
    const yi = y[i];
    if (!(xi >= x0 && xi <= x1 && yi >= y0 && yi <= y1)) continue;
    const cx = Math.min(nx - 1, Math.floor((xi - x0) / dx));
    const cy = Math.min(ny - 1, Math.floor((yi - y0) / dy));
    counts[cy * nx + cx]++;
    binned++;
  }
  const cells: DensityCell[] = [];
  for (let c = 0; c < counts.length; c++) {
    if (!counts[c]) continue;
    const cx = c % nx;
    const cy = Math.floor(c / nx);
    cells.push({ x1: x0 + cx * dx, x2: x0 + (cx + 1) * dx, y1: y0 + cy * dy, y2: y0 + (cy + 1) * dy, hours: counts[c] });
  }
  return { cells, binned };
}

/** Full state of every hour at the chart's pressure (for hover and the table); NaN where data is missing. */
export function hourStates(hours: ChartHours, pressurePa: number): BulkState {
  return bulkStates({
    dryBulbC: Float64Array.from(hours.dryBulbC),
    humidity: { kind: 'humidity-ratio-kgkg', values: Float64Array.from(hours.humidityRatio) },
    pressurePa,
  });
}

/**
 * Hours inside the envelope's limits (all six, at the chart's pressure, by the one envelope test), and hours with a
 * state at all (a dry-bulb and a humidity ratio).
 */
export function hoursInside(hours: ChartHours, pressurePa: number, limits: EnvelopeLimitsInput): { inside: number; withData: number } {
  const breach = envelopeTest(limits);
  let inside = 0;
  let withData = 0;
  for (let i = 0; i < hours.dryBulbC.length; i++) {
    const t = hours.dryBulbC[i];
    const w = hours.humidityRatio[i];
    if (!(t === t && w === w)) continue;
    withData++;
    if (breach(t, w, pressurePa) === 0) inside++;
  }
  return { inside, withData };
}

/** The mode code of hour i (0 free, 1 adiabatic, 2 mechanical, 3 no data); 0 when there are no modes, 3 for anything unknown. */
export function modeCodeAt(modes: ArrayLike<number> | undefined, i: number): number {
  const m = modes ? modes[i] : 0;
  return m >= 0 && m <= 3 ? Math.floor(m) : 3;
}

/** A systematic sample of at most `limit` hour indices (every k-th hour), so large series stay drawable. */
export function sampleIndex(length: number, limit: number): { index: Uint32Array; stride: number } {
  const stride = Math.max(1, Math.ceil(length / limit));
  const index = new Uint32Array(Math.ceil(length / stride));
  for (let i = 0, j = 0; i < length; i += stride, j++) index[j] = i;
  return { index, stride };
}
