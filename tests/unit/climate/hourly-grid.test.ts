/** The hourly grid on its own: averaging into hours, trimming, and the gap-length boundary of the repair. */
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

  // Rows already one per hour take a shorter way (their own columns become the grid); the mean of one value is that
  // value plus 0 (IEEE 754: −0 + 0 = +0), so both ways must give the same numbers. Checked by construction.
  it('gives rows already one per hour the same grid as averaging does, −0 becoming 0 and NaN staying', () => {
    const points: [number, number, number][] = [
      [0, -0, 50],
      [1, 12.3, NaN],
      [2, -4.5, 61],
    ];
    const direct = grid(rows(points));
    // the same hours with a half-hour row added, so every hour goes through the averaging
    const averaged = grid(rows([...points.slice(0, 2), [1.5, NaN, NaN], points[2]]));
    expect(Object.is(direct.dryBulbC[0], 0)).toBe(true);
    expect(Array.from(direct.dryBulbC)).toEqual(Array.from(averaged.dryBulbC));
    expect(Array.from(direct.humidity)).toEqual(Array.from(averaged.humidity));
    expect(Number.isNaN(direct.humidity[1])).toBe(true);
    expect(Array.from(direct.rowsInHour)).toEqual([1, 1, 1]);
    expect(Array.from(direct.lastLine)).toEqual([2, 3, 4]);
    expect(direct.hours).toBe(3);
  });

  it('averages rows that are one per hour but out of order or with a dropped row like any others', () => {
    const outOfOrder = rows([
      [0, 10, 50],
      [2, 30, 70],
      [1, 20, 60],
    ]);
    expect(Array.from(grid(outOfOrder).dryBulbC)).toEqual([10, 20, 30]);
    const withDropped = rows([
      [0, 10, 50],
      [1, 20, 60],
      [2, 30, 70],
    ]);
    withDropped.dropped[1] = 1;
    expect(Array.from(grid(withDropped).dryBulbC)).toEqual([10, NaN, 30]);
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
