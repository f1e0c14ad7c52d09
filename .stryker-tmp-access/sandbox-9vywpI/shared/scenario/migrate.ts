/**
 * Saved scenarios written for engine 1.0.0 carry inputs that engine 2.0.0 refuses (see RETIRED_INPUTS in
 * schema.ts). `migrateScenario` rewrites such JSON into the new inputs and records every change, so the
 * user can be shown once what moved and why. Pure: the input is never modified; JSON without retired
 * inputs comes back unchanged with no changes.
 */
// @ts-nocheck


export interface ScenarioChange {
  /** Dotted path of the input that changed, e.g. "system.fanHeatK". */
  path: string;
  /** Value before; undefined when the input did not exist. */
  before: unknown;
  /** Value after; undefined when the input was removed. */
  after: unknown;
  /** Why, in words. */
  note: string;
}

export interface MigratedScenario {
  scenario: unknown;
  changes: ScenarioChange[];
}

/** Largest energy.fanPowerFraction and cyclesOfConcentration the schema accepts (kept in step with schema.ts). */
const FAN_POWER_FRACTION_MAX = 0.5;
const CYCLES_MIN = 1.5;
const CYCLES_MAX = 50;

const isRecord = (v: unknown): v is Record<string, unknown> => v !== null && typeof v === 'object' && !Array.isArray(v);
const round4 = (x: number): number => Math.round(x * 1e4) / 1e4;
const clamp = (x: number, lo: number, hi: number): number => Math.min(hi, Math.max(lo, x));

/**
 * Rewrites a scenario's retired inputs into the engine 2.0.0 inputs:
 * - system.fanHeatK f (K) → energy.fanPowerFraction = f / system.itDeltaTK. Fan heat ΔT_fan = P_fan / (ṁ·cp) and the
 *   hall air flow ṁ = P_IT / (cp·ΔT_IT), so P_fan / P_IT = ΔT_fan / ΔT_IT: the fan power that gives the old fan heat
 *   at the design flow (it replaces any fanPowerFraction the scenario had; a fan heat of 0 keeps fanPowerFraction).
 * - energy.copSlopePerK, copReferenceC, copMin → removed; the COP now follows its lift, calibrated to
 *   energy.mechanicalCop at the rating conditions (mechanicalCop is kept).
 * - energy.blowdownRatio b → energy.cyclesOfConcentration = 1 + 1/b (b = 1 / (C − 1)), within 1.5…50.
 * - energy.towerEvaporationShare → removed; the evaporation follows the conditions.
 * - elevationM → removed; a run uses its site's elevation (issue 17: the site's always won, the field misled).
 * Anything that is not an object, or lacks the fields, is passed through for the schema to judge.
 */
export function migrateScenario(json: unknown): MigratedScenario {
  if (!isRecord(json)) return { scenario: json, changes: [] };
  const changes: ScenarioChange[] = [];
  const scenario: Record<string, unknown> = { ...json };
  const system = isRecord(json.system) ? { ...json.system } : null;
  const energy = isRecord(json.energy) ? { ...json.energy } : null;

  if (system && 'fanHeatK' in system) {
    const fanHeatK = system.fanHeatK;
    delete system.fanHeatK;
    const itDeltaTK = system.itDeltaTK;
    if (typeof fanHeatK === 'number' && typeof itDeltaTK === 'number' && itDeltaTK > 0 && fanHeatK > 0 && energy) {
      const before = energy.fanPowerFraction;
      const exact = fanHeatK / itDeltaTK;
      const after = round4(clamp(exact, 0, FAN_POWER_FRACTION_MAX));
      energy.fanPowerFraction = after;
      changes.push({
        path: 'system.fanHeatK',
        before: fanHeatK,
        after: undefined,
        note: 'Fan heat is now derived from the fan power and the air flow (ΔT = P_fan / (ṁ·cp)); the fan power below gives this fan heat at the design flow.',
      });
      changes.push({
        path: 'energy.fanPowerFraction',
        before,
        after,
        note: `Fan power = fan heat / rise across the IT = ${fanHeatK} K / ${itDeltaTK} K${exact > FAN_POWER_FRACTION_MAX ? `, limited to ${FAN_POWER_FRACTION_MAX}` : ''}${before === undefined ? '' : `; it replaces the fan power of ${String(before)} the scenario had, as the two described the same fans`}.`,
      });
    } else {
      changes.push({
        path: 'system.fanHeatK',
        before: fanHeatK,
        after: undefined,
        note: 'Fan heat is now derived from energy.fanPowerFraction and the air flow; the scenario’s fan power is kept.',
      });
    }
  }

  if (energy) {
    const copNotes: Record<string, string> = {
      copSlopePerK: 'The COP no longer follows outdoor dry-bulb linearly: it follows the compressor lift, calibrated to the rated COP.',
      copReferenceC: 'The rated COP now holds at the rating conditions of the condensing side (AHRI 550/590), not at this outdoor temperature.',
      copMin: 'A floor on the lift now keeps the COP finite; no COP floor is needed.',
    };
    let copChanged = false;
    for (const key of ['copSlopePerK', 'copReferenceC', 'copMin'] as const) {
      if (!(key in energy)) continue;
      changes.push({ path: `energy.${key}`, before: energy[key], after: undefined, note: copNotes[key] });
      delete energy[key];
      copChanged = true;
    }
    if (copChanged && typeof energy.mechanicalCop === 'number') {
      changes.push({
        path: 'energy.mechanicalCop',
        before: energy.mechanicalCop,
        after: energy.mechanicalCop,
        note: 'Kept, and now read as the rated full-load COP at the rating conditions; check it against the equipment’s rating.',
      });
    }
    if ('blowdownRatio' in energy) {
      const b = energy.blowdownRatio;
      delete energy.blowdownRatio;
      if (typeof b === 'number' && b > 0) {
        const exact = 1 + 1 / b;
        const cycles = Math.round(clamp(exact, CYCLES_MIN, CYCLES_MAX) * 100) / 100;
        energy.cyclesOfConcentration = cycles;
        changes.push({
          path: 'energy.blowdownRatio',
          before: b,
          after: undefined,
          note: 'Blowdown is now set by the cycles of concentration.',
        });
        changes.push({
          path: 'energy.cyclesOfConcentration',
          before: undefined,
          after: cycles,
          note: `Cycles = 1 + 1 / blowdown ratio = 1 + 1 / ${b}${exact !== cycles ? ` (${round4(exact)}, rounded${exact > CYCLES_MAX || exact < CYCLES_MIN ? ' and limited' : ''})` : ''}.`,
        });
      } else {
        energy.cyclesOfConcentration = CYCLES_MAX;
        changes.push({
          path: 'energy.blowdownRatio',
          before: b,
          after: undefined,
          note: `A blowdown ratio of ${String(b)} means no blowdown; the nearest the cycles of concentration allow is ${CYCLES_MAX} cycles.`,
        });
        changes.push({ path: 'energy.cyclesOfConcentration', before: undefined, after: CYCLES_MAX, note: 'The highest cycles of concentration accepted.' });
      }
    }
    if ('towerEvaporationShare' in energy) {
      changes.push({
        path: 'energy.towerEvaporationShare',
        before: energy.towerEvaporationShare,
        after: undefined,
        note: 'The tower’s evaporation now follows the weather (air leaving the tower saturated); nothing replaces this share.',
      });
      delete energy.towerEvaporationShare;
    }
  }

  if ('elevationM' in scenario) {
    changes.push({
      path: 'elevationM',
      before: scenario.elevationM,
      after: undefined,
      note: 'A run takes the elevation of its climate file’s site (for the air pressure where the file has none, and the envelope’s altitude derating); this scenario’s own elevation was never used there, so it is removed.',
    });
    delete scenario.elevationM;
  }

  if (changes.length === 0) return { scenario: json, changes };
  if (system) scenario.system = system;
  if (energy) scenario.energy = energy;
  return { scenario, changes };
}
