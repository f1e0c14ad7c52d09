/**
 * The IT inlet state, hour by hour, under an operator's proposal: a supply setpoint, and optionally a
 * ceiling the supply may float up to before the evaporative stage or the compressors start. The hall
 * inlet follows the controlled supply air (no recirculation or bypass inside the hall is modelled).
 *
 * The hour's mode comes from the run's own classifier (shared/scenario/classify.ts) with the supply at
 * the ceiling (the setpoint when nothing floats), so "free cooling" here means what it means in a run.
 * Then, with Ts the setpoint, Tc the ceiling, f the fan heat, ε the evaporative effectiveness and
 * tE = T − ε(T − Twb) the air leaving a fully wetted stage:
 *
 * direct-air — outdoor air reaches the hall; mixing with return air never lets the supply fall below Ts:
 *   free: dry-bulb max(Ts, T + f), moisture the outdoor humidity ratio;
 *   free with humidification (air too dry): dry-bulb max(Ts, T + f), humidified to the envelope's lower limit;
 *   adiabatic, cooling (T + f > Tc): dry-bulb max(Ts, tE + f), moisture on the outdoor wet-bulb line at
 *     that temperature less the fan heat (the stage modulated to just reach it);
 *   mechanical: the coil holds Ts and dehumidifies to the envelope's upper limit at Ts: min(W, W_hi(Ts)).
 * indirect-air — hall air never meets outdoor air. The exchanger's steady supply with return = supply +
 *   ΔT_IT is S = Tsc + (ΔT_IT(1 − ε_hx) + f) / ε_hx for scavenger air at Tsc, ε_hx the hall-side
 *   effectiveness at the scenario's scavenger air ratio (shared/scenario/exchanger.ts) (the same condition the
 *   classifier tests, solved for S): free max(Ts, S(T)); adiabatic max(Ts, S(tE)); mechanical Ts.
 * water-side — the coil keeps the scenario's approach a = supplyAirC − chilledWaterSupplyC: the
 *   economiser's water w = (Twb for a tower, else T, or tE when the dry cooler is wetted) + approachK gives
 *   a supply max(Ts, w + a) in free and adiabatic hours; mechanical Ts. The ceiling moves the chilled-water
 *   setpoint the classifier compares with to Tc − a.
 * indirect-air and water-side keep the hall's moisture: assumed held (by separate humidity control, not
 *   modelled) at the dew point `hallDewPointC` the caller chooses; only their dry-bulb moves.
 */
// @ts-nocheck

import { humidityRatioFromDewPoint, humidityRatioFromWetBulb } from '../psychrometrics';
import { classifyHours, MODE, moistureTargets, type ClassifierPlant, type InletLimits, type OutdoorHours } from '../scenario/classify';
import { hallSideEffectiveness } from '../scenario/exchanger';
import type { SingleSystem } from '../scenario/schema';

export interface InletProposal {
  /** Supply setpoint at the IT inlet, °C. */
  supplyAirC: number;
  /** The supply may float up to this, °C, before the evaporative stage or compressors start; ≥ supplyAirC. */
  ceilingC: number;
  /** Dew point, °C, the hall is held at where outdoor air never enters (indirect-air, water-side). */
  hallDewPointC: number;
}

export interface InletHours {
  /** Mode of each hour under the proposal (MODE codes of shared/scenario/classify.ts). */
  modes: Uint8Array;
  /** IT inlet dry-bulb, °C; NaN in no-data hours. */
  inletC: Float64Array;
  /** IT inlet humidity ratio, kg/kg dry air; NaN in no-data hours. */
  inletW: Float64Array;
}

/**
 * Inlet dry-bulb and humidity ratio per hour for `system` (as run) under `proposal`, with the control
 * envelope `limits` (dry-bulb maximum already derated). Psychrometric relations: ASHRAE Handbook—
 * Fundamentals (2017) ch. 1 (eq. 33/35 wet-bulb line, eq. 36 dew point) through shared/psychrometrics.
 * `plant.fanHeatK` is the design fan heat derived from the fan power (shared/scenario/fans.ts, designFanHeatK).
 * Throws RangeError for a bad proposal (a ceiling below the setpoint, a non-finite value).
 */
export function modelInletHours(system: SingleSystem, limits: InletLimits, outdoor: OutdoorHours, proposal: InletProposal, plant: ClassifierPlant): InletHours {
  const { supplyAirC: ts, ceilingC: tc, hallDewPointC } = proposal;
  if (!Number.isFinite(ts)) throw new RangeError(`supplyAirC must be a finite number, got ${ts}`);
  if (!Number.isFinite(tc) || tc < ts) throw new RangeError(`ceilingC must be a number at or above supplyAirC ${ts} °C, got ${tc}`);
  if (!Number.isFinite(hallDewPointC)) throw new RangeError(`hallDewPointC must be a finite number, got ${hallDewPointC}`);

  const classified = classifyHours(atCeiling(system, tc), limits, outdoor, plant);
  const { modes, humidified } = classified;
  const n = modes.length;
  const inletC = new Float64Array(n);
  const inletW = new Float64Array(n);
  const { dryBulbC, wetBulbC, humidityRatio, pressurePa } = outdoor;
  const fixedPressure = typeof pressurePa === 'number' ? pressurePa : Number.NaN;
  const pressureSeries = typeof pressurePa === 'number' ? null : pressurePa;
  const eps = system.evaporativeEffectiveness;
  const f = plant.fanHeatK;

  // Moisture targets and the hall's humidity ratio change only with pressure: recomputed when it changes.
  let cachedPressure = Number.NaN;
  let lowWAtCeiling = 0;
  let highWAtSetpoint = 0;
  let hallW = 0;

  // Dry-bulb offset of the supply above the scavenger air or economiser water, K (indirect-air, water-side).
  let offsetK = 0;
  if (system.kind === 'indirect-air') {
    const hx = hallSideEffectiveness(system.heatExchangerEffectiveness, system.scavengerAirRatio);
    offsetK = (system.itDeltaTK * (1 - hx) + f) / hx;
  } else if (system.kind === 'water-side') {
    offsetK = system.supplyAirC - system.chilledWaterSupplyC + system.approachK;
  }
  const tower = system.kind === 'water-side' && system.heatRejection === 'cooling-tower';

  for (let i = 0; i < n; i++) {
    const mode = modes[i];
    if (mode === MODE.noData) {
      inletC[i] = Number.NaN;
      inletW[i] = Number.NaN;
      continue;
    }
    const t = dryBulbC[i];
    const w = humidityRatio[i];
    const twb = wetBulbC[i];
    const p = pressureSeries === null ? fixedPressure : pressureSeries[i];
    if (p !== cachedPressure) {
      cachedPressure = p;
      lowWAtCeiling = moistureTargets(limits, tc, p).lowW;
      highWAtSetpoint = moistureTargets(limits, ts, p).highW;
      hallW = humidityRatioFromDewPoint(hallDewPointC, p);
    }
    const tE = t - eps * (t - twb);

    if (system.kind === 'direct-air') {
      if (mode === MODE.mechanical) {
        inletC[i] = ts;
        inletW[i] = w < highWAtSetpoint ? w : highWAtSetpoint;
      } else if (mode === MODE.free) {
        inletC[i] = Math.max(ts, t + f);
        inletW[i] = humidified[i] === 1 ? lowWAtCeiling : w;
      } else {
        const c = Math.max(ts, tE + f);
        inletC[i] = c;
        inletW[i] = humidityRatioFromWetBulb(c - f > twb ? c - f : twb, twb, p);
      }
      continue;
    }

    inletW[i] = hallW;
    if (mode === MODE.mechanical) {
      inletC[i] = ts;
    } else if (system.kind === 'indirect-air') {
      inletC[i] = Math.max(ts, (mode === MODE.free ? t : tE) + offsetK);
    } else {
      inletC[i] = Math.max(ts, (mode === MODE.free ? (tower ? twb : t) : tE) + offsetK);
    }
  }
  return { modes, inletC, inletW };
}

/** The system with its supply (and, water-side, its chilled-water setpoint) moved to the ceiling, for the classifier. */
function atCeiling(system: SingleSystem, ceilingC: number): SingleSystem {
  if (system.kind === 'water-side') {
    const coilApproachK = system.supplyAirC - system.chilledWaterSupplyC;
    return { ...system, supplyAirC: ceilingC, chilledWaterSupplyC: ceilingC - coilApproachK };
  }
  return { ...system, supplyAirC: ceilingC };
}
