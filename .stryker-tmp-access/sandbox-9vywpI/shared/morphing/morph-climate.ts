// @ts-nocheck
import type { ClimateSeries } from '../climate';
import { hourlyPressurePa } from '../psychrometrics';
import { HOUR_FLAG } from '../climate/types';
import { MONTH_NAMES, type ChangeFactors } from './factors';
import { rhPctFromSpecificHumidity, specificHumidityOfHours } from './humidity';
import { localCalendar } from './local-days';
import { monthlyDayStatistics } from './monthly-day-statistics';
import { shiftAndStretchByMonth, shiftByMonth, stretchByMonth, stretchFactors } from './operations';

export interface MorphClimateInput {
  series: ClimateSeries;
  factors: ChangeFactors;
  /** The site's standard-time offset, minutes: days and months are the site's. */
  utcOffsetMinutes: number;
  /** The site's elevation, m: the standard atmosphere there fills missing station pressure (hourlyPressurePa). */
  elevationM: number;
}

export interface MorphedClimate {
  ok: true;
  /** The projection: same hours, flags and pressure as the parent; dry-bulb morphed; humidity as RH %. */
  series: ClimateSeries;
  /** Hours whose RH was bounded to 100 % (moisture above saturation at the morphed dry-bulb). */
  clampedHighHours: number;
  /** Hours whose RH was bounded to 0 % (a negative specific humidity after a shift). */
  clampedLowHours: number;
  /** Hours that had data in the parent but none in the projection (state outside the engine's range). */
  lostHours: number;
  /** α_m of the shift-and-stretch (zeros for shift). */
  alphaByMonth: number[];
  /** The parent's monthly dry-bulb statistics the equations used, °C; null for a month without data. */
  parentDryBulb: { meanC: (number | null)[]; meanDailyMaxC: (number | null)[]; meanDailyMinC: (number | null)[] };
}

export type MorphOutcome = MorphedClimate | { ok: false; problems: string[] };

const orNull = (a: Float64Array) => Array.from(a, (v) => (v === v ? v : null));

/**
 * A future-climate series from a parent series by the morphing of Belcher, Hacker and Powell (2005):
 * dry-bulb by shift or shift-and-stretch with the parent's own monthly statistics on the site's local days,
 * humidity through specific humidity (stretch by a percent change or shift in g/kg), then back to RH at
 * the morphed dry-bulb and the hour's pressure, bounded to 0–100 %. Hours with no data stay without data.
 * Refuses (ok: false, naming the month) factors whose ΔTmax − ΔTmin would invert a month's mean daily range.
 */
export function morphClimate(input: MorphClimateInput): MorphOutcome {
  const { series, factors, utcOffsetMinutes, elevationM } = input;
  const n = series.timestampsMs.length;
  const calendar = localCalendar(series.timestampsMs, utcOffsetMinutes);
  const stats = monthlyDayStatistics(series.dryBulbC, calendar);
  const months = factors.months;
  const pick = (f: (m: (typeof months)[number]) => number) => Float64Array.from(months, f);

  const dryBulbC = new Float64Array(n);
  let alpha: Float64Array = new Float64Array(12);
  if (factors.dryBulbMethod === 'shift-and-stretch') {
    alpha = stretchFactors(
      pick((m) => m.deltaMaxK),
      pick((m) => m.deltaMinK),
      stats.meanDailyMax,
      stats.meanDailyMin,
    );
    const problems: string[] = [];
    for (let m = 0; m < 12; m++) {
      // The daily range scales by (1 + α); at or below zero the days would turn upside down.
      if (stats.hours[m] > 0 && 1 + alpha[m] <= 0) {
        const range = stats.meanDailyMax[m] - stats.meanDailyMin[m];
        problems.push(
          `${MONTH_NAMES[m]}: ΔTmax − ΔTmin = ${(months[m].deltaMaxK - months[m].deltaMinK).toFixed(2)} K would remove the parent's mean daily range of ${range.toFixed(2)} K; use a smaller difference`,
        );
      }
    }
    if (problems.length) return { ok: false, problems };
    shiftAndStretchByMonth(
      series.dryBulbC,
      calendar.monthOfHour,
      pick((m) => m.deltaMeanK),
      alpha,
      stats.mean,
      dryBulbC,
    );
  } else {
    shiftByMonth(
      series.dryBulbC,
      calendar.monthOfHour,
      pick((m) => m.deltaMeanK),
      dryBulbC,
    );
  }

  const { pressurePa } = hourlyPressurePa(series, elevationM);
  const q = specificHumidityOfHours({ dryBulbC: series.dryBulbC, humidity: series.humidity, pressurePa });
  if (factors.humidityMethod === 'stretch')
    stretchByMonth(
      q,
      calendar.monthOfHour,
      pick((m) => 1 + m.humidityChangePct / 100),
      q,
    );
  else
    shiftByMonth(
      q,
      calendar.monthOfHour,
      pick((m) => m.humidityShiftGPerKg / 1000),
      q,
    );
  const rhPct = new Float64Array(n);
  const clamped = rhPctFromSpecificHumidity(dryBulbC, q, pressurePa, rhPct);

  const flags = Uint8Array.from(series.flags);
  let lostHours = 0;
  for (let i = 0; i < n; i++) {
    const hasData = dryBulbC[i] === dryBulbC[i] && rhPct[i] === rhPct[i];
    if (!hasData && flags[i] !== HOUR_FLAG.missing) {
      if (series.dryBulbC[i] === series.dryBulbC[i]) lostHours++;
      flags[i] = HOUR_FLAG.missing;
      dryBulbC[i] = Number.NaN;
      rhPct[i] = Number.NaN;
    }
  }

  return {
    ok: true,
    series: {
      timestampsMs: Float64Array.from(series.timestampsMs),
      dryBulbC,
      humidity: { kind: 'relative-humidity-pct', values: rhPct },
      pressurePa: series.pressurePa ? Float64Array.from(series.pressurePa) : null,
      flags,
    },
    clampedHighHours: clamped.clampedHigh,
    clampedLowHours: clamped.clampedLow,
    lostHours,
    alphaByMonth: Array.from(alpha),
    parentDryBulb: { meanC: orNull(stats.mean), meanDailyMaxC: orNull(stats.meanDailyMax), meanDailyMinC: orNull(stats.meanDailyMin) },
  };
}
