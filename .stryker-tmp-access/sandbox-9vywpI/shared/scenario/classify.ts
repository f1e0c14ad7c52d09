/**
 * The hour classifier: each hour of outdoor weather becomes free cooling (with or without
 * humidification), adiabatic assist, mechanical or no data, with the fraction of the cooling load the
 * compressors carry, the envelope excursions, and the water the evaporative stage takes up. Typed arrays in and out,
 * no object per hour; the rules per system kind are written out in README.md, "How it works".
 */
// @ts-nocheck

import {
  dewPointFromHumidityRatio,
  humidityRatioAtDewPointLimit,
  humidityRatioAtRhLimit,
  humidityRatioFromWetBulb,
  maxHumidityRatioForLimits,
} from '../psychrometrics';
import type { EnvelopeLimits } from './envelopes';
import { hallSideEffectiveness } from './exchanger';
import type { SingleSystem } from './schema';

export const MODE = { free: 0, adiabatic: 1, mechanical: 2, noData: 3 } as const;
export type ModeCode = (typeof MODE)[keyof typeof MODE];
export const MODE_NAMES = ['free', 'adiabatic', 'mechanical', 'no_data'] as const;

/** Bit flags per hour. */
export const EXCURSION = {
  /** The hall air is drier than the envelope's lower moisture limit (direct outdoor air, no humidification). */
  lowHumidity: 1,
  /** The supply setpoint is above the envelope's (altitude-derated) maximum dry-bulb. */
  supplyAboveMax: 2,
  /** The supply setpoint is below the envelope's minimum dry-bulb. */
  supplyBelowMin: 4,
} as const;

/** Flag value of a climate hour that is missing (climate importer convention). */
const MISSING_FLAG = 2;

/** Dry-bulb and moisture limits of the inlet envelope, dry-bulb maximum already derated for altitude. */
export type InletLimits = Omit<EnvelopeLimits, 'altitudeDerating'>;

export interface OutdoorHours {
  dryBulbC: Float64Array;
  wetBulbC: Float64Array;
  humidityRatio: Float64Array;
  pressurePa: Float64Array | number;
  /** 0 measured, 1 filled, 2 missing; missing hours are no-data whatever their values. */
  flags?: Uint8Array | null;
}

/** What the classifier needs beyond the system's own inputs, derived from the energy inputs. */
export interface ClassifierPlant {
  /** Fan heat of the hall fans at design, K (shared/scenario/fans.ts, designFanHeatK). */
  fanHeatK: number;
}

export interface HourClassification {
  modes: Uint8Array;
  /**
   * 1 for a free-cooling hour in which the evaporative stage only adds moisture (direct air drier than the
   * envelope's lower moisture limit); 0 otherwise.
   */
  humidified: Uint8Array;
  /** Share of the cooling load (IT + fan heat) carried by compressors, 0…1; 0 outside mechanical hours. */
  mechanicalFraction: Float64Array;
  excursions: Uint8Array;
  /**
   * Water taken up in the evaporative stage, kg per kg of dry air: per kg of hall supply air for
   * the air-side kinds (the scavenger air ratio already applied for indirect air), per kg of
   * heat-rejection air for a wetted dry cooler; 0 for towers (their evaporation follows from the heat
   * rejected and the weather, see tower.ts). Humidification water in humidified hours.
   */
  evaporationKgPerKgAir: Float64Array;
}

interface MoistureTargets {
  /** Upper moisture limit of the supply air, kg/kg. */
  highW: number;
  /** Lower moisture limit of the supply air, kg/kg. */
  lowW: number;
  /** Dew point of highW, °C: the coil leaving temperature when dehumidifying. */
  highDewPointC: number;
}

/**
 * Supply-air moisture limits at pressurePa for a supply at supplyAirC: highW is the smaller of W at
 * the dew-point maximum and W at (supplyAirC, RH maximum); lowW the larger of W at the dew-point
 * minimum and W at (supplyAirC, RH minimum). Equations: ASHRAE Handbook—Fundamentals (2017) ch. 1
 * eq. 20, 22, 36 through shared/psychrometrics.
 */
export function moistureTargets(limits: InletLimits, supplyAirC: number, pressurePa: number): MoistureTargets {
  const highW = maxHumidityRatioForLimits(supplyAirC, { dewPointMaxC: limits.dewPointMaxC, rhMaxPct: limits.rhMaxPct }, pressurePa);
  const lowW = Math.max(humidityRatioAtDewPointLimit(limits.dewPointMinC, pressurePa), humidityRatioAtRhLimit(supplyAirC, limits.rhMinPct, pressurePa));
  return { highW, lowW, highDewPointC: dewPointFromHumidityRatio(highW, pressurePa) };
}

/**
 * Classifies every hour. Hours with a NaN input or a missing flag are MODE.noData with fraction 0.
 * Throws RangeError only for a bad argument (array lengths); never mid-series for bad data.
 */
export function classifyHours(system: SingleSystem, limits: InletLimits, hours: OutdoorHours, plant: ClassifierPlant): HourClassification {
  const n = hours.dryBulbC.length;
  for (const [name, array] of [
    ['wetBulbC', hours.wetBulbC],
    ['humidityRatio', hours.humidityRatio],
  ] as const) {
    if (array.length !== n) throw new RangeError(`${name} has ${array.length} hours, dryBulbC has ${n}`);
  }
  if (typeof hours.pressurePa !== 'number' && hours.pressurePa.length !== n) {
    throw new RangeError(`pressurePa has ${hours.pressurePa.length} hours, dryBulbC has ${n}`);
  }
  if (hours.flags && hours.flags.length !== n) throw new RangeError(`flags has ${hours.flags.length} hours, dryBulbC has ${n}`);

  const out: HourClassification = {
    modes: new Uint8Array(n),
    humidified: new Uint8Array(n),
    mechanicalFraction: new Float64Array(n),
    excursions: new Uint8Array(n),
    evaporationKgPerKgAir: new Float64Array(n),
  };
  const supplyFlag =
    (system.supplyAirC > limits.dryBulbMaxC ? EXCURSION.supplyAboveMax : 0) | (system.supplyAirC < limits.dryBulbMinC ? EXCURSION.supplyBelowMin : 0);

  const rule =
    system.kind === 'direct-air'
      ? directAirHour(system, plant.fanHeatK, limits, out)
      : system.kind === 'indirect-air'
        ? indirectAirHour(system, plant.fanHeatK, out)
        : waterSideHour(system, out);
  const { dryBulbC, humidityRatio, wetBulbC, pressurePa, flags } = hours;
  const fixedPressure = typeof pressurePa === 'number' ? pressurePa : Number.NaN;
  const pressureSeries = typeof pressurePa === 'number' ? null : pressurePa;

  for (let i = 0; i < n; i++) {
    const t = dryBulbC[i];
    const w = humidityRatio[i];
    const twb = wetBulbC[i];
    const p = pressureSeries === null ? fixedPressure : pressureSeries[i];
    if (t !== t || w !== w || twb !== twb || p !== p || (flags != null && flags[i] === MISSING_FLAG)) {
      out.modes[i] = MODE.noData;
      continue;
    }
    rule(i, t, w, twb, p);
    out.excursions[i] |= supplyFlag;
  }
  return out;
}

/** Classifies hour i of a known-good outdoor state (°C, kg/kg, °C, Pa), writing into the outputs. */
type HourRule = (i: number, t: number, w: number, twb: number, p: number) => void;

/**
 * Humidity ratio where the hour's wet-bulb line reaches tC (ASHRAE 2017 ch. 1 eq. 33/35). Callers pass
 * tC ≥ wetBulbC by construction; the clamp only absorbs rounding of t − ε(t − t*) at ε = 1.
 */
function wetBulbLineW(tC: number, wetBulbC: number, pressurePa: number): number {
  return humidityRatioFromWetBulb(tC > wetBulbC ? tC : wetBulbC, wetBulbC, pressurePa);
}

/** Moist-air enthalpy, kJ/kg dry air: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 32. Inlined for the loop. */
const enthalpy = (tC: number, w: number): number => 1.006 * tC + w * (2501 + 1.86 * tC);

/**
 * Dry-bulb, °C, where the hour's wet-bulb line reaches humidity ratio w: eq. 33 of ASHRAE 2017 ch. 1 solved for t,
 *   t = [(2501 − 2.326·t*)·Ws* + 1.006·t* − W·(2501 − 4.186·t*)] / (1.006 + 1.86·W),
 * with Ws* the saturation humidity ratio at the wet-bulb t* (the line's W at t = t*).
 */
function wetBulbLineC(w: number, wetBulbC: number, pressurePa: number): number {
  const wsStar = wetBulbLineW(wetBulbC, wetBulbC, pressurePa);
  return ((2501 - 2.326 * wetBulbC) * wsStar + 1.006 * wetBulbC - w * (2501 - 4.186 * wetBulbC)) / (1.006 + 1.86 * w);
}

function directAirHour(system: Extract<SingleSystem, { kind: 'direct-air' }>, fanHeatK: number, limits: InletLimits, out: HourClassification): HourRule {
  const { supplyAirC, itDeltaTK, evaporativeEffectiveness: eps } = system;
  const offCoilC = supplyAirC - fanHeatK;
  const returnC = supplyAirC + itDeltaTK;
  let targetsPressure = Number.NaN;
  let targets: MoistureTargets = { highW: 0, lowW: 0, highDewPointC: 0 };
  // Where the mechanical-hour evaporative stage leaves the outdoor air, written by enteringState.
  const entering = { c: 0, w: 0 };

  return (i, t, w, twb, p) => {
    if (p !== targetsPressure) {
      targets = moistureTargets(limits, supplyAirC, p);
      targetsPressure = p;
    }
    const { highW, lowW } = targets;
    let suppliedW = w;

    if (w > highW) {
      out.modes[i] = MODE.mechanical;
      suppliedW = highW;
    } else if (t <= offCoilC) {
      out.modes[i] = MODE.free;
      if (w < lowW && eps > 0) {
        // Free cooling with humidification: outdoor air mixes with return air (held at lowW) and the evaporative
        // stage humidifies the mix to lowW at constant enthalpy, ending at the off-coil temperature. The outdoor
        // share x follows from the enthalpy balance h(offCoil, lowW) = x·h_out + (1 − x)·h(return, lowW).
        out.humidified[i] = 1;
        const returnH = enthalpy(returnC, lowW);
        const outdoorH = enthalpy(t, w);
        const share = returnH > outdoorH ? (returnH - enthalpy(offCoilC, lowW)) / (returnH - outdoorH) : 1;
        out.evaporationKgPerKgAir[i] = (share < 0 ? 0 : share > 1 ? 1 : share) * (lowW - w);
        suppliedW = lowW;
      }
    } else {
      const leavingW = eps > 0 && t - eps * (t - twb) <= offCoilC ? wetBulbLineW(offCoilC, twb, p) : Number.NaN;
      if (leavingW <= highW) {
        out.modes[i] = MODE.adiabatic;
        out.evaporationKgPerKgAir[i] = leavingW - w;
        suppliedW = leavingW;
      } else {
        out.modes[i] = MODE.mechanical;
      }
    }

    if (out.modes[i] === MODE.mechanical) {
      enteringState(t, w, twb, p, eps, highW, entering);
      const fraction = directAirMechanicalFraction(t, w, entering.c, entering.w, offCoilC, returnC, targets);
      out.mechanicalFraction[i] = fraction;
      if (fraction >= 1) return; // full recirculation: the hall keeps its own moisture
      if (entering.w > w) {
        out.evaporationKgPerKgAir[i] = entering.w - w;
        suppliedW = entering.w;
      }
    }
    if (suppliedW < lowW) out.excursions[i] |= EXCURSION.lowHumidity;
  };
}

/**
 * Outdoor air after the evaporative stage in a direct-air mechanical hour, written to `into`: the stage is
 * modulated to the moisture limit — at full effectiveness while the wetted air stays at or below highW, else
 * only as far as highW along the wet-bulb line; off when the outdoor air is already above highW or there is
 * no stage.
 */
function enteringState(t: number, w: number, twb: number, p: number, eps: number, highW: number, into: { c: number; w: number }): void {
  into.c = t;
  into.w = w;
  if (!(eps > 0) || w >= highW) return;
  const fullC = t - eps * (t - twb);
  const fullW = wetBulbLineW(fullC, twb, p);
  if (fullW <= highW) {
    into.c = fullC;
    into.w = fullW;
    return;
  }
  const limitC = wetBulbLineC(highW, twb, p);
  if (limitC < t) {
    into.c = limitC;
    into.w = highW;
  }
}

/**
 * Share of the cooling load left to the coil in a direct-air mechanical hour: the cheaper of cooling
 * the outdoor air (as it leaves the evaporative stage, enteringC/enteringW) to the off-coil temperature, or
 * cooling recirculated return air, over the recirculation load. Too-humid outdoor air is cooled to the
 * dew point of highW and mixed with return air to the off-coil temperature.
 */
function directAirMechanicalFraction(
  t: number,
  w: number,
  enteringC: number,
  enteringW: number,
  offCoilC: number,
  returnC: number,
  targets: MoistureTargets,
): number {
  const hallW = Math.min(w, targets.highW);
  const recirculationLoad = enthalpy(returnC, hallW) - enthalpy(offCoilC, hallW);
  let outdoorLoad: number;
  if (w <= targets.highW) {
    outdoorLoad = enthalpy(enteringC, enteringW) - enthalpy(offCoilC, enteringW);
  } else if (targets.highDewPointC < offCoilC) {
    const outdoorShare = (returnC - offCoilC) / (returnC - targets.highDewPointC);
    outdoorLoad = outdoorShare * (enthalpy(t, w) - enthalpy(targets.highDewPointC, targets.highW));
  } else {
    outdoorLoad = enthalpy(t, w) - enthalpy(offCoilC, targets.highW);
  }
  return Math.min(1, Math.max(0, Math.min(outdoorLoad, recirculationLoad) / recirculationLoad));
}

function indirectAirHour(system: Extract<SingleSystem, { kind: 'indirect-air' }>, fanHeatK: number, out: HourClassification): HourRule {
  const { supplyAirC, itDeltaTK, evaporativeEffectiveness: eps, scavengerAirRatio } = system;
  // The exchanger's hall-side effectiveness at this scavenger air ratio (ε-NTU, cross-flow both unmixed).
  const hx = hallSideEffectiveness(system.heatExchangerEffectiveness, scavengerAirRatio);
  const returnC = supplyAirC + itDeltaTK;
  // Without the exchanger the coil would cool from return plus fan heat down to the supply setpoint.
  const fullLoadK = returnC + fanHeatK - supplyAirC;
  // Scavenger temperature at which the exchanger just delivers the setpoint.
  const neededScavengerC = returnC - fullLoadK / hx;

  return (i, t, w, twb, p) => {
    const drySupplyC = returnC - hx * (returnC - t) + fanHeatK;
    if (drySupplyC <= supplyAirC) {
      out.modes[i] = MODE.free;
      return;
    }
    const wettedScavengerC = t - eps * (t - twb);
    const wetSupplyC = returnC - hx * (returnC - wettedScavengerC) + fanHeatK;
    if (eps > 0 && wetSupplyC <= supplyAirC) {
      out.modes[i] = MODE.adiabatic;
      // The wetted stage is modulated: it only cools the scavenger air as far as needed.
      const scavengerC = Math.max(neededScavengerC, wettedScavengerC);
      out.evaporationKgPerKgAir[i] = scavengerAirRatio * (wetBulbLineW(scavengerC, twb, p) - w);
      return;
    }
    out.modes[i] = MODE.mechanical;
    const bestSupplyC = eps > 0 ? wetSupplyC : drySupplyC;
    // Above the return temperature the exchanger would heat the hall air, so it is bypassed.
    if (bestSupplyC >= returnC + fanHeatK) {
      out.mechanicalFraction[i] = 1;
      return;
    }
    out.mechanicalFraction[i] = (bestSupplyC - supplyAirC) / fullLoadK;
    if (eps > 0) out.evaporationKgPerKgAir[i] = scavengerAirRatio * (wetBulbLineW(wettedScavengerC, twb, p) - w);
  };
}

function waterSideHour(system: Extract<SingleSystem, { kind: 'water-side' }>, out: HourClassification): HourRule {
  const { chilledWaterSupplyC, chilledWaterDeltaTK, approachK, heatRejection, evaporativeEffectiveness: eps, freezeProtectionWetBulbC } = system;
  const tower = heatRejection === 'cooling-tower';
  // Water leaving the heat rejection at this temperature exactly meets the chilled-water setpoint.
  const neededAirC = chilledWaterSupplyC - approachK;

  return (i, t, w, twb, p) => {
    // A tower's water approaches the wet-bulb (the dry-bulb when it runs dry below the freeze-protection
    // wet-bulb); a dry cooler's the dry-bulb, or the pre-cooled air when wetted.
    const dryWaterC = (tower && twb >= freezeProtectionWetBulbC ? twb : t) + approachK;
    if (dryWaterC <= chilledWaterSupplyC) {
      out.modes[i] = MODE.free;
      return;
    }
    if (tower || eps === 0) {
      out.modes[i] = MODE.mechanical;
      out.mechanicalFraction[i] = precoolFraction(dryWaterC, chilledWaterSupplyC, chilledWaterDeltaTK);
      return;
    }
    const preCooledC = t - eps * (t - twb);
    const wetWaterC = preCooledC + approachK;
    if (wetWaterC <= chilledWaterSupplyC) {
      out.modes[i] = MODE.adiabatic;
      out.evaporationKgPerKgAir[i] = wetBulbLineW(Math.max(neededAirC, preCooledC), twb, p) - w;
      return;
    }
    out.modes[i] = MODE.mechanical;
    const fraction = precoolFraction(wetWaterC, chilledWaterSupplyC, chilledWaterDeltaTK);
    out.mechanicalFraction[i] = fraction;
    if (fraction < 1) out.evaporationKgPerKgAir[i] = wetBulbLineW(preCooledC, twb, p) - w;
  };
}

/**
 * Share of the chilled-water load left to the chiller when the economiser cools the return water
 * (supply + ΔT) in series down to waterC: (waterC − supply) / ΔT, clamped to 0…1.
 */
function precoolFraction(waterC: number, chilledWaterSupplyC: number, chilledWaterDeltaTK: number): number {
  return Math.min(1, Math.max(0, (waterC - chilledWaterSupplyC) / chilledWaterDeltaTK));
}
