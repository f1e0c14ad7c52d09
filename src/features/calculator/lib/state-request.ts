import { plainEngineMessage } from '@/lib/engine-notes';
import { fromDisplay, type QuantityKind } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import { moistAirState, StateRequestError, type MoistAirRequest, type MoistAirState } from '../../../../shared/psychrometrics';

export const propertyInputs = [
  { key: 'dryBulbC', label: 'Dry-bulb', kind: 'temperature' },
  { key: 'rhPct', label: 'Relative humidity', kind: 'percent' },
  { key: 'dewPointC', label: 'Dew point', kind: 'temperature' },
  { key: 'wetBulbC', label: 'Wet-bulb', kind: 'temperature' },
  { key: 'humidityRatio', label: 'Humidity ratio', kind: 'humidityRatio' },
  { key: 'enthalpyKJPerKg', label: 'Enthalpy', kind: 'enthalpy' },
] as const satisfies readonly { key: keyof MoistAirRequest; label: string; kind: QuantityKind | 'percent' }[];

export type PropertyKey = (typeof propertyInputs)[number]['key'];

export interface CalculatorInput {
  /** Whether the pressure is given directly or by the site's elevation. */
  basis: 'pressure' | 'elevation';
  /** Typed in the person's unit system: kPa or inHg, m or ft. */
  basisText: string;
  properties: Partial<Record<PropertyKey, string>>;
  saturated: boolean;
}

export type CalculatorOutcome = { ok: true; state: MoistAirState } | { ok: false; message: string; problem: string | null; field?: string };

function parse(text: string | undefined): number | undefined | null {
  if (text === undefined || text.trim() === '') return undefined;
  const t = text.trim().replace(',', '.');
  return /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t) ? Number(t) : null;
}

/**
 * The typed inputs as an engine request in SI, and the engine's answer. Only filled boxes are sent, so
 * the engine's phase rule decides what is too little or too much; its message is shown with plain names, in the person's units.
 */
export function solveState(input: CalculatorInput, system: UnitSystem): CalculatorOutcome {
  const request: MoistAirRequest = {};
  const basis = parse(input.basisText);
  if (basis === null)
    return { ok: false, message: `${input.basis === 'pressure' ? 'Pressure' : 'Elevation'} is not a number.`, problem: null, field: input.basis };
  if (basis !== undefined) {
    if (input.basis === 'pressure') request.pressurePa = fromDisplay('pressure', system, basis);
    else request.elevationM = fromDisplay('elevation', system, basis);
  }
  for (const p of propertyInputs) {
    const value = parse(input.properties[p.key]);
    if (value === null) return { ok: false, message: `${p.label} is not a number.`, problem: null, field: p.key };
    if (value !== undefined) request[p.key] = p.kind === 'percent' ? value : fromDisplay(p.kind, system, value);
  }
  if (input.saturated) request.saturated = true;
  try {
    return { ok: true, state: moistAirState(request) };
  } catch (error) {
    // The engine writes SI and field names; the person reads their units and plain names.
    if (error instanceof StateRequestError) return { ok: false, message: plainEngineMessage(error.message, system), problem: error.problem };
    if (error instanceof RangeError) return { ok: false, message: plainEngineMessage(error.message, system), problem: 'out-of-range' };
    throw error;
  }
}
