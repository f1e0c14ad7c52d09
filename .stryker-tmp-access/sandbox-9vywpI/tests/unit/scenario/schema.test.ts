/**
 * The scenario schema: sample files parse, defaults fill in, errors name the field and range.
 */
// @ts-nocheck

import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseScenario } from '../../../shared/scenario';

const samples = path.resolve(import.meta.dirname, '../../../sample-weather/scenarios');
const sample = (name: string) => JSON.parse(readFileSync(path.join(samples, name), 'utf8'));

describe('scenario schema', () => {
  it.each(readdirSync(samples).filter((f) => f.endsWith('.json')))('accepts the sample %s', (name) => {
    const parsed = parseScenario(sample(name));
    expect(parsed.ok ? [] : parsed.errors).toEqual([]);
  });

  it('fills energy defaults', () => {
    const base = sample('direct-air-a1.json');
    const parsed = parseScenario({ ...base, energy: { itLoadKw: 500, mechanicalCop: 3 } });
    expect(parsed.ok && parsed.scenario.energy).toEqual({
      itLoadKw: 500,
      mechanicalCop: 3,
      itLoadProfile: { kind: 'constant' },
      evaporatorApproachK: 5,
      condenserApproachK: 10,
      compressorMinTurndown: 0.2,
      fanPowerFraction: 0.05,
      fanMinSpeedFraction: 0.3,
      pumpPowerFraction: 0.01,
      pumpMinSpeedFraction: 0.3,
      heatRejectionFanFraction: 0.02,
      cyclesOfConcentration: 4,
      towerDriftFraction: 0.0002,
      basinHeaterFraction: 0.001,
    });
  });

  it('refuses each retired input with a message naming its replacement (issue 12 §6)', () => {
    const base = sample('water-side-tower.json');
    const parsed = parseScenario({
      ...base,
      system: { ...base.system, fanHeatK: 1 },
      energy: { ...base.energy, copSlopePerK: -0.1, copReferenceC: 35, copMin: 1, blowdownRatio: 0.33, towerEvaporationShare: 0.85 },
    });
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.errors).toHaveLength(6);
    expect(parsed.errors).toEqual(
      expect.arrayContaining([
        expect.stringMatching(/^system\.fanHeatK: is retired: .*energy\.fanPowerFraction.* \(got 1\)$/),
        expect.stringMatching(/^energy\.copSlopePerK: is retired: .*energy\.mechanicalCop/),
        expect.stringMatching(/^energy\.copReferenceC: is retired: .*energy\.mechanicalCop/),
        expect.stringMatching(/^energy\.copMin: is retired: .*energy\.mechanicalCop/),
        expect.stringMatching(/^energy\.blowdownRatio: is retired: .*energy\.cyclesOfConcentration/),
        expect.stringMatching(/^energy\.towerEvaporationShare: is retired: /),
      ]),
    );
  });

  it('checks an hourly load profile for its 8760 fractions', () => {
    const base = sample('direct-air-a1.json');
    const short = parseScenario({ ...base, energy: { ...base.energy, itLoadProfile: { kind: 'hourly-profile', name: 'x', fractions: [0.5, 0.6] } } });
    expect(!short.ok && short.errors).toEqual(['energy.itLoadProfile.fractions: must hold 8760 hourly values']);
    const ramp = parseScenario({ ...base, energy: { ...base.energy, itLoadProfile: { kind: 'yearly-ramp', fractions: [0.4, 1.2] } } });
    expect(!ramp.ok && ramp.errors).toEqual(['energy.itLoadProfile.fractions.1: must be a number from 0 to 1 (got 1.2)']);
  });

  it('names each bad field with its allowed range', () => {
    const base = sample('water-side-tower.json');
    const parsed = parseScenario({
      ...base,
      name: '',
      envelope: { ...base.envelope, rhMinPct: 90, rhMaxPct: 70 },
      system: { ...base.system, approachK: -1, heatRejection: 'pond' },
      energy: { mechanicalCop: 45 },
    });
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.errors).toEqual(
      expect.arrayContaining([
        'name: must not be empty (got "")',
        'system.approachK: must be a number from 0 to 20 K (got -1)',
        `system.heatRejection: must be 'dry-cooler' or 'cooling-tower' (got "pond")`,
        'energy.itLoadKw: must be a number from 0.001 to 10000000 kW (missing)',
        'energy.mechanicalCop: must be a number from 0.5 to 30 (got 45)',
        'envelope.rhMaxPct: rhMinPct must be below rhMaxPct (got 70)',
      ]),
    );
  });

  it('refuses an unknown system kind and a chilled-water setpoint above the supply air', () => {
    const base = sample('water-side-tower.json');
    const unknown = parseScenario({ ...base, system: { ...base.system, kind: 'immersion' } });
    expect(!unknown.ok && unknown.errors[0]).toMatch(/^system\.kind: kind must be 'direct-air', 'indirect-air', 'water-side' or 'hybrid'/);
    const warmWater = parseScenario({ ...base, system: { ...base.system, chilledWaterSupplyC: 26 } });
    expect(!warmWater.ok && warmWater.errors).toEqual(['system.chilledWaterSupplyC: chilledWaterSupplyC must be below supplyAirC (got 26)']);
  });
});
