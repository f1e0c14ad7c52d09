import { describe, expect, it } from 'vitest';
import { comparedMetrics, differencePercent, METRICS, metricUnit, metricUnitKinds, metricValue } from '../../shared/metrics';

describe('the metric list', () => {
  it('gives every figure a key of its own, a label, an SI and an IP unit, whole decimals and a direction', () => {
    for (const [key, metric] of Object.entries(METRICS)) {
      expect(metric.key).toBe(key);
      expect(metric.label.length).toBeGreaterThan(0);
      expect(metricUnitKinds[metric.kind]).toBeDefined();
      expect(Number.isInteger(metric.decimals) && metric.decimals >= 0).toBe(true);
      expect(['higher', 'lower', 'none']).toContain(metric.better);
    }
    expect(new Set(comparedMetrics.map((m) => m.key)).size).toBe(comparedMetrics.length);
  });

  it('converts to IP by the exact factors, a temperature difference without the offset', () => {
    // NIST SP 811 (2008), App. B: 1 US gal = 3.785 411 784 L (exact); °F = 1.8·°C + 32; 1 K = 1.8 °F as a difference.
    expect(metricValue(METRICS.waterTotal, 3785.411784, 'IP')).toBe(1000);
    expect(metricUnit(METRICS.waterTotal, 'IP')).toBe('US gal');
    expect(metricValue(METRICS.facilitySupply, 25, 'IP')).toBe(77);
    expect(metricValue(METRICS.facilitySupply, 10, 'IP', true)).toBe(18);
    // Energy stays kWh, WUE L/kWh (ISO/IEC 30134-9), in both systems; rounded to the figure's decimals.
    expect(metricValue(METRICS.cooling, 1234.567, 'IP')).toBe(1234.6);
    expect(metricUnit(METRICS.wue, 'IP')).toBe('L/kWh');
    expect(metricValue(METRICS.ppue, 1.234567, 'SI')).toBe(1.2346);
    expect(metricValue(METRICS.ppue, null, 'SI')).toBeNull();
    expect(metricValue(METRICS.ppue, Number.NaN, 'SI')).toBeNull();
  });

  it('gives no percentage on a base under the figure’s floor (1 MWh, a day of hours, 1 m³, 10 kW)', () => {
    expect(differencePercent(METRICS.cooling, 10, 999)).toBeNull();
    expect(differencePercent(METRICS.cooling, 10, 1000)).toBeCloseTo(1, 12);
    expect(differencePercent(METRICS.mechanical, 3, 23)).toBeNull();
    expect(differencePercent(METRICS.mechanical, 6, 24)).toBeCloseTo(25, 12);
    expect(differencePercent(METRICS.waterTotal, 1, 999)).toBeNull();
    expect(differencePercent(METRICS.peak, 1, 9)).toBeNull();
    expect(differencePercent(METRICS.ppue, 0.1, 1.2)).toBeCloseTo(8.333, 3);
    expect(differencePercent(METRICS.ppue, null, 1.2)).toBeNull();
  });
});
