/**
 * The three morphing operations of Belcher, Hacker and Powell (2005), "Constructing design weather data
 * for future climates", Building Services Engineering Research and Technology 26(1) 49–61, applied per
 * calendar month m to an hourly series x0. Each takes twelve monthly factors (index 0 = January), the
 * month of each hour (localCalendar) and writes into `out`; a missing hour (NaN) stays NaN.
 */
// @ts-nocheck


function requireTwelve(name: string, factors: ArrayLike<number>): void {
  if (factors.length !== 12) throw new RangeError(`${name} must hold 12 monthly values (got ${factors.length})`);
}

function requireSameLength(values: Float64Array, monthOfHour: Uint8Array, out: Float64Array): void {
  if (monthOfHour.length !== values.length) throw new RangeError(`monthOfHour has ${monthOfHour.length} hours but values has ${values.length}`);
  if (out.length !== values.length) throw new RangeError(`out has ${out.length} hours but values has ${values.length}`);
}

/**
 * Shift: x = x0 + Δx_m. For a quantity whose change is given as an absolute difference (°C, K, g/kg).
 * Source: Belcher, Hacker and Powell (2005), the shift operation.
 */
export function shiftByMonth(values: Float64Array, monthOfHour: Uint8Array, deltaByMonth: ArrayLike<number>, out: Float64Array): Float64Array {
  requireTwelve('deltaByMonth', deltaByMonth);
  requireSameLength(values, monthOfHour, out);
  for (let i = 0; i < values.length; i++) out[i] = values[i] + deltaByMonth[monthOfHour[i]];
  return out;
}

/**
 * Stretch: x = α_m · x0. For a quantity on a ratio scale (zero means none of it), with the change given as
 * a fraction: α_m = 1 + (percent change)_m / 100. Source: Belcher, Hacker and Powell (2005), the stretch operation.
 */
export function stretchByMonth(values: Float64Array, monthOfHour: Uint8Array, alphaByMonth: ArrayLike<number>, out: Float64Array): Float64Array {
  requireTwelve('alphaByMonth', alphaByMonth);
  requireSameLength(values, monthOfHour, out);
  for (let i = 0; i < values.length; i++) out[i] = alphaByMonth[monthOfHour[i]] * values[i];
  return out;
}

/**
 * Shift and stretch, for dry-bulb: T = T0 + ΔTmean_m + α_m (T0 − <T0>_m). The monthly mean moves by
 * ΔTmean_m and the spread about it grows by the factor (1 + α_m) (stretchFactors).
 * Source: Belcher, Hacker and Powell (2005), the combined shift-and-stretch for dry-bulb temperature.
 * @param meanByMonth <T0>_m, the parent's monthly mean, same unit as values
 */
export function shiftAndStretchByMonth(
  values: Float64Array,
  monthOfHour: Uint8Array,
  deltaMeanByMonth: ArrayLike<number>,
  alphaByMonth: ArrayLike<number>,
  meanByMonth: ArrayLike<number>,
  out: Float64Array,
): Float64Array {
  requireTwelve('deltaMeanByMonth', deltaMeanByMonth);
  requireTwelve('alphaByMonth', alphaByMonth);
  requireTwelve('meanByMonth', meanByMonth);
  requireSameLength(values, monthOfHour, out);
  for (let i = 0; i < values.length; i++) {
    const m = monthOfHour[i];
    const t0 = values[i];
    out[i] = t0 + deltaMeanByMonth[m] + alphaByMonth[m] * (t0 - meanByMonth[m]);
  }
  return out;
}

/**
 * α_m = (ΔTmax_m − ΔTmin_m) / (<Tmax0>_m − <Tmin0>_m), the stretch of the shift-and-stretch operation,
 * so that the mean daily range becomes <Tmax0>_m − <Tmin0>_m + ΔTmax_m − ΔTmin_m.
 * A month whose parent has no daily range (no data, or a constant series) gets α = 0: there is no
 * spread to stretch. Source: Belcher, Hacker and Powell (2005).
 * @param deltaMaxK ΔTmax_m, K, twelve values
 * @param deltaMinK ΔTmin_m, K, twelve values
 * @param meanDailyMaxC <Tmax0>_m, °C; meanDailyMinC <Tmin0>_m, °C (monthlyDayStatistics)
 */
export function stretchFactors(
  deltaMaxK: ArrayLike<number>,
  deltaMinK: ArrayLike<number>,
  meanDailyMaxC: ArrayLike<number>,
  meanDailyMinC: ArrayLike<number>,
): Float64Array {
  requireTwelve('deltaMaxK', deltaMaxK);
  requireTwelve('deltaMinK', deltaMinK);
  requireTwelve('meanDailyMaxC', meanDailyMaxC);
  requireTwelve('meanDailyMinC', meanDailyMinC);
  const alpha = new Float64Array(12);
  for (let m = 0; m < 12; m++) {
    const range = meanDailyMaxC[m] - meanDailyMinC[m];
    alpha[m] = range > 1e-9 ? (deltaMaxK[m] - deltaMinK[m]) / range : 0;
  }
  return alpha;
}
