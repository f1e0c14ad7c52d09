/**
 * Aggregation on a constructed series whose counts, runs and totals are known by construction.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { civilFromDays } from '../../../shared/calendar';
import { EXCURSION, MODE } from '../../../shared/scenario/classify';
import type { HourlyEnergy } from '../../../shared/scenario/energy';
import { aggregateResults } from '../../../shared/scenario/results';

const HOUR = 3_600_000;

// 48 hours from 2020-12-31 00:00 UTC: 24 in December 2020, 24 in January 2021.
function constructed() {
  const n = 48;
  const timestampsMs = Float64Array.from({ length: n }, (_, i) => Date.UTC(2020, 11, 31) + i * HOUR);
  const modes = new Uint8Array(n).fill(MODE.free);
  // Mechanical 10:00–15:00 on the 31st (6 h), then 5 h on 1 January 10:00–14:00 broken by no data at 12:00.
  for (let i = 10; i <= 15; i++) modes[i] = MODE.mechanical;
  for (let i = 34; i <= 38; i++) modes[i] = MODE.mechanical;
  modes[36] = MODE.noData;
  modes[20] = MODE.adiabatic;
  modes[21] = MODE.adiabatic;
  const mechanicalFraction = Float64Array.from(modes, (m) => (m === MODE.mechanical ? 0.5 : 0));
  mechanicalFraction[12] = 1;
  const excursions = new Uint8Array(n);
  excursions[2] = EXCURSION.lowHumidity;
  excursions[3] = EXCURSION.lowHumidity;
  excursions[4] = EXCURSION.lowHumidity | EXCURSION.supplyAboveMax;
  const coolingKw = 1050;
  // Hour 5 (free) is humidified with 40 L; hours 20–21 (adiabatic) evaporate 300 L each; tower drift 1 L in hour 20.
  const humidified = new Uint8Array(n);
  humidified[5] = 1;
  const energy: HourlyEnergy = {
    itKw: Float64Array.from(modes, (m) => (m === MODE.noData ? 0 : 1000)),
    mechanicalLoadKw: Float64Array.from(mechanicalFraction, (f) => f * coolingKw),
    compressorKw: Float64Array.from(mechanicalFraction, (f) => (f * coolingKw) / 4),
    cop: new Float64Array(n),
    fanKw: Float64Array.from(modes, (m) => (m === MODE.noData ? 0 : 50)),
    rejectionFanKw: new Float64Array(modes.length),
    pumpKw: Float64Array.from(modes, (m) => (m === MODE.adiabatic ? 10 : 0)),
    basinHeaterKw: new Float64Array(n),
    rejectedKw: new Float64Array(n),
    humidificationL: Float64Array.from({ length: n }, (_, i) => (i === 5 ? 40 : 0)),
    evaporativeCoolingL: Float64Array.from(modes, (m) => (m === MODE.adiabatic ? 300 : 0)),
    driftL: Float64Array.from({ length: n }, (_, i) => (i === 20 ? 1 : 0)),
  };
  return { timestampsMs, classification: { modes, humidified, mechanicalFraction, excursions, evaporationKgPerKgAir: new Float64Array(n) }, energy };
}

describe('aggregateResults', () => {
  const input = constructed();
  // 3 cycles of concentration: blowdown = evaporation / (3 − 1) − drift.
  const r = aggregateResults({ ...input, cyclesOfConcentration: 3 });

  it('counts hours per mode, summing to the total', () => {
    // Mechanical hours at fraction 0.5 are partial; hour 12 at fraction 1 is not. Humidified hours are free hours.
    expect(r.hours).toEqual({ free: 35, adiabatic: 2, mechanical: 10, noData: 1, total: 48, humidified: 1, partialMechanical: 9 });
  });

  it('splits hours by month, hour of day and calendar year', () => {
    expect(r.hoursByMonth[11]).toEqual({ month: 12, free: 16, adiabatic: 2, mechanical: 6, noData: 0, total: 24, humidified: 1, partialMechanical: 5 });
    expect(r.hoursByMonth[0]).toEqual({ month: 1, free: 19, adiabatic: 0, mechanical: 4, noData: 1, total: 24, humidified: 0, partialMechanical: 4 });
    expect(r.hoursByHourOfDay[12]).toEqual({ hour: 12, free: 0, adiabatic: 0, mechanical: 1, noData: 1, total: 2, humidified: 0, partialMechanical: 0 });
    expect(r.hoursByHourOfDay[5]).toMatchObject({ free: 2, humidified: 1 });
    expect(r.hoursByYear.map((y) => [y.humidified, y.partialMechanical])).toEqual([
      [1, 5],
      [0, 4],
    ]);
    expect(r.hoursByYear.map((y) => [y.year, y.total])).toEqual([
      [2020, 24],
      [2021, 24],
    ]);
  });

  it('finds the longest mechanical run, broken by a no-data hour', () => {
    expect(r.longestMechanicalRunHours).toBe(6);
  });

  it('counts excursions by kind and their longest run', () => {
    expect(r.excursions).toEqual({ hours: 3, lowHumidityHours: 3, supplyAboveMaxHours: 1, supplyBelowMinHours: 0, longestRunHours: 3 });
  });

  it('sums energy over hours with data and derives pPUE and WUE (ISO/IEC 30134-9)', () => {
    const dataHours = 47;
    const compressorKwh = (9 * 0.5 * 1050 + 1 * 1050) / 4;
    expect(r.energy.itKwh).toBe(1000 * dataHours);
    expect(r.energy.fanKwh).toBe(50 * dataHours);
    expect(r.energy.compressorKwh).toBeCloseTo(compressorKwh, 9);
    expect(r.energy.pumpKwh).toBe(20);
    expect(r.energy.partialPue).toBeCloseTo((47_000 + 50 * 47 + compressorKwh + 20) / 47_000, 12);
    expect(r.peakMechanicalLoadKw).toBe(1050);
    expect(r.peakCompressorKw).toBeCloseTo(262.5, 12);
    // Blowdown per hour: 40/2 + (300/2 − 1) + 300/2 = 319 L; total 640 + 1 + 319 = 960 L.
    expect(r.water).toMatchObject({ evaporatedL: 640, humidificationL: 40, evaporativeCoolingL: 600, driftL: 1, blowdownL: 319, totalL: 960 });
    expect(r.water.wueLPerKwh).toBeCloseTo(960 / 47_000, 15);
    expect(r.water.annualL).toBeCloseTo((960 * 8760) / 47, 9);
  });

  it('shifts months and hours of day by a UTC offset', () => {
    const shifted = aggregateResults({ ...input, cyclesOfConcentration: 4, utcOffsetMinutes: 60 });
    expect(shifted.hoursByHourOfDay[13]).toMatchObject({ mechanical: 1, noData: 1 }); // what was 12:00 UTC
    expect(shifted.hoursByYear.map((y) => y.total)).toEqual([23, 25]);
  });

  it('reports null ratios when no hour has data', () => {
    const modes = new Uint8Array(3).fill(MODE.noData);
    const empty = aggregateResults({
      timestampsMs: Float64Array.of(0, HOUR, 2 * HOUR),
      classification: {
        modes,
        humidified: new Uint8Array(3),
        mechanicalFraction: new Float64Array(3),
        excursions: new Uint8Array(3),
        evaporationKgPerKgAir: new Float64Array(3),
      },
      energy: {
        itKw: new Float64Array(3),
        mechanicalLoadKw: new Float64Array(3),
        compressorKw: new Float64Array(3),
        cop: new Float64Array(3),
        fanKw: new Float64Array(3),
        rejectionFanKw: new Float64Array(3),
        pumpKw: new Float64Array(3),
        basinHeaterKw: new Float64Array(3),
        rejectedKw: new Float64Array(3),
        humidificationL: new Float64Array(3),
        evaporativeCoolingL: new Float64Array(3),
        driftL: new Float64Array(3),
      },
      cyclesOfConcentration: 4,
    });
    expect(empty.hours.noData).toBe(3);
    expect(empty.energy.partialPue).toBeNull();
    expect(empty.water.wueLPerKwh).toBeNull();
  });
});

describe('civilFromDays', () => {
  it('agrees with Date for days from 1900 to 2100', () => {
    const civil = { year: 0, month: 0, day: 0 };
    for (let days = -25_567; days <= 47_482; days += 17) {
      const d = new Date(days * 86_400_000);
      civilFromDays(days, civil);
      expect([civil.year, civil.month, civil.day]).toEqual([d.getUTCFullYear(), d.getUTCMonth() + 1, d.getUTCDate()]);
    }
  });
});
