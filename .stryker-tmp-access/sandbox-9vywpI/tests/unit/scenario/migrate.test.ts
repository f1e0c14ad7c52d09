/**
 * Saved scenarios of engine 1.0.0 migrate to the engine 2.0.0 inputs with a recorded mapping; the result passes
 * the schema, and a scenario without retired inputs passes through untouched.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { migrateScenario, parseScenario } from '../../../shared/scenario';

const OLD = {
  name: 'Old tower scenario',
  elevationM: 120,
  envelope: { dryBulbMinC: 18, dryBulbMaxC: 27, dewPointMinC: -9, dewPointMaxC: 15, rhMinPct: 0, rhMaxPct: 70 },
  system: {
    kind: 'water-side',
    supplyAirC: 24,
    itDeltaTK: 12,
    fanHeatK: 1.5,
    evaporativeEffectiveness: 0,
    chilledWaterSupplyC: 18,
    chilledWaterDeltaTK: 6,
    approachK: 5,
    heatRejection: 'cooling-tower',
  },
  energy: {
    itLoadKw: 1000,
    mechanicalCop: 5.5,
    copSlopePerK: -0.1,
    copReferenceC: 35,
    copMin: 1,
    fanPowerFraction: 0.03,
    blowdownRatio: 0.25,
    towerEvaporationShare: 0.85,
  },
};

describe('migrateScenario', () => {
  const { scenario, changes } = migrateScenario(OLD);

  it('gives a scenario the engine 2.0.0 schema accepts', () => {
    const parsed = parseScenario(scenario);
    expect(parsed.ok ? [] : parsed.errors).toEqual([]);
  });

  it('turns the fan heat into the fan power that gives it at the design flow: 1.5 K / 12 K = 0.125', () => {
    // ΔT_fan = P_fan / (ṁ·cp) and ṁ = P_IT / (cp·ΔT_IT), so P_fan / P_IT = ΔT_fan / ΔT_IT.
    expect((scenario as typeof OLD).energy.fanPowerFraction).toBe(0.125);
    expect((scenario as typeof OLD).system).not.toHaveProperty('fanHeatK');
    expect(changes.find((c) => c.path === 'energy.fanPowerFraction')).toMatchObject({ before: 0.03, after: 0.125 });
  });

  it('turns the blowdown ratio b into cycles of concentration 1 + 1/b: 0.25 → 5', () => {
    expect((scenario as Record<string, Record<string, unknown>>).energy.cyclesOfConcentration).toBe(5);
    expect(changes.find((c) => c.path === 'energy.cyclesOfConcentration')).toMatchObject({ before: undefined, after: 5 });
  });

  it('drops the COP slope inputs and the tower evaporation share, each with a note', () => {
    const energy = (scenario as Record<string, Record<string, unknown>>).energy;
    for (const key of ['copSlopePerK', 'copReferenceC', 'copMin', 'blowdownRatio', 'towerEvaporationShare']) expect(energy).not.toHaveProperty(key);
    expect(energy.mechanicalCop).toBe(5.5);
    expect(changes.map((c) => c.path)).toEqual([
      'system.fanHeatK',
      'energy.fanPowerFraction',
      'energy.copSlopePerK',
      'energy.copReferenceC',
      'energy.copMin',
      'energy.mechanicalCop',
      'energy.blowdownRatio',
      'energy.cyclesOfConcentration',
      'energy.towerEvaporationShare',
      'elevationM',
    ]);
    for (const change of changes) expect(change.note.length).toBeGreaterThan(20);
  });

  it('removes the scenario\'s own elevation, saying the site\'s is used (issue 17: "elevation is stated three ways")', () => {
    expect(scenario).not.toHaveProperty('elevationM');
    const change = changes.find((c) => c.path === 'elevationM');
    expect(change).toMatchObject({ before: 120, after: undefined });
    expect(change?.note).toContain('elevation of its climate file’s site');
    // A scenario with nothing else retired still records the removal.
    const { energy: _e, ...rest } = OLD;
    const current = { ...rest, system: { ...OLD.system, fanHeatK: undefined }, energy: { itLoadKw: 1000, mechanicalCop: 5.5 } };
    expect(migrateScenario(current).changes.map((c) => c.path)).toContain('elevationM');
  });

  it('does not modify its input, and passes a current scenario through with no changes', () => {
    expect(OLD.system.fanHeatK).toBe(1.5);
    const again = migrateScenario(scenario);
    expect(again.changes).toEqual([]);
    expect(again.scenario).toBe(scenario);
  });

  it('keeps the fan power when the old fan heat was 0, and limits an out-of-range mapping', () => {
    const zero = migrateScenario({ ...OLD, system: { ...OLD.system, fanHeatK: 0 } });
    expect((zero.scenario as typeof OLD).energy.fanPowerFraction).toBe(0.03);
    const big = migrateScenario({ ...OLD, system: { ...OLD.system, fanHeatK: 10, itDeltaTK: 5 } });
    expect((big.scenario as typeof OLD).energy.fanPowerFraction).toBe(0.5);
    expect(parseScenario(big.scenario).ok).toBe(true);
  });

  it('passes anything that is not an object through for the schema to judge', () => {
    expect(migrateScenario('text')).toEqual({ scenario: 'text', changes: [] });
    expect(migrateScenario(null)).toEqual({ scenario: null, changes: [] });
  });
});
