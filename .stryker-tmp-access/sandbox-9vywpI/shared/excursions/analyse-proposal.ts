/**
 * One operator's proposal over a run's climate series: the inlet state per hour (inlet-model.ts), then
 * the excursion totals (excursion-count.ts) against a recommended range and an allowable class.
 * Pure and synchronous: the worker task and the tests call the same function.
 */
// @ts-nocheck

import { bulkStates, hourlyPressurePa } from '../psychrometrics';
import { MODE } from '../scenario/classify';
import { deratedDryBulbMaxC, type EnvelopeLimits } from '../scenario/envelopes';
import { designFanHeatK } from '../scenario/fans';
import { hallAirSystem } from '../scenario/hybrid';
import type { ScenarioSeries } from '../scenario/run';
import type { Scenario } from '../scenario/schema';
import { countExcursions, type EnvelopeBounds, type ExcursionCounts } from './excursion-count';
import { modelInletHours } from './inlet-model';

/**
 * The guideline's limit on the rate of change of inlet dry-bulb that hourly data can test: 20 °C in an hour
 * (ASHRAE TC 9.9 Thermal Guidelines, A1–A4; the companion limit of 5 °C in 15 minutes needs finer data).
 * Recalled from memory, not checked against the guideline text.
 */
export const HOURLY_RATE_LIMIT_K = 20;
const HOURS_PER_YEAR = 8760;

export interface Proposal {
  /** Supply setpoint at the IT inlet, °C. */
  supplyAirC: number;
  /** Supply may float up to this before evaporative cooling or compressors start, °C; null: hold the setpoint. */
  floatUpToC: number | null;
  /** Envelope the controls work to (moisture limits of direct air, as in the run). */
  control: EnvelopeLimits;
  recommended: EnvelopeLimits;
  allowable: EnvelopeLimits;
}

export interface ExcursionAnalysis extends ExcursionCounts {
  /** The limits as applied: dry-bulb maxima derated for the site's elevation. */
  applied: {
    supplyAirC: number;
    ceilingC: number;
    hallDewPointC: number | null;
    recommended: EnvelopeBounds;
    allowable: EnvelopeBounds;
    control: EnvelopeBounds;
  };
  /** Hours per mode under the proposal. */
  modes: { free: number; adiabatic: number; mechanical: number; noData: number };
  /** Excursion events per year of data (events ÷ (hours with data ÷ 8760)); null without data. */
  eventsPerYear: number | null;
  allowableEventsPerYear: number | null;
  /** Years of data the totals cover (hours with data ÷ 8760). */
  yearsOfData: number;
}

/**
 * Excursions of the inlet under `proposal` for `scenario` (as run) over `series`; `elevationM` is the site's
 * (standard-atmosphere pressure where the series has none, and altitude derating of each envelope).
 */
export function analyseProposal(scenario: Scenario, series: ScenarioSeries, elevationM: number, proposal: Proposal): ExcursionAnalysis {
  const n = series.dryBulbC.length;
  if (series.timestampsMs.length !== n) throw new RangeError(`timestampsMs has ${series.timestampsMs.length} hours, dryBulbC has ${n}`);
  const { pressurePa } = hourlyPressurePa(series, elevationM);
  const states = bulkStates({ dryBulbC: series.dryBulbC, humidity: series.humidity, pressurePa });

  const derate = (e: EnvelopeLimits): EnvelopeBounds => ({
    dryBulbMinC: e.dryBulbMinC,
    dryBulbMaxC: deratedDryBulbMaxC(e.dryBulbMaxC, elevationM, e.altitudeDerating),
    dewPointMinC: e.dewPointMinC,
    dewPointMaxC: e.dewPointMaxC,
    rhMinPct: e.rhMinPct,
    rhMaxPct: e.rhMaxPct,
  });
  const control = derate(proposal.control);
  const recommended = derate(proposal.recommended);
  const allowable = derate(proposal.allowable);
  const ceilingC = proposal.floatUpToC === null ? proposal.supplyAirC : Math.max(proposal.supplyAirC, proposal.floatUpToC);
  // Where outdoor air never enters, the hall is assumed held mid-way between the recommended dew-point limits.
  const hallDewPointC = (recommended.dewPointMinC + recommended.dewPointMaxC) / 2;

  const inlet = modelInletHours(
    hallAirSystem(scenario.system),
    control,
    { dryBulbC: series.dryBulbC, wetBulbC: states.wetBulbC, humidityRatio: states.humidityRatio, pressurePa, flags: series.flags },
    { supplyAirC: proposal.supplyAirC, ceilingC, hallDewPointC },
    { fanHeatK: designFanHeatK(scenario.energy.fanPowerFraction, hallAirSystem(scenario.system).itDeltaTK) },
  );
  const counts = countExcursions({
    timestampsMs: series.timestampsMs,
    inletC: inlet.inletC,
    inletW: inlet.inletW,
    pressurePa,
    recommended,
    allowable,
    rateLimitKPerHour: HOURLY_RATE_LIMIT_K,
  });

  const modes = { free: 0, adiabatic: 0, mechanical: 0, noData: 0 };
  for (let i = 0; i < inlet.modes.length; i++) {
    const m = inlet.modes[i];
    if (m === MODE.free) modes.free++;
    else if (m === MODE.adiabatic) modes.adiabatic++;
    else if (m === MODE.mechanical) modes.mechanical++;
    else modes.noData++;
  }
  const yearsOfData = counts.dataHours / HOURS_PER_YEAR;
  return {
    ...counts,
    applied: {
      supplyAirC: proposal.supplyAirC,
      ceilingC,
      hallDewPointC: hallAirSystem(scenario.system).kind === 'direct-air' ? null : hallDewPointC,
      recommended,
      allowable,
      control,
    },
    modes,
    eventsPerYear: yearsOfData > 0 ? counts.events.count / yearsOfData : null,
    allowableEventsPerYear: yearsOfData > 0 ? counts.allowableEvents.count / yearsOfData : null,
    yearsOfData,
  };
}
