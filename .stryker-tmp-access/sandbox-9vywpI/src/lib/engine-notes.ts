// @ts-nocheck
import { formatQuantity } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';

/**
 * An engine note as a person reads it: the values in their units and the input by its plain name. The engine
 * stores its notes in SI with field names (shared/scenario/run.ts); the known ones are written again here, any
 * other passes through unchanged.
 */
export function engineNoteText(note: string, system: UnitSystem): string {
  const t = (c: string) => formatQuantity('temperature', system, Number(c));
  const above =
    /^supplyAirC (-?[\d.]+) °C is above the envelope's maximum dry-bulb (-?[\d.]+) °C(?: \(derated for (-?[\d.]+) m\))?: every hour is an excursion\.$/.exec(
      note,
    );
  if (above) {
    const derated = above[3] ? ` (derated for the site's ${formatQuantity('elevation', system, Number(above[3]))})` : '';
    return `The supply setpoint ${t(above[1])} is above the envelope's maximum dry-bulb ${t(above[2])}${derated}: every hour is an excursion.`;
  }
  const below = /^supplyAirC (-?[\d.]+) °C is below the envelope's minimum dry-bulb (-?[\d.]+) °C: every hour is an excursion\.$/.exec(note);
  if (below) return `The supply setpoint ${t(below[1])} is below the envelope's minimum dry-bulb ${t(below[2])}: every hour is an excursion.`;
  return note;
}

/** The engine's field names as plain input names. */
const PLAIN_NAMES: Record<string, string> = {
  dryBulbC: 'dry-bulb',
  rhPct: 'relative humidity',
  dewPointC: 'dew point',
  wetBulbC: 'wet-bulb',
  humidityRatio: 'humidity ratio',
  enthalpyKJPerKg: 'enthalpy',
  pressurePa: 'pressure',
  elevationM: 'elevation',
  supplyAirC: 'supply setpoint',
};

/**
 * A message from the psychrometric engine (the calculator's errors) with plain input names, and its values in the
 * person's units: "dewPointC = 30 °C is above dryBulbC = 25 °C" reads "dew point = 86.0 °F is above dry-bulb = 77.0 °F".
 */
export function plainEngineMessage(message: string, system: UnitSystem): string {
  const named = message.replace(
    /\b(dryBulbC|rhPct|dewPointC|wetBulbC|humidityRatio|enthalpyKJPerKg|pressurePa|elevationM|supplyAirC)\b/g,
    (key) => PLAIN_NAMES[key],
  );
  if (system === 'SI') return named;
  return named
    .replace(/(-?\d+(?:\.\d+)?(?:e[-+]?\d+)?) °C/g, (_, v: string) => formatQuantity('temperature', system, Number(v)))
    .replace(/(-?\d+(?:\.\d+)?(?:e[-+]?\d+)?) kg\/kg/g, (_, v: string) => formatQuantity('humidityRatio', system, Number(v)))
    .replace(/(-?\d+(?:\.\d+)?) kJ\/kg/g, (_, v: string) => formatQuantity('enthalpy', system, Number(v)))
    .replace(/(-?\d+(?:\.\d+)?) Pa\b/g, (_, v: string) => formatQuantity('pressure', system, Number(v)))
    .replace(/(-?\d+(?:\.\d+)?) m\b/g, (_, v: string) => formatQuantity('elevation', system, Number(v)));
}
