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

/**
 * A prepared test for one envelope: a function of (dry-bulb °C, humidity ratio kg/kg, pressure Pa) giving the
 * ENVELOPE_BREACH bits (0 inside). It keeps the limits' humidity ratios for the last pressure and dry-bulb it saw,
 * so a loop over hours at one pressure, or at one supply temperature, computes them once. A NaN input sets no bit:
 * callers skip hours without data first.
 * Sources: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 6 (saturation over water), 20, 22, 36.
 */
export function envelopeTest(
  limits: EnvelopeTestLimits,
  slack: EnvelopeSlack = NO_SLACK,
): (dryBulbC: number, humidityRatio: number, pressurePa: number) => number {
  const { dryBulbMinC, dryBulbMaxC, rhMinPct, rhMaxPct } = limits;
  const lnDewMin = lnSaturationPressure(limits.dewPointMinC);
  const lnDewMax = lnSaturationPressure(limits.dewPointMaxC);
  const tSlack = slack.dryBulbK;
  const wSlack = slack.humidityRatio;
  let pressure = Number.NaN;
  let dewMinW = 0;
  let dewMaxW = 0;
  let rhPressure = Number.NaN;
  let rhDryBulb = Number.NaN;
  let rhMinW = 0;
  let rhMaxW = 0;
  return (t, w, p) => {
    if (p !== pressure) {
      pressure = p;
      dewMinW = wAt(Math.exp(lnDewMin), p);
      dewMaxW = wAt(Math.exp(lnDewMax), p);
    }
    if (t !== rhDryBulb || p !== rhPressure) {
      rhDryBulb = t;
      rhPressure = p;
      const pws = Math.exp(lnSaturationPressure(t));
      rhMinW = wAt((rhMinPct / 100) * pws, p);
      rhMaxW = wAt((rhMaxPct / 100) * pws, p);
    }
    let breach = 0;
    if (t > dryBulbMaxC + tSlack) breach |= ENVELOPE_BREACH.warm;
    if (t < dryBulbMinC - tSlack) breach |= ENVELOPE_BREACH.cold;
    if (w > dewMaxW + wSlack || w > rhMaxW + wSlack) breach |= ENVELOPE_BREACH.humid;
    if (w < dewMinW - wSlack || w < rhMinW - wSlack) breach |= ENVELOPE_BREACH.dry;
    return breach;
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
