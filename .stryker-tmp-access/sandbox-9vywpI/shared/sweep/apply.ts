/**
 * A sweep point applied to the base scenario: a copy with each swept value set at its path. An
 * envelope preset replaces the whole envelope with the preset's limits, as choosing it in the editor does.
 */
// @ts-nocheck

import { findEnvelopePreset } from '../scenario/envelopes';
import type { Scenario, ScenarioInput } from '../scenario/schema';
import { SWEEP_INPUTS, presetLabel, type SweepInputPath } from './inputs';
import type { SweepPointValues, SweepValue } from './expand';

/**
 * A deep copy of `source` with `value` at the dotted `path` ("system.supplyAirC"). The path must already
 * exist: a sweep only changes inputs the scenario has, so a missing key throws RangeError naming it.
 */
export function withValueAt<T extends object>(source: T, path: string, value: unknown): T {
  const keys = path.split('.');
  if (keys.some((k) => k === '')) throw new RangeError(`path must be dotted keys, got "${path}"`);
  const copy = structuredClone(source);
  let node: Record<string, unknown> = copy as Record<string, unknown>;
  for (const [i, key] of keys.entries()) {
    if (!Object.hasOwn(node, key)) throw new RangeError(`path "${path}" is not in the scenario (no "${keys.slice(0, i + 1).join('.')}")`);
    if (i === keys.length - 1) {
      node[key] = value;
      break;
    }
    const next = node[key];
    if (next === null || typeof next !== 'object')
      throw new RangeError(`path "${path}" runs through "${keys.slice(0, i + 1).join('.')}", which is not an object`);
    node = next as Record<string, unknown>;
  }
  return copy;
}

/** "supply air 24 °C", "envelope Allowable A2 (2021)": one swept value in a run's name (SI, as stored). */
export function describeSweepValue(path: SweepInputPath, value: SweepValue): string {
  const info = SWEEP_INPUTS[path];
  if (typeof value === 'string') return `${info.short} ${presetLabel(value)}`;
  const unit = { temperature: ' °C', temperatureDifference: ' K', fraction: '', powerKw: ' kW', preset: '' }[info.quantity];
  return `${info.short} ${value.toLocaleString('en', { maximumFractionDigits: 4 })}${unit}`;
}

/** "system.supplyAirC = 24, system.evaporativeEffectiveness = 0.7": a point as its paths and values. */
export const pointAsText = (values: SweepPointValues) =>
  Object.entries(values)
    .map(([path, v]) => `${path} = ${v}`)
    .join(', ');

const MAX_NAME = 200;

/** " · supply air 24 °C, IT load 500 kW": what a point's run name ends with (SI, as the scenario stores values). */
export function sweepPointSuffix(values: SweepPointValues): string {
  return ` · ${(Object.entries(values) as [SweepInputPath, SweepValue][]).map(([path, value]) => describeSweepValue(path, value)).join(', ')}`;
}

/** A point's run name without the point's values: the base scenario's name (cut short if it was long). */
export function baseNameOfPoint(name: string, values: SweepPointValues): string {
  const suffix = sweepPointSuffix(values);
  return name.endsWith(suffix) ? name.slice(0, -suffix.length) : name;
}

/** The base scenario with this point's values, named after them; not yet validated. */
export function applySweepPoint(base: Scenario, values: SweepPointValues): ScenarioInput {
  let scenario: ScenarioInput = structuredClone(base);
  for (const [path, value] of Object.entries(values) as [SweepInputPath, SweepValue][]) {
    if (path === 'envelope.presetId') {
      const preset = typeof value === 'string' ? findEnvelopePreset(value) : undefined;
      if (!preset) throw new RangeError(`envelope.presetId: there is no envelope preset "${value}"`);
      scenario = { ...scenario, envelope: { presetId: preset.id, ...structuredClone(preset.limits) } };
    } else {
      scenario = withValueAt(scenario, path, value);
      // A swept facility-water supply is a typed (custom) one: it no longer claims the class it started from.
      if (path === 'system.liquid.chilledWaterSupplyC' && scenario.system.kind === 'hybrid') delete scenario.system.liquid.facilityWaterClassId;
    }
  }
  const suffix = sweepPointSuffix(values);
  scenario.name = `${base.name.slice(0, Math.max(1, MAX_NAME - suffix.length))}${suffix}`.slice(0, MAX_NAME);
  return scenario;
}
