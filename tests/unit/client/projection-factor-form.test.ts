import { describe, expect, it } from 'vitest';
import { zeroFactors } from '../../../shared/morphing';
import { factorFormSchema, inDisplayUnits, siToTyped, typedToSi } from '@/features/projections/lib/factor-form';

function typedForm(system: 'SI' | 'IP', july: Record<string, string>) {
  const months = siToTyped(zeroFactors(), system);
  months[6] = { ...months[6], ...july };
  return { name: ' Warmer July ', source: '', factors: { dryBulbMethod: 'shift-and-stretch' as const, humidityMethod: 'shift' as const, months } };
}

describe('the projection factor form', () => {
  it('reads IP temperature changes as °F differences (× 1.8, no +32) and humidity shifts in gr/lb', () => {
    // A difference of 1 K is 1.8 °F (NIST SP 811 §B.9: °F = 1.8·°C + 32, so differences scale by 1.8 alone).
    // 7000 grains to the pound (exact), so 7 gr/lb = 1 g/kg.
    const parsed = factorFormSchema('IP').safeParse(typedForm('IP', { deltaMeanK: '3.6', deltaMaxK: '5.4', deltaMinK: '1.8', humidityShiftGPerKg: '7' }));
    expect(parsed.success).toBe(true);
    if (!parsed.success) return;
    const july = parsed.data.factors.months[6];
    expect(july.deltaMeanK).toBeCloseTo(2, 12);
    expect(july.deltaMaxK).toBeCloseTo(3, 12);
    expect(july.deltaMinK).toBeCloseTo(1, 12);
    expect(july.humidityShiftGPerKg).toBeCloseTo(1, 9);
    expect(parsed.data.name).toBe('Warmer July');
    expect(parsed.data.source).toBeUndefined();
  });

  it('shows SI factors in IP and back without drift', () => {
    const months = zeroFactors();
    months[0] = { ...months[0], deltaMeanK: 2.5, humidityShiftGPerKg: 0.5 };
    const ip = siToTyped(months, 'IP');
    expect(ip[0].deltaMeanK).toBe('4.5');
    expect(ip[0].humidityShiftGPerKg).toBe('3.5');
    expect(typedToSi('deltaMeanK', 'IP', ip[0].deltaMeanK)).toBeCloseTo(2.5, 12);
    expect(typedToSi('deltaMeanK', 'SI', 'abc')).toBeNaN();
  });

  it('puts a refusal on the typed cell and words its limit in the person’s units', () => {
    const parsed = factorFormSchema('IP').safeParse(typedForm('IP', { deltaMaxK: '30' })); // 30 °F difference = 16.7 K > 15 K
    expect(parsed.success).toBe(false);
    if (parsed.success) return;
    expect(parsed.error.issues[0].path).toEqual(['factors', 'months', 6, 'deltaMaxK']);
    expect(inDisplayUnits(parsed.error.issues[0].message, 'IP')).toBe('ΔTmax must be at most 27 °F');
  });
});
