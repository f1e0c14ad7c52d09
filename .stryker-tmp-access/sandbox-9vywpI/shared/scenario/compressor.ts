/**
 * Compressor performance that follows its lift. Full-load COP is a fixed fraction η of the Carnot COP between
 * the evaporating and condensing temperatures:
 *   COP = η · T_evap / (T_cond − T_evap)   (kelvin; the reversed Carnot cycle, e.g. Çengel & Boles,
 *   "Thermodynamics: An Engineering Approach", ch. 6 — the Carnot-fraction form is common practice),
 * with T_evap = leaving air or chilled water − evaporator approach and T_cond = entering condensing air or
 * water + condenser approach. η is calibrated so the COP equals the rated COP at the rating conditions.
 * Part load: the electric input ratio follows a quadratic in the part-load ratio (common practice), and
 * below the minimum turndown the compressor cycles at its turndown efficiency.
 */
// @ts-nocheck

import { KELVIN_OFFSET } from '../psychrometrics/constants';

/**
 * Rating conditions, °C (AHRI Standard 550/590 for water-chilling packages — recalled from memory): leaving
 * chilled water 6.7 °C (44 °F); air-cooled condenser entering air 35 °C (95 °F); water-cooled condenser
 * entering water 29.4 °C (85 °F).
 */
export const RATING_CONDITIONS = { leavingC: 6.7, airCooledEnteringC: 35, waterCooledEnteringC: 29.4 } as const;

export type CondenserKind = 'air-cooled' | 'water-cooled';

/**
 * Smallest lift, K, the model allows: head-pressure control keeps the condensing temperature up, and the
 * Carnot COP would grow without bound as the lift falls to 0. A judgement of common practice; it caps the
 * COP at η·T_evap / 10 K.
 */
export const MIN_LIFT_K = 10;

/**
 * Part-load curve of the electric input ratio, EIR(PLR) / EIR(1) = a + b·PLR + c·PLR² with a + b + c = 1.
 * The quadratic form is common practice for chillers; these coefficients are an illustrative shape (best
 * efficiency near 60 % load), not a particular machine.
 */
export const PART_LOAD_CURVE = { a: 0.2, b: 0.2, c: 0.6 } as const;

export interface CompressorModel {
  /** Carnot fraction calibrated to the rated COP. */
  carnotFraction: number;
  evaporatorApproachK: number;
  condenserApproachK: number;
  minTurndown: number;
}

/**
 * Carnot COP of a refrigerating machine, T_evap / (T_cond − T_evap) in kelvin, with the lift floored at MIN_LIFT_K.
 * @param evaporatingC evaporating temperature, °C
 * @param condensingC condensing temperature, °C
 */
export function carnotCop(evaporatingC: number, condensingC: number): number {
  const lift = condensingC - evaporatingC;
  return (evaporatingC + KELVIN_OFFSET) / (lift > MIN_LIFT_K ? lift : MIN_LIFT_K);
}

/**
 * The lift model calibrated to `ratedCop` at the rating conditions of `condenser`:
 * η = COP_rated / Carnot COP(6.7 °C − evaporator approach, entering 35 or 29.4 °C + condenser approach).
 */
export function calibrateCompressor(
  ratedCop: number,
  condenser: CondenserKind,
  approaches: { evaporatorApproachK: number; condenserApproachK: number; minTurndown: number },
): CompressorModel {
  if (!(ratedCop > 0)) throw new RangeError(`ratedCop must be above 0, got ${ratedCop}`);
  const entering = condenser === 'air-cooled' ? RATING_CONDITIONS.airCooledEnteringC : RATING_CONDITIONS.waterCooledEnteringC;
  const rated = carnotCop(RATING_CONDITIONS.leavingC - approaches.evaporatorApproachK, entering + approaches.condenserApproachK);
  return {
    carnotFraction: ratedCop / rated,
    evaporatorApproachK: approaches.evaporatorApproachK,
    condenserApproachK: approaches.condenserApproachK,
    minTurndown: approaches.minTurndown,
  };
}

/**
 * Full-load COP at an hour's conditions: η · Carnot COP(leavingC − evaporator approach, condensingMediumC + condenser approach).
 * @param leavingC leaving air (air-side) or chilled water (water-side), °C
 * @param condensingMediumC air or water entering the condenser, °C
 */
export function fullLoadCop(model: CompressorModel, leavingC: number, condensingMediumC: number): number {
  return model.carnotFraction * carnotCop(leavingC - model.evaporatorApproachK, condensingMediumC + model.condenserApproachK);
}

/** EIR(PLR) / EIR(1) of the part-load curve, PLR 0…1. */
export function partLoadInputRatio(plr: number): number {
  const { a, b, c } = PART_LOAD_CURVE;
  return a + b * plr + c * plr * plr;
}

/**
 * Compressor electric power, kW, carrying `loadKw` with a capacity of `capacityKw` at full-load COP `cop`:
 * P = (capacity / COP) · EIR(PLR)/EIR(1), PLR = load / capacity; below the minimum turndown the compressor
 * cycles, P = (PLR / PLR_min) · (capacity / COP) · EIR(PLR_min)/EIR(1). 0 for no load.
 */
export function compressorPowerKw(loadKw: number, capacityKw: number, cop: number, minTurndown: number): number {
  if (!(loadKw > 0)) return 0;
  const plr = loadKw / capacityKw;
  const fullKw = capacityKw / cop;
  if (plr >= minTurndown) return fullKw * partLoadInputRatio(plr);
  return (plr / minTurndown) * fullKw * partLoadInputRatio(minTurndown);
}
