// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { gridCells, metricRows, modeHoursRows, sweepProgress, zeroMechanical, zeroMechanicalText, type SweepPoint } from '../../shared/sweep';

const line = (pairs: Array<[number, number | null]>) => pairs.map(([value, mechanicalHours]) => ({ value, mechanicalHours }));
const celsius = (v: number | string) => `${v} °C`;

describe('where mechanical hours reach zero', () => {
  it('says "from X" at the first swept point with zero mechanical hours when it holds after it', () => {
    const zero = zeroMechanical(
      line([
        [20, 310],
        [21, 122],
        [22, 0],
        [23, 0],
      ]),
    );
    expect(zero).toEqual({ kind: 'from', index: 2, value: 22, leftOut: [] });
    expect(zeroMechanicalText(zero, celsius)).toBe('Mechanical hours reach zero from 22 °C.');
  });

  it('says when every point is already at zero (an IT-load sweep changes no hours)', () => {
    const zero = zeroMechanical(
      line([
        [500, 0],
        [1000, 0],
      ]),
    );
    expect(zeroMechanicalText(zero, (v) => `${v} kW`)).toBe('Mechanical hours are zero at every swept point, from 500 kW.');
  });

  it('says so when no point reaches zero, and where the fewest mechanical hours are', () => {
    // 13 hours stay mechanical from 24 °C on: too humid for the envelope at any setpoint.
    const zero = zeroMechanical(
      line([
        [20, 310],
        [22, 41],
        [24, 13],
        [26, 13],
      ]),
    );
    expect(zero).toEqual({ kind: 'none', fewest: { index: 2, value: 24, mechanicalHours: 13 }, leftOut: [] });
    expect(zeroMechanicalText(zero, celsius)).toBe('No swept point reaches zero mechanical hours; the fewest are 13 h, first at 24 °C.');
  });

  it('says "up to X" when zero comes first and ends (a larger approach adds hours)', () => {
    expect(
      zeroMechanical(
        line([
          [2, 0],
          [3, 0],
          [4, 15],
          [5, 80],
        ]),
      ),
    ).toEqual({ kind: 'up-to', index: 1, value: 3, leftOut: [] });
  });

  it('says "at X" when zero comes and goes', () => {
    expect(
      zeroMechanical(
        line([
          [1, 4],
          [2, 0],
          [3, 2],
        ]),
      ),
    ).toEqual({ kind: 'at', index: 1, value: 2, leftOut: [] });
  });

  it('leaves out points whose supply setpoint breaks the envelope, and names them', () => {
    // Issue 17: an 18–30 °C supply sweep on an envelope allowing 27 °C said "reach zero from 27.0 °C", so 28–30 °C looked best.
    const points = [
      [25, 40],
      [26, 12],
      [27, 3],
      [28, 0],
      [29, 0],
      [30, 0],
    ].map(([value, mechanicalHours]) => ({ value, mechanicalHours, breaksEnvelope: value > 27 }));
    const zero = zeroMechanical(points);
    expect(zero.kind).toBe('none');
    expect(zero.leftOut.map((p) => p.value)).toEqual([28, 29, 30]);
    expect(zeroMechanicalText(zero, celsius)).toBe(
      "No swept point inside the envelope reaches zero mechanical hours; the fewest are 3 h, first at 27 °C. Left out: 28 °C, 29 °C and 30 °C, where the supply setpoint is outside the inlet envelope (derated for the site's elevation), so every hour of those points is an excursion.",
    );
  });

  it('skips points not yet finished', () => {
    expect(
      zeroMechanical(
        line([
          [20, 5],
          [21, null],
          [22, 0],
          [23, null],
        ]),
      ),
    ).toEqual({ kind: 'from', index: 2, value: 22, leftOut: [] });
    expect(zeroMechanical(line([[20, null]]))).toEqual({ kind: 'none', fewest: null, leftOut: [] });
    expect(zeroMechanicalText(zeroMechanical(line([[20, null]])), celsius)).toBe('No swept point reaches zero mechanical hours.');
  });
});

describe('figures drawn from the points', () => {
  const hours = (free: number, adiabatic: number, mechanical: number) => ({
    free,
    adiabatic,
    mechanical,
    noData: 0,
    total: free + adiabatic + mechanical,
    humidified: 0,
    partialMechanical: 0,
  });
  const points: SweepPoint[] = [
    {
      runId: 1,
      values: { 'system.supplyAirC': 20 },
      status: 'done',
      progress: 1,
      error: null,
      results: {
        hours: hours(50, 10, 12),
        partialPue: 1.2,
        coolingKwh: 10,
        waterL: 5,
        humidificationL: null,
        evaporativeCoolingL: null,
        wueLPerKwh: 0.1,
        peakMechanicalLoadKw: 300,
        excursionHours: 0,
        breaksEnvelope: false,
      },
    },
    { runId: 2, values: { 'system.supplyAirC': 22 }, status: 'running', progress: 0.5, error: null, results: null },
    { runId: 3, values: { 'system.supplyAirC': 24 }, status: 'queued', progress: 0, error: null, results: null },
    { runId: 4, values: { 'system.supplyAirC': 26 }, status: 'failed', progress: 0.1, error: 'x', results: null },
  ];

  it('counts progress by finished points only: a run reports no share of its own while it runs', () => {
    expect(sweepProgress(points)).toEqual({ total: 4, done: 1, failed: 1, cancelled: 0, running: 1, queued: 1, fraction: 2 / 4, finished: false });
    expect(sweepProgress([]).finished).toBe(true);
  });

  it('gives hours per mode and other metrics only for finished points', () => {
    expect(modeHoursRows(points, 'system.supplyAirC').map((r) => [r.value, r.mode, r.hours])).toEqual([
      [20, 'free', 50],
      [20, 'adiabatic', 10],
      [20, 'mechanical', 12],
      [20, 'no_data', 0],
    ]);
    expect(metricRows(points, 'system.supplyAirC', 'peakMechanicalLoadKw')).toEqual([{ index: 0, value: 20, metric: 300 }]);
    expect(gridCells(points, 'system.supplyAirC', 'system.evaporativeEffectiveness', 'free')).toEqual([]);
  });
});
