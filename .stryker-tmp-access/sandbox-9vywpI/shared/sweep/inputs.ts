/**
 * The scenario inputs a sweep can vary: where each sits in the scenario JSON, what it is called, how it
 * is shown, and on which systems it changes the hours. Labels are Tramontane's own words.
 */
// @ts-nocheck

import { ENVELOPE_PRESETS } from '../scenario/envelopes';
import type { ScenarioSystem } from '../scenario/schema';

export const SWEEP_INPUT_PATHS = [
  'system.supplyAirC',
  'system.chilledWaterSupplyC',
  'system.evaporativeEffectiveness',
  'system.heatExchangerEffectiveness',
  'system.approachK',
  'envelope.presetId',
  'energy.itLoadKw',
  'system.liquidShare',
  'system.liquid.chilledWaterSupplyC',
] as const;
export type SweepInputPath = (typeof SWEEP_INPUT_PATHS)[number];

/** How a swept value is shown: the client maps these to its SI/IP quantity kinds. */
export type SweepQuantity = 'temperature' | 'temperatureDifference' | 'fraction' | 'powerKw' | 'preset';

export interface SweepInputInfo {
  path: SweepInputPath;
  label: string;
  /** A few words for run names and chart titles, e.g. "supply air". */
  short: string;
  quantity: SweepQuantity;
  /** A sensible first range in SI, offered by the form. */
  suggested: { from: number; to: number; step: number } | null;
}

export const SWEEP_INPUTS: Record<SweepInputPath, SweepInputInfo> = {
  'system.supplyAirC': {
    path: 'system.supplyAirC',
    label: 'Supply air setpoint',
    short: 'supply air',
    quantity: 'temperature',
    suggested: { from: 18, to: 30, step: 1 },
  },
  'system.chilledWaterSupplyC': {
    path: 'system.chilledWaterSupplyC',
    label: 'Chilled-water supply',
    short: 'chilled water',
    quantity: 'temperature',
    suggested: { from: 10, to: 22, step: 1 },
  },
  'system.evaporativeEffectiveness': {
    path: 'system.evaporativeEffectiveness',
    label: 'Evaporative effectiveness',
    short: 'evaporative ε',
    quantity: 'fraction',
    suggested: { from: 0, to: 0.9, step: 0.1 },
  },
  'system.heatExchangerEffectiveness': {
    path: 'system.heatExchangerEffectiveness',
    label: 'Heat-exchanger effectiveness',
    short: 'exchanger ε',
    quantity: 'fraction',
    suggested: { from: 0.5, to: 0.8, step: 0.05 },
  },
  'system.approachK': {
    path: 'system.approachK',
    label: 'Approach',
    short: 'approach',
    quantity: 'temperatureDifference',
    suggested: { from: 2, to: 8, step: 1 },
  },
  'envelope.presetId': { path: 'envelope.presetId', label: 'Inlet envelope preset', short: 'envelope', quantity: 'preset', suggested: null },
  'energy.itLoadKw': { path: 'energy.itLoadKw', label: 'IT load', short: 'IT load', quantity: 'powerKw', suggested: { from: 500, to: 2000, step: 250 } },
  'system.liquidShare': {
    path: 'system.liquidShare',
    label: 'Share of IT heat to liquid',
    short: 'liquid share',
    quantity: 'fraction',
    suggested: { from: 0.5, to: 0.9, step: 0.1 },
  },
  'system.liquid.chilledWaterSupplyC': {
    path: 'system.liquid.chilledWaterSupplyC',
    label: 'Facility-water supply',
    short: 'facility water',
    quantity: 'temperature',
    // W27 to W45 (facility-water classes, recalled from memory) in steps of about one class.
    suggested: { from: 27, to: 45, step: 6 },
  },
};

export const isSweepInputPath = (path: string): path is SweepInputPath => (SWEEP_INPUT_PATHS as readonly string[]).includes(path);

/**
 * Why this input cannot be swept on this system, or null when it can. An input is refused where the
 * classifier never reads it for that system, so every point would give the same hours.
 */
export function sweepInputRefusal(path: SweepInputPath, system: ScenarioSystem): string | null {
  const kind = system.kind;
  if (path === 'system.liquidShare' || path === 'system.liquid.chilledWaterSupplyC') {
    return kind === 'hybrid' ? null : `${path} applies to hybrid halls only; this scenario is ${kind}.`;
  }
  if (kind === 'hybrid') {
    if (path === 'energy.itLoadKw') return null;
    if (path === 'envelope.presetId') return sweepInputRefusal(path, system.air);
    return `${path} is not offered for a hybrid hall; sweep system.liquidShare or system.liquid.chilledWaterSupplyC (a grid of the two shows which class and share give zero mechanical hours).`;
  }
  switch (path) {
    case 'system.supplyAirC':
      return kind === 'water-side'
        ? 'system.supplyAirC does not set the hours of a water-side system (its chilled-water supply does); sweep system.chilledWaterSupplyC instead.'
        : null;
    case 'system.chilledWaterSupplyC':
    case 'system.approachK':
      return kind === 'water-side' ? null : `${path} applies to water-side systems only; this scenario is ${kind}.`;
    case 'system.heatExchangerEffectiveness':
      return kind === 'indirect-air' ? null : `${path} applies to indirect-air systems only; this scenario is ${kind}.`;
    case 'system.evaporativeEffectiveness':
      return kind === 'water-side' && system.heatRejection === 'cooling-tower'
        ? 'system.evaporativeEffectiveness does not apply to a cooling tower (its water approaches the wet-bulb whatever the pre-cooler); it applies to dry coolers and air-side systems.'
        : null;
    case 'envelope.presetId':
      return kind === 'direct-air'
        ? null
        : `envelope.presetId changes the hours of direct-air systems only: on a ${kind} system the hall air never meets outdoor air, so the envelope changes only the excursion flags.`;
    case 'energy.itLoadKw':
      return null;
  }
}

/** The label of a preset id, or the id itself when it is not a preset. */
export function presetLabel(id: string): string {
  return ENVELOPE_PRESETS.find((p) => p.id === id)?.label ?? id;
}
