/**
 * The dense layer of the moist-air chart, free of React and Plot: the grids (a fine one for the design's
 * regions, a coarser one in round display units for the hours), the way back from a chart position to a
 * moist-air state in either projection, and the painting of regions and hour density into RGBA pixels. The
 * pixel count depends on the chart's size only, never on the number of hours.
 */
import { saturationHumidityRatio, type ChartProjection, type ChartWindow } from '../../../shared/psychrometrics';
import { CP_DRY_AIR, CP_VAPOUR } from '../../../shared/psychrometrics/constants';
import { cellOf, REGION, REGION_KEYS, type CellHours, type OperatingRegionGrid, type StateGrid } from '../../../shared/scenario/operating-regions';
import { fromDisplay, toDisplay } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import { densityInk, regionTints } from './region-words';

/** The fine grid the classifier is evaluated on: about 0.25 K by 1/200 of the window's moisture, at most 320 × 200 cells. */
export function regionGridFor(window: ChartWindow): StateGrid {
  const span = window.dryBulbMaxC - window.dryBulbMinC;
  const nx = Math.min(320, Math.ceil(span / 0.25));
  const ny = 200;
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
 * fullest cell.
 */
export function paintLayer(input: LayerInput): Uint8ClampedArray {
  const { widthPx, heightPx, xAt, yAt, projection, units, window, regions, cells, gapPx } = input;
  const out = new Uint8ClampedArray(widthPx * heightPx * 4);
  const xs = Float64Array.from({ length: widthPx }, (_, i) => xAt(i));
  const ys = Float64Array.from({ length: heightPx }, (_, j) => yAt(j));
  // Saturation humidity ratio every 0.1 K across the window, read by linear interpolation per pixel.
  const satStepC = 0.1;
  const satFromC = window.dryBulbMinC - 1;
  const sat = Float64Array.from({ length: Math.ceil((window.dryBulbMaxC + 2 - satFromC) / satStepC) + 1 }, (_, k) => {
    try {
      return saturationHumidityRatio(satFromC + k * satStepC, window.pressurePa);
    } catch {
      return Number.POSITIVE_INFINITY;
    }
  });
  const tints = REGION_KEYS.map((key) => regionTints[key]);
  const maxHours = cells?.maxHours ?? 0;
  const alphaOf = new Float64Array(maxHours + 1);
  for (let n = 1; n <= maxHours; n++) alphaOf[n] = 0.12 + 0.76 * Math.sqrt(n / maxHours);
  // The gap between hour cells, from device pixels to K and kg/kg (in h–x the ordinate reads as dry-bulb).
  const perPxX = Math.abs(xs[widthPx - 1] - xs[0]) / Math.max(1, widthPx - 1);
  const perPxY = Math.abs(ys[heightPx - 1] - ys[0]) / Math.max(1, heightPx - 1);
  const kelvinPerShown = 1 / (toDisplay('temperature', units, 1) - toDisplay('temperature', units, 0));
  const kgPerShown = 1 / toDisplay('humidityRatio', units, 1);
  const gapC = gapPx * (projection === 'h-x' ? perPxY : perPxX) * kelvinPerShown;
  const gapKgPerKg = gapPx * (projection === 'h-x' ? perPxX : perPxY) * kgPerShown;
  const [ir, ig, ib] = densityInk;

  for (let j = 0; j < heightPx; j++) {
    for (let i = 0; i < widthPx; i++) {
      const { dryBulbC: t, humidityRatio: w } = chartXYToState(xs[i], ys[j], projection, units);
      const s = (t - satFromC) / satStepC;
      const k = Math.floor(s);
      if (!(w >= 0) || !(k >= 0 && k < sat.length - 1) || w > sat[k] + (sat[k + 1] - sat[k]) * (s - k)) continue;
      let r = 255;
      let g = 255;
      let b = 255;
      if (regions) {
        const cell = cellOf(regions, t, w);
        const code = cell < 0 ? REGION.none : regions.regions[cell];
        if (code !== REGION.none) [r, g, b] = tints[code];
      }
      if (cells && maxHours > 0) {
        const cell = cellOf(cells, t, w);
        const n = cell < 0 ? 0 : cells.hours[cell];
        if (n > 0 && !inGap(cells, t, w, gapC, gapKgPerKg)) {
          const a = alphaOf[n];
          r += (ir - r) * a;
          g += (ig - g) * a;
          b += (ib - b) * a;
        }
      }
      const p = (j * widthPx + i) * 4;
      out[p] = r;
      out[p + 1] = g;
      out[p + 2] = b;
      out[p + 3] = 255;
    }
  }
  return out;
}

/** Whether a state lies within the gap (K, kg/kg) at its cell's lower or left edge. */
function inGap(grid: StateGrid, t: number, w: number, gapC: number, gapKgPerKg: number): boolean {
  const ft = (t - grid.dryBulbMinC) / grid.dryBulbStepC;
  const fw = (w - grid.humidityRatioMin) / grid.humidityRatioStep;
  return (ft - Math.floor(ft)) * grid.dryBulbStepC < gapC || (fw - Math.floor(fw)) * grid.humidityRatioStep < gapKgPerKg;
}
