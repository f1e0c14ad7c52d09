/**
 * The hour classifier: each hour of outdoor weather becomes free cooling, adiabatic assist,
 * mechanical or no data, with the fraction of the cooling load the compressors carry, the
 * envelope excursions, and the water the evaporative stage takes up. Typed arrays in and out,
 * no object per hour; the rules per system kind are written out in README.md, "How it works".
 */
import {
  dewPointFromHumidityRatio,
  humidityRatioAtDewPointLimit,
  humidityRatioAtRhLimit,
  humidityRatioFromWetBulb,
  maxHumidityRatioForLimits,
} from '../psychrometrics';
import type { EnvelopeLimits } from './envelopes';
import type { ScenarioSystem } from './schema';

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

export interface HourClassification {
  modes: Uint8Array;
  /** Share of the cooling load (IT + fan heat) carried by compressors, 0…1; 0 outside mechanical hours. */
  mechanicalFraction: Float64Array;
  excursions: Uint8Array;
  /**
   * Water taken up in the evaporative stage, kg per kg of dry air: per kg of hall supply air for
   * the air-side kinds, per kg of heat-rejection air for a water-side dry cooler; 0 for towers
   * (their evaporation follows from the heat rejected, see energy.ts).
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
export function classifyHours(system: ScenarioSystem, limits: InletLimits, hours: OutdoorHours): HourClassification {
  const n = hours.dryBulbC.length;
  for (const [name, array] of [['wetBulbC', hours.wetBulbC], ['humidityRatio', hours.humidityRatio]] as const) {
    if (array.length !== n) throw new RangeError(`${name} has ${array.length} hours, dryBulbC has ${n}`);
  }
  if (typeof hours.pressurePa !== 'number' && hours.pressurePa.length !== n) {
    throw new RangeError(`pressurePa has ${hours.pressurePa.length} hours, dryBulbC has ${n}`);
  }
  if (hours.flags && hours.flags.length !== n) throw new RangeError(`flags has ${hours.flags.length} hours, dryBulbC has ${n}`);

  const out: HourClassification = {
    modes: new Uint8Array(n),
    mechanicalFraction: new Float64Array(n),
    excursions: new Uint8Array(n),
    evaporationKgPerKgAir: new Float64Array(n),
  };
  const supplyFlag =
    (system.supplyAirC > limits.dryBulbMaxC ? EXCURSION.supplyAboveMax : 0) | (system.supplyAirC < limits.dryBulbMinC ? EXCURSION.supplyBelowMin : 0);

  const rule =
    system.kind === 'direct-air' ? directAirHour(system, limits, out) : system.kind === 'indirect-air' ? indirectAirHour(system, out) : waterSideHour(system, out);
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

function directAirHour(system: Extract<ScenarioSystem, { kind: 'direct-air' }>, limits: InletLimits, out: HourClassification): HourRule {
  const { supplyAirC, fanHeatK, itDeltaTK, evaporativeEffectiveness: eps } = system;
  const offCoilC = supplyAirC - fanHeatK;
  const returnC = supplyAirC + itDeltaTK;
  let targetsPressure = Number.NaN;
  let targets: MoistureTargets = { highW: 0, lowW: 0, highDewPointC: 0 };

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
      if (w >= lowW) {
        out.modes[i] = MODE.free;
      } else if (eps > 0) {
        // Mixing with return air warms the outdoor air to the off-coil temperature; the outdoor share
        // of the supply follows from a sensible mixing balance; the evaporative stage humidifies it to lowW.
        out.modes[i] = MODE.adiabatic;
        const outdoorShare = returnC > t ? Math.min(1, Math.max(0, (returnC - offCoilC) / (returnC - t))) : 1;
        out.evaporationKgPerKgAir[i] = outdoorShare * (lowW - w);
        suppliedW = lowW;
      } else {
        out.modes[i] = MODE.free;
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
      const fraction = directAirMechanicalFraction(t, w, twb, p, eps, offCoilC, returnC, targets);
      out.mechanicalFraction[i] = fraction;
      if (fraction >= 1) return; // full recirculation: the hall keeps its own moisture
      if (w <= highW && eps > 0) {
        // The outdoor-air path was the cheaper one; its evaporative pre-cooling runs at full effectiveness.
        const preCooledW = wetBulbLineW(t - eps * (t - twb), twb, p);
        if (preCooledW <= highW) {
          out.evaporationKgPerKgAir[i] = preCooledW - w;
          suppliedW = preCooledW;
        }
      }
    }
    if (suppliedW < lowW) out.excursions[i] |= EXCURSION.lowHumidity;
  };
}

/**
 * Share of the cooling load left to the coil in a direct-air mechanical hour: the cheaper of cooling
 * (pre-cooled) outdoor air to the off-coil temperature, or cooling recirculated return air, over
 * the recirculation load. Too-humid outdoor air is cooled to the dew point of highW and mixed with
 * return air to the off-coil temperature.
 */
function directAirMechanicalFraction(
  t: number,
  w: number,
  twb: number,
  p: number,
  eps: number,
  offCoilC: number,
  returnC: number,
  targets: MoistureTargets,
): number {
  const hallW = Math.min(w, targets.highW);
  const recirculationLoad = enthalpy(returnC, hallW) - enthalpy(offCoilC, hallW);
  let outdoorLoad: number;
  if (w <= targets.highW) {
    let enteringC = t;
    let enteringW = w;
    if (eps > 0) {
      const preCooledC = t - eps * (t - twb);
      const preCooledW = wetBulbLineW(preCooledC, twb, p);
      if (preCooledW <= targets.highW) {
        enteringC = preCooledC;
        enteringW = preCooledW;
      }
    }
    outdoorLoad = enthalpy(enteringC, enteringW) - enthalpy(offCoilC, enteringW);
  } else if (targets.highDewPointC < offCoilC) {
    const outdoorShare = (returnC - offCoilC) / (returnC - targets.highDewPointC);
    outdoorLoad = outdoorShare * (enthalpy(t, w) - enthalpy(targets.highDewPointC, targets.highW));
  } else {
    outdoorLoad = enthalpy(t, w) - enthalpy(offCoilC, targets.highW);
  }
  return Math.min(1, Math.max(0, Math.min(outdoorLoad, recirculationLoad) / recirculationLoad));
}

function indirectAirHour(system: Extract<ScenarioSystem, { kind: 'indirect-air' }>, out: HourClassification): HourRule {
  const { supplyAirC, fanHeatK, itDeltaTK, evaporativeEffectiveness: eps, heatExchangerEffectiveness: hx, scavengerAirRatio } = system;
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

function waterSideHour(system: Extract<ScenarioSystem, { kind: 'water-side' }>, out: HourClassification): HourRule {
  const { chilledWaterSupplyC, chilledWaterDeltaTK, approachK, heatRejection, evaporativeEffectiveness: eps } = system;
  const tower = heatRejection === 'cooling-tower';
  // Water leaving the heat rejection at this temperature exactly meets the chilled-water setpoint.
  const neededAirC = chilledWaterSupplyC - approachK;

  return (i, t, w, twb, p) => {
    // A tower's water approaches the wet-bulb; a dry cooler's the dry-bulb, or the pre-cooled air when wetted.
    const dryWaterC = (tower ? twb : t) + approachK;
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
