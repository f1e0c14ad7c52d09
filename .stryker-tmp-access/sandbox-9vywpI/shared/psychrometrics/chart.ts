/**
 * Geometry of psychrometric charts at any pressure: the saturation curve and lines of constant RH,
 * wet-bulb, enthalpy and specific volume, as point series in either projection:
 * - 'dry-bulb-humidity-ratio': x = dry-bulb °C, y = humidity ratio kg/kg (the ASHRAE-style chart);
 * - 'h-x': the h–x diagram with oblique enthalpy axis: x = humidity ratio kg/kg,
 *   y = h − 2501·W = 1.006·t + 1.86·t·W kJ/kg, so every 0 °C isotherm point has y = 0 (horizontal)
 *   and lines of constant enthalpy fall with slope −2501 kJ/kg per kg/kg.
 * Equations: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 5, 6, 20, 22, 26, 32, 33, 35.
 */
// @ts-nocheck

import { CP_DRY_AIR, CP_VAPOUR, GAS_CONSTANT_DRY_AIR, KELVIN_OFFSET, LATENT_HEAT_0C, MOLAR_MASS_RATIO, VOLUME_VAPOUR_FACTOR } from './constants';
import { lnSaturationIceOrWater, lnSaturationPressure } from './saturation';
import { saturationTemperatureFromEnthalpy } from './saturated-enthalpy';
import { humidityRatioFromWetBulbUnchecked } from './wet-bulb';
import { requireFinite, requireInRange, requirePressurePa, requireRhPct, requireTemperatureC } from './validate';
import type { AirPoint } from './processes';

export type ChartProjection = 'dry-bulb-humidity-ratio' | 'h-x';

export interface ChartPoint {
  x: number;
  y: number;
}

export type ChartLineKind = 'saturation' | 'relative-humidity' | 'wet-bulb' | 'enthalpy' | 'specific-volume';

export interface ChartLine {
  kind: ChartLineKind;
  /** The constant the line holds: RH %, wet-bulb °C, enthalpy kJ/kg, volume m³/kg; 100 for saturation. */
  value: number;
  points: ChartPoint[];
}

/** The window of the chart in state terms. */
export interface ChartWindow {
  pressurePa: number;
  dryBulbMinC: number;
  dryBulbMaxC: number;
  humidityRatioMax: number;
}

/**
 * Position of a moist-air point in a chart projection (see module note for the axes).
 * Source of the h–x ordinate: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 32 less the 2501·W term.
 */
export function projectPoint(point: AirPoint, projection: ChartProjection): ChartPoint {
  const t = point.dryBulbC;
  const w = point.humidityRatio;
  return projection === 'h-x' ? { x: w, y: CP_DRY_AIR * t + CP_VAPOUR * t * w } : { x: t, y: w };
}

function validateWindow(window: ChartWindow): void {
  requirePressurePa('pressurePa', window.pressurePa);
  requireTemperatureC('dryBulbMinC', window.dryBulbMinC);
  requireTemperatureC('dryBulbMaxC', window.dryBulbMaxC);
  if (window.dryBulbMaxC <= window.dryBulbMinC)
    throw new RangeError(`dryBulbMaxC must exceed dryBulbMinC (got ${window.dryBulbMinC}…${window.dryBulbMaxC} °C)`);
  requireInRange('humidityRatioMax', window.humidityRatioMax, Number.MIN_VALUE, 1, 'kg/kg');
}

function inWindow(t: number, w: number, window: ChartWindow): boolean {
  return t >= window.dryBulbMinC - 1e-9 && t <= window.dryBulbMaxC + 1e-9 && w >= 0 && w <= window.humidityRatioMax;
}

/** W at RH φ and dry-bulb t, or NaN when the vapour pressure would reach the total pressure. */
function humidityRatioAtRh(t: number, rhFraction: number, pressurePa: number): number {
  const pw = rhFraction * Math.exp(lnSaturationPressure(t));
  return pw < pressurePa ? (MOLAR_MASS_RATIO * pw) / (pressurePa - pw) : Number.NaN;
}

function sampleCount(from: number, to: number, stepC: number): number {
  return Math.max(2, Math.ceil(Math.abs(to - from) / stepC) + 1);
}

/**
 * Line of constant relative humidity across the window, sampled every stepC of dry-bulb.
 * @param rhPct 0…100 (100 is the saturation curve)
 */
export function constantRhLine(rhPct: number, window: ChartWindow, projection: ChartProjection, stepC = 0.5): ChartLine {
  requireRhPct('rhPct', rhPct);
  validateWindow(window);
  requireInRange('stepC', stepC, 0.01, 50, 'K');
  const points: ChartPoint[] = [];
  const n = sampleCount(window.dryBulbMinC, window.dryBulbMaxC, stepC);
  for (let i = 0; i < n; i++) {
    const t = window.dryBulbMinC + ((window.dryBulbMaxC - window.dryBulbMinC) * i) / (n - 1);
    const w = humidityRatioAtRh(t, rhPct / 100, window.pressurePa);
    if (inWindow(t, w, window)) points.push(projectPoint({ dryBulbC: t, humidityRatio: w }, projection));
  }
  return { kind: rhPct === 100 ? 'saturation' : 'relative-humidity', value: rhPct, points };
}

/** The saturation curve (RH 100 %) across the window. */
export function saturationCurve(window: ChartWindow, projection: ChartProjection, stepC = 0.5): ChartLine {
  return constantRhLine(100, window, projection, stepC);
}

/**
 * Line of constant thermodynamic wet-bulb wetBulbC: from saturation at t = t* to dry air
 * (W = 0, where 1.006·(t − t*) = (a − b·t*)·Ws* in eq. 33/35), sampled in `samples` points. Below 0 °C
 * the line is eq. 35's, with Ws* over ice, so it starts on the ice-saturation curve, a little below the
 * chart's saturation curve over liquid water (the RH = 100 % line; 9 % below it at −10 °C).
 */
export function constantWetBulbLine(wetBulbC: number, window: ChartWindow, projection: ChartProjection, samples = 24): ChartLine {
  requireTemperatureC('wetBulbC', wetBulbC);
  validateWindow(window);
  requireInRange('samples', samples, 2, 10_000, '');
  const points: ChartPoint[] = [];
  const pwsStar = Math.exp(lnSaturationIceOrWater(wetBulbC));
  if (!(pwsStar < window.pressurePa)) return { kind: 'wet-bulb', value: wetBulbC, points };
  const wsStar = (MOLAR_MASS_RATIO * pwsStar) / (window.pressurePa - pwsStar);
  const latent = wetBulbC >= 0 ? 2501 - 2.326 * wetBulbC : 2830 - 0.24 * wetBulbC;
  const dryEndC = wetBulbC + (latent * wsStar) / CP_DRY_AIR;
  for (let i = 0; i < samples; i++) {
    const t = wetBulbC + ((dryEndC - wetBulbC) * i) / (samples - 1);
    const w = Math.max(0, humidityRatioFromWetBulbUnchecked(t, wetBulbC, window.pressurePa));
    if (inWindow(t, w, window)) points.push(projectPoint({ dryBulbC: t, humidityRatio: w }, projection));
  }
  return { kind: 'wet-bulb', value: wetBulbC, points };
}

/**
 * Line of constant enthalpy enthalpyKJPerKg: from the saturation curve to dry air (t = h/1.006),
 * W = (h − 1.006·t) / (2501 + 1.86·t) (ASHRAE 2017 ch. 1 eq. 32 solved for W).
 */
export function constantEnthalpyLine(enthalpyKJPerKg: number, window: ChartWindow, projection: ChartProjection, samples = 24): ChartLine {
  requireFinite('enthalpyKJPerKg', enthalpyKJPerKg);
  validateWindow(window);
  requireInRange('samples', samples, 2, 10_000, '');
  const points: ChartPoint[] = [];
  const dryEndC = enthalpyKJPerKg / CP_DRY_AIR;
  const saturatedC = saturationTemperatureFromEnthalpy(enthalpyKJPerKg, window.pressurePa);
  const startC = Number.isNaN(saturatedC) ? window.dryBulbMinC : Math.max(saturatedC, window.dryBulbMinC);
  const endC = Math.min(dryEndC, window.dryBulbMaxC);
  if (!(endC > startC)) return { kind: 'enthalpy', value: enthalpyKJPerKg, points };
  for (let i = 0; i < samples; i++) {
    const t = startC + ((endC - startC) * i) / (samples - 1);
    const w = Math.max(0, (enthalpyKJPerKg - CP_DRY_AIR * t) / (LATENT_HEAT_0C + CP_VAPOUR * t));
    if (inWindow(t, w, window)) points.push(projectPoint({ dryBulbC: t, humidityRatio: w }, projection));
  }
  return { kind: 'enthalpy', value: enthalpyKJPerKg, points };
}

/** W on the constant-volume line v at dry-bulb t: v·p / (R_da·T) = 1 + 1.607858·W (ASHRAE 2017 ch. 1 eq. 26). */
function humidityRatioAtVolume(volume: number, t: number, pressurePa: number): number {
  return ((volume * pressurePa) / (GAS_CONSTANT_DRY_AIR * (t + KELVIN_OFFSET)) - 1) / VOLUME_VAPOUR_FACTOR;
}

/**
 * Line of constant specific volume (m³ per kg dry air): from dry air (t = v·p/R_da − 273.15) to the
 * saturation curve, found by halving the interval where W(t) crosses Ws(t).
 */
export function constantVolumeLine(volumeM3PerKg: number, window: ChartWindow, projection: ChartProjection, samples = 24): ChartLine {
  requireInRange('volumeM3PerKg', volumeM3PerKg, 0.1, 100, 'm³/kg');
  validateWindow(window);
  requireInRange('samples', samples, 2, 10_000, '');
  const p = window.pressurePa;
  const dryEndC = (volumeM3PerKg * p) / GAS_CONSTANT_DRY_AIR - KELVIN_OFFSET;
  // Above saturation when W(t) > Ws(t); W(t) falls and Ws(t) rises with t, so one crossing.
  const excess = (t: number): number => {
    const ws = humidityRatioAtRh(t, 1, p);
    return Number.isNaN(ws) ? -1 : humidityRatioAtVolume(volumeM3PerKg, t, p) - ws;
  };
  let lo = Math.max(window.dryBulbMinC, -100);
  let hi = Math.min(dryEndC, 200);
  const points: ChartPoint[] = [];
  if (!(hi > lo)) return { kind: 'specific-volume', value: volumeM3PerKg, points };
  if (excess(lo) > 0) {
    for (let i = 0; i < 60; i++) {
      const mid = 0.5 * (lo + hi);
      if (excess(mid) > 0) lo = mid;
      else hi = mid;
    }
    hi = Math.min(dryEndC, 200);
  }
  const startC = lo;
  const endC = Math.min(hi, window.dryBulbMaxC);
  for (let i = 0; i < samples; i++) {
    const t = startC + ((endC - startC) * i) / (samples - 1);
    const w = Math.max(0, humidityRatioAtVolume(volumeM3PerKg, t, p));
    if (inWindow(t, w, window)) points.push(projectPoint({ dryBulbC: t, humidityRatio: w }, projection));
  }
  return { kind: 'specific-volume', value: volumeM3PerKg, points };
}

export interface ChartGeometryRequest extends ChartWindow {
  projection: ChartProjection;
  rhPcts?: number[];
  wetBulbsC?: number[];
  enthalpiesKJPerKg?: number[];
  volumesM3PerKg?: number[];
  stepC?: number;
}

/** Every line a chart needs in one call: saturation first, then the families asked for. */
export function chartGeometry(request: ChartGeometryRequest): ChartLine[] {
  const { projection } = request;
  const lines = [saturationCurve(request, projection, request.stepC)];
  for (const rh of request.rhPcts ?? []) lines.push(constantRhLine(rh, request, projection, request.stepC));
  for (const wb of request.wetBulbsC ?? []) lines.push(constantWetBulbLine(wb, request, projection));
  for (const h of request.enthalpiesKJPerKg ?? []) lines.push(constantEnthalpyLine(h, request, projection));
  for (const v of request.volumesM3PerKg ?? []) lines.push(constantVolumeLine(v, request, projection));
  return lines;
}
