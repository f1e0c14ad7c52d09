/**
 * The scenario schema: sample files parse, defaults fill in, errors name the field and range.
 */
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
    expect(parsed.ok && parsed.scenario.energy).toMatchObject({ copSlopePerK: 0, fanPowerFraction: 0.05, blowdownRatio: 0.33, towerEvaporationShare: 0.85 });
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
    expect(!unknown.ok && unknown.errors[0]).toMatch(/^system\.kind: kind must be 'direct-air', 'indirect-air' or 'water-side'/);
    const warmWater = parseScenario({ ...base, system: { ...base.system, chilledWaterSupplyC: 26 } });
    expect(!warmWater.ok && warmWater.errors).toEqual(['system.chilledWaterSupplyC: chilledWaterSupplyC must be below supplyAirC (got 26)']);
  });
});
