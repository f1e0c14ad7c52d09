import { describe, expect, it } from 'vitest';
import { formatCount, formatQuantity, numberFormat } from '@/lib/quantity';

describe('formatting quantities', () => {
  it('writes the figures a person reads, in SI and IP', () => {
    expect(formatQuantity('temperature', 'SI', 21.44)).toBe('21.4 °C');
    // 21.44 °C = 70.592 °F (°F = °C × 9/5 + 32, NIST SP 811 App. B)
    expect(formatQuantity('temperature', 'IP', 21.44)).toBe('70.6 °F');
    expect(formatQuantity('humidityRatio', 'SI', 0.0123456, false)).toBe('12.35');
    expect(formatQuantity('water', 'SI', 1_234_567)).toBe('1,234.57 m³');
    expect(formatQuantity('temperature', 'SI', Number.NaN)).toBe('–');
    expect(formatCount(262_800)).toBe('262,800');
  });

  it('keeps one formatter per decimals and locale, made once', () => {
    expect(numberFormat(1)).toBe(numberFormat(1));
    expect(numberFormat(1)).not.toBe(numberFormat(2));
    expect(numberFormat(1, 'de')).not.toBe(numberFormat(1));
    expect(numberFormat(1, 'de').format(1234.56)).toBe('1.234,6');
  });
});
