import { describe, expect, it } from 'vitest';
import { summariseSeries } from '../../shared/series-summary';

describe('summariseSeries', () => {
  it('skips missing hours and reports them', () => {
    expect(summariseSeries(Float64Array.of(4, NaN, -2, 10))).toEqual({ count: 3, missing: 1, min: -2, max: 10, mean: 4 });
  });
  it('gives NaN statistics, not an exception, for an all-missing column', () => {
    const s = summariseSeries(Float64Array.of(NaN, NaN));
    expect(s.count).toBe(0);
    expect(s.missing).toBe(2);
    expect(s.mean).toBeNaN();
  });
});
