import { describe, expect, it } from 'vitest';
import { valueDomain } from '@/features/sweeps/components/sweep-line-charts';

describe('the value axis of a sweep line chart', () => {
  it('gives a partial PUE that moves only in the fifth decimal a span of 0.02 around its middle', () => {
    // The demo's high-plateau supply sweep: 1.0830940 … 1.0830850 (a change of 9e-6 over six points).
    const { domain } = valueDomain([1.083094, 1.083092, 1.08309, 1.083088, 1.083086, 1.083085], false);
    expect(domain![0]).toBeCloseTo(1.0730895, 6);
    expect(domain![1]).toBeCloseTo(1.0930895, 6);
  });

  it('leaves a partial PUE that moves by more than that to Plot', () => {
    expect(valueDomain([1.05, 1.12], false)).toEqual({});
  });

  it('gives a count with one value throughout a domain from zero, and none to a count that varies', () => {
    expect(valueDomain([0, 0, 0], true)).toEqual({ domain: [0, 1] });
    expect(valueDomain([5.44, 5.44], true).domain![1]).toBeCloseTo(5.984, 6);
    expect(valueDomain([13, 26_280], true)).toEqual({});
  });
});
