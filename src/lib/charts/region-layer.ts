/**
 * The dense layer of the moist-air chart, free of React and Plot: the grids (a fine one for the design's
 * regions, a coarser one in round display units for the hours), the way back from a chart position to a
 * moist-air state in either projection, and the painting of regions and hour density into RGBA pixels. The
 * pixel count depends on the chart's size only, never on the number of hours.
 */
import { dewPointFromHumidityRatio, saturationHumidityRatio, type ChartProjection, type ChartWindow } from '../../../shared/psychrometrics';
import { CP_DRY_AIR, CP_VAPOUR } from '../../../shared/psychrometrics/constants';
import { REGION, REGION_KEYS, type CellHours, type OperatingRegionGrid, type StateGrid } from '../../../shared/scenario/operating-regions';
import { fromDisplay, toDisplay } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import { densityInk, regionTints } from './region-words';

/**
 * The fine grid the classifier is evaluated on: about 0.25 K by 1/200 of the window's moisture, at most 320 × 200
 * cells; a narrow chart (the editor's preview) takes half as many each way, still finer than its pixels.
 */
export function regionGridFor(window: ChartWindow, narrow = false): StateGrid {
  const span = window.dryBulbMaxC - window.dryBulbMinC;
  const nx = Math.min(narrow ? 160 : 320, Math.ceil(span / (narrow ? 0.5 : 0.25)));
  const ny = narrow ? 100 : 200;
  return { dryBulbMinC: window.dryBulbMinC, dryBulbStepC: span / nx, nx, humidityRatioMin: 0, humidityRatioStep: window.humidityRatioMax / ny, ny };
}

/**
 * The grid the hours are counted on, with edges at round values of the person's units: 1 K by 0.5 g/kg in SI,
 * 2 °F by 5 gr/lb in IP (chosen for the unit, not converted).
 */
export function densityGridFor(window: ChartWindow, units: UnitSystem): StateGrid {
  const [tStep, wStep] = units === 'IP' ? [2, 5] : [1, 0.5];
  const t0 = Math.floor(toDisplay('temperature', units, window.dryBulbMinC) / tStep) * tStep;
  const t1 = Math.ceil(toDisplay('temperature', units, window.dryBulbMaxC) / tStep) * tStep;
  const w1 = Math.ceil(toDisplay('humidityRatio', units, window.humidityRatioMax) / wStep) * wStep;
  const dryBulbMinC = fromDisplay('temperature', units, t0);
  return {
    dryBulbMinC,
    dryBulbStepC: fromDisplay('temperature', units, t0 + tStep) - dryBulbMinC,
    nx: Math.round((t1 - t0) / tStep),
    humidityRatioMin: 0,
    humidityRatioStep: fromDisplay('humidityRatio', units, wStep),
    ny: Math.round(w1 / wStep),
  };
}

/**
 * The moist-air state (°C, kg/kg) at a chart position given in display units: the inverse of
 * stateToChartXY. In h–x, y = (h − 2501·W)/1.006 = t·(1.006 + 1.86·W)/1.006 (ASHRAE Handbook—Fundamentals 2017
 * ch. 1 eq. 32), so t = 1.006·y / (1.006 + 1.86·W).
 */
export function chartXYToState(x: number, y: number, projection: ChartProjection, units: UnitSystem): { dryBulbC: number; humidityRatio: number } {
  if (projection === 'h-x') {
    const w = fromDisplay('humidityRatio', units, x);
    const yC = fromDisplay('temperature', units, y);
    return { dryBulbC: (CP_DRY_AIR * yC) / (CP_DRY_AIR + CP_VAPOUR * w), humidityRatio: w };
  }
  return { dryBulbC: fromDisplay('temperature', units, x), humidityRatio: fromDisplay('humidityRatio', units, y) };
}

export interface LayerInput {
  /** Pixels of the plotting area (device pixels). */
  widthPx: number;
  heightPx: number;
  /** Display coordinate at the centre of device pixel column i / row j. */
  xAt: (i: number) => number;
  yAt: (j: number) => number;
  projection: ChartProjection;
  units: UnitSystem;
  window: ChartWindow;
  regions: OperatingRegionGrid | null;
  cells: CellHours | null;
  /** Device pixels left bare between neighbouring hour cells, so the region shows through. */
  gapPx: number;
}

/**
 * RGBA pixels of the layer: the region's tint under each state (white where the design is not given, bare
 * above saturation), and over it each hour cell shaded in the neutral ink by the square root of its share of the
 * fullest cell. Display coordinates are linear in dry-bulb and humidity ratio along the axes, so each column and
 * row is converted once and the loop over pixels only looks up cells.
 */
export function paintLayer(input: LayerInput): Uint8ClampedArray {
  const { widthPx, heightPx, xAt, yAt, projection, units, window, regions, cells, gapPx } = input;
  const out = new Uint8ClampedArray(widthPx * heightPx * 4);
  const hx = projection === 'h-x';
  const xs = Float64Array.from({ length: widthPx }, (_, i) => xAt(i));
  const ys = Float64Array.from({ length: heightPx }, (_, j) => yAt(j));
  // Per column: dry-bulb (°C) in the dry-bulb projection, humidity ratio (kg/kg) in h–x; per row the other one
  // (in h–x the row gives the ordinate in °C, and t = 1.006·y / (1.006 + 1.86·W), ASHRAE 2017 ch. 1 eq. 32).
  const col = Float64Array.from(xs, (x) => (hx ? fromDisplay('humidityRatio', units, x) : fromDisplay('temperature', units, x)));
  const row = Float64Array.from(ys, (y) => (hx ? fromDisplay('temperature', units, y) : fromDisplay('humidityRatio', units, y)));
  // Saturation per column: the humidity ratio at saturation (dry-bulb projection) or the dew point of the column's W (h–x).
  const saturation = Float64Array.from(col, (v) => {
    try {
      if (hx) return v > 0 ? dewPointFromHumidityRatio(v, window.pressurePa) : Number.NEGATIVE_INFINITY;
      return saturationHumidityRatio(v, window.pressurePa);
    } catch {
      return hx ? Number.POSITIVE_INFINITY : Number.NEGATIVE_INFINITY;
    }
  });
  const hxFactor = Float64Array.from(col, (w) => CP_DRY_AIR / (CP_DRY_AIR + CP_VAPOUR * w));
  // Every colour a pixel can take, packed as RGBA bytes in one 32-bit word (little-endian): the white ground or a
  // region's tint (6 bases), each under 65 levels of ink.
  const bases: Array<[number, number, number]> = [[255, 255, 255], ...REGION_KEYS.map((key) => regionTints[key])];
  const levels = 64;
  const palette = new Uint32Array(bases.length * (levels + 1));
  bases.forEach(([r, g, b], k) => {
    for (let level = 0; level <= levels; level++) {
      const a = level / levels;
      const mix = (c: number, ink: number) => Math.round(c + (ink - c) * a);
      palette[k * (levels + 1) + level] = ((255 << 24) | (mix(b, densityInk[2]) << 16) | (mix(g, densityInk[1]) << 8) | mix(r, densityInk[0])) >>> 0;
    }
  });
  const maxHours = cells?.maxHours ?? 0;
  const levelOf = new Uint8Array(maxHours + 1);
  for (let n = 1; n <= maxHours; n++) levelOf[n] = Math.round(levels * (0.12 + 0.76 * Math.sqrt(n / maxHours)));
  // The gap between hour cells, from device pixels to K and kg/kg (in h–x the ordinate reads as dry-bulb).
  const perPxX = Math.abs(xs[widthPx - 1] - xs[0]) / Math.max(1, widthPx - 1);
  const perPxY = Math.abs(ys[heightPx - 1] - ys[0]) / Math.max(1, heightPx - 1);
  const kelvinPerShown = 1 / (toDisplay('temperature', units, 1) - toDisplay('temperature', units, 0));
  const kgPerShown = 1 / toDisplay('humidityRatio', units, 1);
  const gapC = gapPx * (hx ? perPxY : perPxX) * kelvinPerShown;
  const gapKgPerKg = gapPx * (hx ? perPxX : perPxY) * kgPerShown;
  const rg = regions;
  const cg = cells && maxHours > 0 ? cells : null;
  const out32 = new Uint32Array(out.buffer);
  // Cell indices of whichever coordinate a column or row fixes (−1 outside the grid, or in the gap for hour cells):
  // dry-bulb per column in the dry-bulb projection, humidity ratio per column in h–x; the other per row.
  const regionT = rg ? (v: number) => indexIn(v, rg.dryBulbMinC, rg.dryBulbStepC, rg.nx, 0) : () => -1;
  const regionW = rg ? (v: number) => indexIn(v, rg.humidityRatioMin, rg.humidityRatioStep, rg.ny, 0) : () => -1;
  const cellT = cg ? (v: number) => indexIn(v, cg.dryBulbMinC, cg.dryBulbStepC, cg.nx, gapC) : () => -1;
  const cellW = cg ? (v: number) => indexIn(v, cg.humidityRatioMin, cg.humidityRatioStep, cg.ny, gapKgPerKg) : () => -1;
  const colRegion = Int32Array.from(col, hx ? regionW : regionT);
  const colCell = Int32Array.from(col, hx ? cellW : cellT);
  const rowRegion = Int32Array.from(row, hx ? () => -1 : regionW);
  const rowCell = Int32Array.from(row, hx ? () => -1 : cellW);
  const stride = levels + 1;

  for (let j = 0; j < heightPx; j++) {
    const rowOffset = j * widthPx;
    for (let i = 0; i < widthPx; i++) {
      let ri: number;
      let rj: number;
      let ci: number;
      let cj: number;
      if (hx) {
        const t = row[j] * hxFactor[i];
        if (!(col[i] >= 0) || t < saturation[i]) continue;
        ri = regionT(t);
        rj = colRegion[i];
        ci = cellT(t);
        cj = colCell[i];
      } else {
        if (!(row[j] >= 0) || row[j] > saturation[i]) continue;
        ri = colRegion[i];
        rj = rowRegion[j];
        ci = colCell[i];
        cj = rowCell[j];
      }
      const code = ri >= 0 && rj >= 0 ? rg!.regions[rj * rg!.nx + ri] : REGION.none;
      const base = code === REGION.none ? 0 : code + 1;
      const level = ci >= 0 && cj >= 0 ? levelOf[cg!.hours[cj * cg!.nx + ci]] : 0;
      out32[rowOffset + i] = palette[base * stride + level];
    }
  }
  return out;
}

/** The cell index of v on an axis from `min` in steps of `step` (n cells); −1 outside, or within `gap` of the cell's lower edge. */
function indexIn(v: number, min: number, step: number, n: number, gap: number): number {
  const f = (v - min) / step;
  const k = Math.floor(f);
  if (!(k >= 0 && k < n)) return -1;
  return (f - k) * step < gap ? -1 : k;
}
