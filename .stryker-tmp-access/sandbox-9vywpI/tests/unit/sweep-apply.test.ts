// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { findEnvelopePreset, type Scenario } from '../../shared/scenario';
import { applySweepPoint, baseNameOfPoint, prepareSweep, sweepInputRefusal, withValueAt } from '../../shared/sweep';
import { makeScenario } from './scenario/fixtures';

describe('setting a value at a path', () => {
  it('returns a copy with the value set and the source untouched', () => {
    const source = { system: { supplyAirC: 24, kind: 'direct-air' }, energy: { itLoadKw: 1000 } };
    const copy = withValueAt(source, 'system.supplyAirC', 27);
    expect(copy).toEqual({ system: { supplyAirC: 27, kind: 'direct-air' }, energy: { itLoadKw: 1000 } });
    expect(source.system.supplyAirC).toBe(24);
    expect(copy.energy).not.toBe(source.energy);
  });

  it('refuses a path the scenario does not have, naming it', () => {
    expect(() => withValueAt({ system: { supplyAirC: 24 } }, 'system.approachK', 3)).toThrow(/"system.approachK" is not in the scenario/);
    expect(() => withValueAt({ system: 3 }, 'system.approachK', 3)).toThrow(RangeError);
    expect(() => withValueAt({ a: 1 }, 'a..b', 3)).toThrow(RangeError);
  });
});

describe('applying a sweep point to a scenario', () => {
  const base: Scenario = makeScenario('direct-air', { envelope: { presetId: 'ashrae-2021-a1' } });

  it('sets each swept input and names the run after the values', () => {
    const s = applySweepPoint(base, { 'system.supplyAirC': 26.5, 'energy.itLoadKw': 1500 });
    expect((s.system as { supplyAirC: number }).supplyAirC).toBe(26.5);
    expect(s.energy.itLoadKw).toBe(1500);
    expect(s.name).toBe(`${base.name} · supply air 26.5 °C, IT load 1,500 kW`);
    expect((base.system as { supplyAirC: number }).supplyAirC).toBe(24);
    // The base name comes back from the stored name, so a list can write the values again in the reader's units.
    expect(baseNameOfPoint(s.name, { 'system.supplyAirC': 26.5, 'energy.itLoadKw': 1500 })).toBe(base.name);
    expect(baseNameOfPoint('Renamed by hand', { 'system.supplyAirC': 26.5 })).toBe('Renamed by hand');
  });

  it('replaces the whole envelope with a preset, as the editor does', () => {
    const a3 = findEnvelopePreset('ashrae-2021-a3')!;
    const s = applySweepPoint(base, { 'envelope.presetId': 'ashrae-2021-a3' });
    expect(s.envelope).toEqual({ presetId: 'ashrae-2021-a3', ...a3.limits });
    expect(s.name).toContain('envelope Allowable A3 (2021)');
    expect(() => applySweepPoint(base, { 'envelope.presetId': 'class-z' })).toThrow(/no envelope preset "class-z"/);
  });

  it('refuses an input the system does not have or never reads', () => {
    expect(sweepInputRefusal('system.approachK', base.system)).toBe('system.approachK applies to water-side systems only; this scenario is direct-air.');
    expect(sweepInputRefusal('system.heatExchangerEffectiveness', makeScenario('indirect-air').system)).toBeNull();
    expect(sweepInputRefusal('system.supplyAirC', makeScenario('water-side').system)).toMatch(/sweep system.chilledWaterSupplyC instead/);
    expect(sweepInputRefusal('system.evaporativeEffectiveness', makeScenario('water-side', { system: { heatRejection: 'cooling-tower' } }).system)).toMatch(
      /cooling tower/,
    );
    expect(sweepInputRefusal('envelope.presetId', makeScenario('indirect-air').system)).toMatch(/direct-air systems only/);
    expect(sweepInputRefusal('energy.itLoadKw', makeScenario('water-side').system)).toBeNull();
  });

  it('validates every point with the scenario schema, naming the input and the value', () => {
    const prepared = prepareSweep(base, [{ input: 'system.supplyAirC', from: 40, to: 48, step: 2 }]);
    expect(prepared.ok).toBe(false);
    if (prepared.ok) return;
    // The schema allows 5…45 °C for the supply setpoint: 46 and 48 are refused, 40…44 pass.
    expect(prepared.errors).toEqual([
      'system.supplyAirC = 46 is refused: system.supplyAirC must be a number from 5 to 45 °C (got 46)',
      'system.supplyAirC = 48 is refused: system.supplyAirC must be a number from 5 to 45 °C (got 48)',
    ]);
    // Water-side: the chilled-water supply must stay below the supply air (a rule across two fields).
    const water = makeScenario('water-side');
    const crossed = prepareSweep(water, [{ input: 'system.chilledWaterSupplyC', from: 22, to: 26, step: 2 }]);
    expect(crossed.ok ? [] : crossed.errors).toEqual([
      'system.chilledWaterSupplyC = 24 is refused: system.chilledWaterSupplyC chilledWaterSupplyC must be below supplyAirC (got 24)',
      'system.chilledWaterSupplyC = 26 is refused: system.chilledWaterSupplyC chilledWaterSupplyC must be below supplyAirC (got 26)',
    ]);
    const good = prepareSweep(base, [{ input: 'system.evaporativeEffectiveness', from: 0, to: 1, step: 0.25 }]);
    expect(good.ok && good.points.map((p) => (p.scenario.system as { evaporativeEffectiveness: number }).evaporativeEffectiveness)).toEqual([
      0, 0.25, 0.5, 0.75, 1,
    ]);
  });

  it('lists five bad points and counts the rest', () => {
    const prepared = prepareSweep(base, [{ input: 'energy.itLoadKw', from: -10, to: -1, step: 1 }]);
    expect(prepared.ok ? [] : prepared.errors).toHaveLength(6);
    expect(prepared.ok ? '' : prepared.errors[5]).toBe('and 5 more points');
  });
});
