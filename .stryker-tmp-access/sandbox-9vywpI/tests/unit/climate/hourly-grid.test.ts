/** The hourly grid on its own: averaging into hours, trimming, and the gap-length boundary of the repair. */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { averageToHours, fillGaps, hourRange, trimToCompleteHours, type RowColumns } from '../../../shared/climate/hourly-grid';

const H = 3_600_000;
function rows(points: [hour: number, dryBulbC: number, humidity: number][]): RowColumns {
  const n = points.length;
  const r: RowColumns = {
    count: n,
    timeMs: new Float64Array(n),
    dryBulbC: new Float64Array(n),
    humidity: new Float64Array(n),
    pressurePa: null,
    line: new Int32Array(n),
    dropped: new Uint8Array(n),
  };
  points.forEach(([hour, d, w], i) => {
    r.timeMs[i] = hour * H;
    r.dryBulbC[i] = d;
    r.humidity[i] = w;
    r.line[i] = i + 2;
  });
  return r;
}
const grid = (r: RowColumns) => averageToHours(r, 0, hourRange(r, 0));

describe('averageToHours', () => {
  it('averages rows falling in the same hour, ignoring NaN cells', () => {
    const g = grid(
      rows([
        [0, 10, 50],
        [0.5, 12, NaN],
        [1, 20, 60],
      ]),
    );
    expect(Array.from(g.dryBulbC)).toEqual([11, 20]);
    expect(Array.from(g.humidity)).toEqual([50, 60]);
    expect(Array.from(g.rowsInHour)).toEqual([2, 1]);
    expect(Array.from(g.lastLine)).toEqual([3, 4]);
  });
});

describe('fillGaps', () => {
  // complete at hours 0 and 8 with a gap of 7 hours between; then 9 complete
  const withGap = () =>
    trimToCompleteHours(
      grid(
        rows([
          [0, 0, 50],
          [8, 8, 58],
          [9, 9, 59],
        ]),
      ),
    )!;

  it('fills a gap exactly maxGapHours long', () => {
    const g = withGap();
    const summary = fillGaps(g, 7);
    expect(Array.from(g.dryBulbC)).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9]);
    expect(Array.from(summary.flags)).toEqual([0, 1, 1, 1, 1, 1, 1, 1, 0, 0]);
    expect(summary).toMatchObject({ filledHours: 7, missingHours: 0, gaps: 1, longestGapHours: 7 });
  });

  it('leaves a gap one hour longer than maxGapHours missing, with NaN values', () => {
    const g = withGap();
    const summary = fillGaps(g, 6);
    expect(Array.from(summary.flags)).toEqual([0, 2, 2, 2, 2, 2, 2, 2, 0, 0]);
    expect(Number.isNaN(g.dryBulbC[4]) && Number.isNaN(g.humidity[4])).toBe(true);
    expect(summary).toMatchObject({ filledHours: 0, missingHours: 7, runs: [{ from: 1, to: 7, filled: false }] });
  });

  it('trims incomplete hours at both ends', () => {
    const g = trimToCompleteHours(
      grid(
        rows([
          [0, 1, NaN],
          [1, 2, 50],
          [2, 3, 51],
          [3, NaN, 52],
        ]),
      ),
    )!;
    expect(g.startHour).toBe(1);
    expect(g.hours).toBe(2);
  });
});
