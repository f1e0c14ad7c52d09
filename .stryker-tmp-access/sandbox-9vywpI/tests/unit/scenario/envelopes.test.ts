/**
 * Envelope presets and altitude derating. Values are the ASHRAE TC 9.9 Thermal Guidelines (2021,
 * 5th edition; 2015, 4th edition) as recalled from memory — the presets say so in their data.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { deratedDryBulbMaxC, ENVELOPE_PRESETS, findEnvelopePreset, parseScenario } from '../../../shared/scenario';

describe('envelope presets', () => {
  it('cite their edition and flag recalled values', () => {
    for (const preset of ENVELOPE_PRESETS) {
      expect(preset.edition).toMatch(/ASHRAE TC 9\.9 .*(2021|2015)/);
      expect(preset.recalledFromMemory).toBe(true);
      expect(preset.note).toMatch(/recalled from memory/);
    }
  });

  it('hold the recommended range and allowable classes (ASHRAE TC 9.9, 5th edition 2021, recalled from memory)', () => {
    expect(findEnvelopePreset('ashrae-2021-recommended')?.limits).toMatchObject({
      dryBulbMinC: 18,
      dryBulbMaxC: 27,
      dewPointMinC: -9,
      dewPointMaxC: 15,
      rhMaxPct: 70,
    });
    expect(findEnvelopePreset('ashrae-2021-recommended-50rh')?.limits.rhMaxPct).toBe(50);
    expect(findEnvelopePreset('ashrae-2015-recommended-60rh')?.limits.rhMaxPct).toBe(60);
    const classes = ['a1', 'a2', 'a3', 'a4', 'h1'].map((c) => findEnvelopePreset(`ashrae-2021-${c}`)!.limits);
    expect(classes.map((l) => [l.dryBulbMinC, l.dryBulbMaxC, l.dewPointMaxC, l.rhMaxPct])).toEqual([
      [15, 32, 17, 80],
      [10, 35, 21, 80],
      [5, 40, 24, 85],
      [5, 45, 24, 90],
      [5, 25, 17, 80],
    ]);
    for (const l of classes) expect([l.dewPointMinC, l.rhMinPct]).toEqual([-12, 8]);
  });

  it('are valid scenario envelopes', () => {
    for (const preset of ENVELOPE_PRESETS) {
      const parsed = parseScenario({
        name: preset.id,
        elevationM: 0,
        envelope: { presetId: preset.id, ...preset.limits },
        system: { kind: 'direct-air', supplyAirC: 20, itDeltaTK: 10, evaporativeEffectiveness: 0 },
        energy: { itLoadKw: 100, mechanicalCop: 4 },
      });
      expect(parsed.ok).toBe(true);
    }
  });
});

describe('altitude derating of the maximum dry-bulb', () => {
  it('lowers A1 by 1 K per 300 m above 900 m (guideline footnote, recalled from memory)', () => {
    const a1 = findEnvelopePreset('ashrae-2021-a1')!.limits;
    expect(deratedDryBulbMaxC(32, 900, a1.altitudeDerating)).toBe(32);
    expect(deratedDryBulbMaxC(32, 1500, a1.altitudeDerating)).toBeCloseTo(30, 12);
    expect(deratedDryBulbMaxC(32, 3050, a1.altitudeDerating)).toBeCloseTo(32 - 2150 / 300, 12);
  });

  it('lowers A3 and A4 faster, and the recommended range only above 1800 m', () => {
    expect(deratedDryBulbMaxC(40, 1250, findEnvelopePreset('ashrae-2021-a3')!.limits.altitudeDerating)).toBeCloseTo(38, 12);
    expect(deratedDryBulbMaxC(45, 1150, findEnvelopePreset('ashrae-2021-a4')!.limits.altitudeDerating)).toBeCloseTo(43, 12);
    const recommended = findEnvelopePreset('ashrae-2021-recommended')!.limits.altitudeDerating;
    expect(deratedDryBulbMaxC(27, 1700, recommended)).toBe(27);
    expect(deratedDryBulbMaxC(27, 2400, recommended)).toBeCloseTo(25, 12);
  });

  it('leaves a custom envelope without a rule unchanged and refuses bad arguments', () => {
    expect(deratedDryBulbMaxC(30, 4000, undefined)).toBe(30);
    expect(() => deratedDryBulbMaxC(30, Number.NaN, undefined)).toThrow(/elevationM/);
  });
});
