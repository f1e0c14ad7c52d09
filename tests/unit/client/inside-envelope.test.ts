// @vitest-environment node
/**
 * The one envelope test (shared/scenario/inside-envelope.ts): edge hours against the limits of ASHRAE TC 9.9 "Thermal
 * Guidelines for Data Processing Environments" (edition named beside each check; the limits themselves are the
 * presets', recalled from memory as shared/scenario/envelopes.ts says), with psychrolib as the reference for W at a
 * limit; then the classifier, the excursion count and the moist-air chart's table judge every hour of a sample file
 * alike, and as psychrolib's dew point and RH read against the limits directly. (Here rather than in unit/ because the
 * chart's module loads the client's '@/' imports.)
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { importClimateText } from '../../../shared/climate';
import { countExcursions } from '../../../shared/excursions';
import { meanSitePressurePa, outdoorStates } from '../../../shared/psychrometrics';
import { classifyHours, EXCURSION, MODE } from '../../../shared/scenario/classify';
import { findEnvelopePreset } from '../../../shared/scenario/envelopes';
import { ENVELOPE_BREACH, envelopeTest, insideEnvelope, type EnvelopeTestLimits } from '../../../shared/scenario/inside-envelope';
import { hoursInside } from '../../../src/lib/charts/moist-air-data';
import { hylandWexlerWaterPa } from '../psychrometrics/reference-over-water';
import { psychrolib as psy } from '../psychrometrics/reference-psychrolib';
import { makeScenario, SEA_LEVEL_PA, wFromDewPoint, wFromRh } from '../scenario/fixtures';

const limitsOf = (id: string): EnvelopeTestLimits => {
  const { altitudeDerating: _derating, ...limits } = findEnvelopePreset(id)!.limits;
  return limits;
};
/** 5th edition (2021): recommended 18–27 °C, −9 °C dew point to 15 °C dew point and 70 % RH. */
const RECOMMENDED_2021 = limitsOf('ashrae-2021-recommended');
/** 5th edition (2021): A1 15–32 °C, −12 °C dew point and 8 % RH to 17 °C dew point and 80 % RH. */
const A1_2021 = limitsOf('ashrae-2021-a1');
/** 4th edition (2015): recommended range with 60 % RH. */
const RECOMMENDED_2015 = limitsOf('ashrae-2015-recommended-60rh');
const UP = 1 + 1e-6;
const DOWN = 1 - 1e-6;

describe('insideEnvelope on edge hours', () => {
  it('dry-bulb: 18 and 27 °C are inside the recommended range, a hundredth outside them is not (TC 9.9, 5th ed. 2021)', () => {
    const w = wFromDewPoint(10, SEA_LEVEL_PA); // psychrolib: a 10 °C dew point is inside every moisture limit at 18–27 °C
    expect(insideEnvelope(RECOMMENDED_2021, 18, w, SEA_LEVEL_PA)).toBe(true);
    expect(insideEnvelope(RECOMMENDED_2021, 27, w, SEA_LEVEL_PA)).toBe(true);
    expect(envelopeTest(RECOMMENDED_2021)(27.01, w, SEA_LEVEL_PA)).toBe(ENVELOPE_BREACH.warm);
    expect(envelopeTest(RECOMMENDED_2021)(17.99, w, SEA_LEVEL_PA)).toBe(ENVELOPE_BREACH.cold);
  });

  it('the 15 °C dew-point ceiling binds at 25 °C, the 70 % RH ceiling at 18 °C (TC 9.9, 5th ed. 2021)', () => {
    // At 25 °C a 15 °C dew point is about 54 % RH (psychrolib), so the dew point is the limit there.
    const atDewPoint = wFromDewPoint(15, SEA_LEVEL_PA);
    expect(psy.GetRelHumFromHumRatio(25, atDewPoint, SEA_LEVEL_PA)).toBeLessThan(0.7);
    expect(insideEnvelope(RECOMMENDED_2021, 25, atDewPoint * DOWN, SEA_LEVEL_PA)).toBe(true);
    expect(envelopeTest(RECOMMENDED_2021)(25, atDewPoint * UP, SEA_LEVEL_PA)).toBe(ENVELOPE_BREACH.humid);
    // At 18 °C, 70 % RH is reached first (psychrolib W at 70 % is below W at a 15 °C dew point).
    const atRh = wFromRh(18, 70, SEA_LEVEL_PA);
    expect(atRh).toBeLessThan(atDewPoint);
    expect(insideEnvelope(RECOMMENDED_2021, 18, atRh * DOWN, SEA_LEVEL_PA)).toBe(true);
    expect(envelopeTest(RECOMMENDED_2021)(18, atRh * UP, SEA_LEVEL_PA)).toBe(ENVELOPE_BREACH.humid);
    // The 2015 (4th ed.) 60 % RH variant refuses the same 18 °C air at 65 %.
    expect(insideEnvelope(RECOMMENDED_2015, 18, wFromRh(18, 65, SEA_LEVEL_PA), SEA_LEVEL_PA)).toBe(false);
    expect(insideEnvelope(RECOMMENDED_2015, 18, wFromRh(18, 59.9, SEA_LEVEL_PA), SEA_LEVEL_PA)).toBe(true);
  });

  it('the −9 °C dew-point floor is over liquid water (TC 9.9, 5th ed. 2021; WMO-No. 8)', () => {
    // psychrolib would read −9 °C as a frost point; W over water from Hyland–Wexler eq. 6 (reference-over-water.ts).
    const floor = psy.GetHumRatioFromVapPres(hylandWexlerWaterPa(-9), SEA_LEVEL_PA);
    expect(insideEnvelope(RECOMMENDED_2021, 20, floor * UP, SEA_LEVEL_PA)).toBe(true);
    expect(envelopeTest(RECOMMENDED_2021)(20, floor * DOWN, SEA_LEVEL_PA)).toBe(ENVELOPE_BREACH.dry);
  });

  it('A1 floor: 8 % RH binds at 32 °C, the −12 °C dew point at 15 °C (TC 9.9, 5th ed. 2021)', () => {
    const rhFloor32 = wFromRh(32, 8, SEA_LEVEL_PA);
    const dewFloor = wFromDewPoint(-12, SEA_LEVEL_PA);
    expect(rhFloor32).toBeGreaterThan(dewFloor);
    expect(insideEnvelope(A1_2021, 32, rhFloor32 * UP, SEA_LEVEL_PA)).toBe(true);
    expect(envelopeTest(A1_2021)(32, rhFloor32 * DOWN, SEA_LEVEL_PA)).toBe(ENVELOPE_BREACH.dry);
    expect(wFromRh(15, 8, SEA_LEVEL_PA)).toBeLessThan(dewFloor);
    expect(envelopeTest(A1_2021)(15, dewFloor * DOWN, SEA_LEVEL_PA)).toBe(ENVELOPE_BREACH.dry);
    // Hot and humid at once: both bits.
    expect(envelopeTest(A1_2021)(33, wFromDewPoint(18, SEA_LEVEL_PA), SEA_LEVEL_PA)).toBe(ENVELOPE_BREACH.warm | ENVELOPE_BREACH.humid);
  });

  it("is judged at the site's pressure: the same W is above the 15 °C dew point at sea level, below it at 1690 m", () => {
    const p1690 = psy.GetStandardAtmPressure(1690); // ASHRAE 2017 ch. 1 eq. 3 through psychrolib
    const w = 0.0115;
    expect(w).toBeGreaterThan(wFromDewPoint(15, SEA_LEVEL_PA));
    expect(w).toBeLessThan(wFromDewPoint(15, p1690));
    expect(insideEnvelope(RECOMMENDED_2021, 25, w, SEA_LEVEL_PA)).toBe(false);
    expect(insideEnvelope(RECOMMENDED_2021, 25, w, p1690)).toBe(true);
  });

  it('an hour without a state is not inside', () => {
    expect(insideEnvelope(RECOMMENDED_2021, Number.NaN, 0.008, SEA_LEVEL_PA)).toBe(false);
    expect(insideEnvelope(RECOMMENDED_2021, 22, Number.NaN, SEA_LEVEL_PA)).toBe(false);
  });
});

/**
 * psychrolib's reading of the limits, written apart from the engine: dew point through the vapour pressure (pw at
 * least pws over water at the dew-point floor, at most at the ceiling), RH over water as pw / pws(t).
 */
function referenceInside(limits: EnvelopeTestLimits, t: number, w: number, p: number): boolean {
  const pw = psy.GetVapPresFromHumRatio(w, p);
  const rhPct = (100 * pw) / hylandWexlerWaterPa(t);
  return (
    t >= limits.dryBulbMinC &&
    t <= limits.dryBulbMaxC &&
    pw >= hylandWexlerWaterPa(limits.dewPointMinC) &&
    pw <= hylandWexlerWaterPa(limits.dewPointMaxC) &&
    rhPct >= limits.rhMinPct &&
    rhPct <= limits.rhMaxPct
  );
}

const folder = fileURLToPath(new URL('../../../sample-weather', import.meta.url));
const { sites } = JSON.parse(readFileSync(path.join(folder, 'sites.json'), 'utf8')) as {
  sites: Array<{ id: string; file: string; importTimeZone: string; elevationM: number }>;
};

describe('the classifier, the excursion count and the chart agree hour for hour', { timeout: 120_000 }, () => {
  const verdicts = { inside: 0, outside: 0 };
  // The mild maritime file (many hours near the moisture ceiling) and the one at 1690 m (its own pressure).
  const chosen = sites.filter((s) => s.id === 'kelderwick-point' || s.id === 'mesa-alta');
  it.each(chosen.map((s) => [s.file, s] as const))('on every hour of %s (synthetic sample)', (_file, site) => {
    const imported = importClimateText(readFileSync(path.join(folder, site.file), 'utf8'), { timeZone: site.importTimeZone });
    const series = imported.series!;
    const { states } = outdoorStates(series, site.elevationM);
    // One pressure for all three callers: the chart draws at one.
    const p = meanSitePressurePa(series, site.elevationM);
    const w = states.humidityRatio;
    const n = w.length;
    let compared = 0;
    let nearEdge = 0;
    for (const [limits, supplyAirC] of [
      [RECOMMENDED_2021, 24],
      [A1_2021, 27],
    ] as const) {
      // The classifier judges air brought to the supply setpoint: direct air, no evaporative stage, no fan heat, every
      // hour's dry-bulb at the setpoint, so free cooling means "inside" and a humid hour is mechanical.
      const scenario = makeScenario('direct-air', { system: { supplyAirC, evaporativeEffectiveness: 0 } });
      if (scenario.system.kind !== 'direct-air') throw new Error('direct air expected');
      const at = new Float64Array(n).fill(supplyAirC);
      const classified = classifyHours(scenario.system, limits, { dryBulbC: at, wetBulbC: at, humidityRatio: w, pressurePa: p }, { fanHeatK: 0 });
      const excursionTest = (t: number, wi: number) =>
        countExcursions({
          timestampsMs: Float64Array.of(0),
          inletC: Float64Array.of(t),
          inletW: Float64Array.of(wi),
          pressurePa: p,
          recommended: limits,
          allowable: limits,
          rateLimitKPerHour: 20,
        }).insideRecommendedHours === 1;
      for (let i = 0; i < n; i++) {
        if (w[i] !== w[i]) {
          expect(classified.modes[i]).toBe(MODE.noData);
          continue;
        }
        compared++;
        const byClassifier = classified.modes[i] === MODE.free && !(classified.excursions[i] & EXCURSION.lowHumidity);
        const byExcursions = excursionTest(supplyAirC, w[i]);
        const byChart = hoursInside({ dryBulbC: [supplyAirC], humidityRatio: [w[i]] }, p, limits).inside === 1;
        const byReference = referenceInside(limits, supplyAirC, w[i], p);
        // The outdoor state itself, as the chart's table and the excursion count see it (no setpoint involved).
        const outdoorByChart = hoursInside({ dryBulbC: [series.dryBulbC[i]], humidityRatio: [w[i]] }, p, limits).inside === 1;
        const outdoorByExcursions = excursionTest(series.dryBulbC[i], w[i]);
        const outdoorByReference = referenceInside(limits, series.dryBulbC[i], w[i], p);
        verdicts[byClassifier ? 'inside' : 'outside']++;
        verdicts[outdoorByChart ? 'inside' : 'outside']++;
        expect([byClassifier, byExcursions, byChart]).toEqual([byChart, byChart, byChart]);
        expect(outdoorByExcursions).toBe(outdoorByChart);
        // psychrolib agrees except where the hour sits within a millionth of a limit (two ways of rounding).
        if (byReference !== byChart || outdoorByReference !== outdoorByChart) nearEdge++;
      }
    }
    expect(compared).toBeGreaterThan(2 * 3 * 8700);
    expect(nearEdge).toBe(0);
  });

  it('judged hours on both sides of the limits (the files are not all inside or all outside)', () => {
    expect(chosen).toHaveLength(2);
    expect(verdicts.inside).toBeGreaterThan(1000);
    expect(verdicts.outside).toBeGreaterThan(1000);
  });
});
