import { formatQuantity } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';

/**
 * An engine note as a person reads it: the values in their units and the input by its plain name. The engine
 * stores its notes in SI with field names (shared/scenario/run.ts); the known ones are written again here, any
 * other passes through unchanged.
 */
export function engineNoteText(note: string, system: UnitSystem): string {
  const t = (c: string) => formatQuantity('temperature', system, Number(c));
  const above = /^supplyAirC (-?[\d.]+) °C is above the envelope's maximum dry-bulb (-?[\d.]+) °C(?: \(derated for (-?[\d.]+) m\))?: every hour is an excursion\.$/.exec(note);
  if (above) {
    const derated = above[3] ? ` (derated for the site's ${formatQuantity('elevation', system, Number(above[3]))})` : '';
    return `The supply setpoint ${t(above[1])} is above the envelope's maximum dry-bulb ${t(above[2])}${derated}: every hour is an excursion.`;
  }
  const below = /^supplyAirC (-?[\d.]+) °C is below the envelope's minimum dry-bulb (-?[\d.]+) °C: every hour is an excursion\.$/.exec(note);
  if (below) return `The supply setpoint ${t(below[1])} is below the envelope's minimum dry-bulb ${t(below[2])}: every hour is an excursion.`;
  return note;
}
