/**
 * "Is this air inside the envelope?" — the one test, by the envelope's own limits: dry-bulb range, dew-point range and
 * RH range (over liquid water, WMO-No. 8), at the air's pressure. The classifier (supply air at the setpoint), the
 * excursion count (the modelled inlet) and the moist-air chart's table (the site's hours) all call it.
 *
 * The moisture limits are compared as humidity ratios, which is exact and cheap: at a given dry-bulb and pressure,
 * dew point and RH both rise with W, so "dew point ≤ limit" is "W ≤ W at that dew point" (ASHRAE Handbook—
 * Fundamentals 2017 ch. 1 eq. 20 with 36) and "RH ≤ limit" is "W ≤ W at (dry-bulb, that RH)" (eq. 20 with 22,
 * saturation pressure eq. 6).
 */
import { MOLAR_MASS_RATIO } from '../psychrometrics/constants';
import { lnSaturationPressure } from '../psychrometrics/saturation';
import type { EnvelopeLimits } from './envelopes';

/** The six limits the test reads; a dry-bulb maximum derated for altitude is already applied by the caller. */
export type EnvelopeTestLimits = Omit<EnvelopeLimits, 'altitudeDerating'>;

/** Which side of the envelope the air is on (bit flags; air may break two limits at once). 0: inside. */
export const ENVELOPE_BREACH = { warm: 1, cold: 2, humid: 4, dry: 8 } as const;

/**
 * How far past a limit air may be and still count as inside: for callers whose air is set exactly to a limit by a
 * different chain of arithmetic (the excursion count's inlet model holds a coil at the setpoint or at the upper
 * moisture limit). The classifier and the chart use none.
 */
export interface EnvelopeSlack {
  dryBulbK: number;
  /** kg/kg */
  humidityRatio: number;
}

export const NO_SLACK: EnvelopeSlack = { dryBulbK: 0, humidityRatio: 0 };

/** W, kg/kg, of air whose vapour pressure is pwPa at pressurePa (eq. 20, unchecked: NaN/negative pass through). */
const wAt = (pwPa: number, pressurePa: number): number => (MOLAR_MASS_RATIO * pwPa) / (pressurePa - pwPa);

/** The humidity ratios, kg/kg, between which air at one dry-bulb and pressure meets the envelope's moisture limits. */
export interface EnvelopeMoistureLimits {
  /** The larger of W at the dew-point floor and W at (dry-bulb, RH floor). */
  lowW: number;
  /** The smaller of W at the dew-point ceiling and W at (dry-bulb, RH ceiling). */
  highW: number;
}

/**
 * The envelope's moisture limits as humidity ratios for air at dryBulbC (°C) and pressurePa (Pa), written into `into`.
 * No checks (NaN passes through): a kernel for loops.
 * Sources: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 6 (saturation over water), 20, 22, 36.
 */
export function envelopeMoistureLimits(
  limits: EnvelopeTestLimits,
  dryBulbC: number,
  pressurePa: number,
  into: EnvelopeMoistureLimits = { lowW: 0, highW: 0 },
): EnvelopeMoistureLimits {
  const dewMinW = wAt(Math.exp(lnSaturationPressure(limits.dewPointMinC)), pressurePa);
  const dewMaxW = wAt(Math.exp(lnSaturationPressure(limits.dewPointMaxC)), pressurePa);
  return withRhLimits(limits, dewMinW, dewMaxW, Math.exp(lnSaturationPressure(dryBulbC)), pressurePa, into);
}

/** The moisture limits from W at the dew-point limits and the saturation pressure at the dry-bulb, Pa. */
function withRhLimits(
  limits: EnvelopeTestLimits,
  dewMinW: number,
  dewMaxW: number,
  pwsPa: number,
  pressurePa: number,
  into: EnvelopeMoistureLimits,
): EnvelopeMoistureLimits {
  into.lowW = Math.max(dewMinW, wAt((limits.rhMinPct / 100) * pwsPa, pressurePa));
  into.highW = Math.min(dewMaxW, wAt((limits.rhMaxPct / 100) * pwsPa, pressurePa));
  return into;
}

/**
 * The ENVELOPE_BREACH bits (0: inside) of air at dryBulbC holding humidityRatio, given the envelope's moisture limits
 * at that dry-bulb and pressure ({@link envelopeMoistureLimits}). A NaN input sets no bit: callers skip hours
 * without data first.
 */
export function envelopeBreach(
  limits: EnvelopeTestLimits,
  dryBulbC: number,
  humidityRatio: number,
  moisture: EnvelopeMoistureLimits,
  slack: EnvelopeSlack = NO_SLACK,
): number {
  let breach = 0;
  if (dryBulbC > limits.dryBulbMaxC + slack.dryBulbK) breach |= ENVELOPE_BREACH.warm;
  if (dryBulbC < limits.dryBulbMinC - slack.dryBulbK) breach |= ENVELOPE_BREACH.cold;
  if (humidityRatio > moisture.highW + slack.humidityRatio) breach |= ENVELOPE_BREACH.humid;
  if (humidityRatio < moisture.lowW - slack.humidityRatio) breach |= ENVELOPE_BREACH.dry;
  return breach;
}

/**
 * A prepared test for one envelope: a function of (dry-bulb °C, humidity ratio kg/kg, pressure Pa) giving
 * {@link envelopeBreach}'s bits. It keeps W at the dew-point limits for the last pressure and the saturation pressure
 * for the last dry-bulb, so a loop at one pressure, or at one dry-bulb (a supply setpoint), computes them once.
 */
export function envelopeTest(
  limits: EnvelopeTestLimits,
  slack: EnvelopeSlack = NO_SLACK,
): (dryBulbC: number, humidityRatio: number, pressurePa: number) => number {
  const lnDewMinPa = lnSaturationPressure(limits.dewPointMinC);
  const lnDewMaxPa = lnSaturationPressure(limits.dewPointMaxC);
  const moisture: EnvelopeMoistureLimits = { lowW: 0, highW: 0 };
  let pressure = Number.NaN;
  let dewMinW = 0;
  let dewMaxW = 0;
  let dryBulb = Number.NaN;
  let pws = Number.NaN;
  return (t, w, p) => {
    if (p !== pressure || t !== dryBulb) {
      if (p !== pressure) {
        dewMinW = wAt(Math.exp(lnDewMinPa), p);
        dewMaxW = wAt(Math.exp(lnDewMaxPa), p);
        pressure = p;
      }
      if (t !== dryBulb) {
        pws = Math.exp(lnSaturationPressure(t));
        dryBulb = t;
      }
      withRhLimits(limits, dewMinW, dewMaxW, pws, p, moisture);
    }
    return envelopeBreach(limits, t, w, moisture, slack);
  };
}

/**
 * True when air at dryBulbC holding humidityRatio (kg/kg) at pressurePa (Pa) is inside the envelope: within its
 * dry-bulb range, its dew-point range and its RH range; false for a NaN input. For one state; loops use {@link envelopeTest}.
 */
export function insideEnvelope(
  limits: EnvelopeTestLimits,
  dryBulbC: number,
  humidityRatio: number,
  pressurePa: number,
  slack: EnvelopeSlack = NO_SLACK,
): boolean {
  if (!(dryBulbC === dryBulbC && humidityRatio === humidityRatio && pressurePa === pressurePa)) return false; // no state, not inside
  return envelopeTest(limits, slack)(dryBulbC, humidityRatio, pressurePa) === 0;
}
