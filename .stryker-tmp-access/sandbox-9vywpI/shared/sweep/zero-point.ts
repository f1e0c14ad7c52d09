/**
 * Where mechanical hours reach zero along a one-input sweep. Not interpolated: the answer is a swept
 * point. Points not yet finished (null) are skipped, and so are points whose supply setpoint breaks the
 * envelope (every hour an excursion): their zero mechanical hours are no result, and the sentence names them.
 */
// @ts-nocheck

import type { SweepValue } from './expand';

export interface SweepMechanical {
  value: SweepValue;
  /** Mechanical hours of the finished point; null while it runs, or when it failed. */
  mechanicalHours: number | null;
  /** The point's supply setpoint is outside the derated envelope. */
  breaksEnvelope?: boolean;
}

/** A finished point left out of the statement because it breaks the envelope. */
export interface LeftOutPoint {
  index: number;
  value: SweepValue;
}

export type ZeroMechanical = ZeroMechanicalKind & { leftOut: LeftOutPoint[] };

type ZeroMechanicalKind =
  /**
   * No finished point has zero mechanical hours; the fewest, at the first point that has them (null before any
   * point finishes). Hours that stay mechanical at every setpoint are usually too humid for the envelope.
   */
  | { kind: 'none'; fewest: { index: number; value: SweepValue; mechanicalHours: number } | null }
  /** Zero at this point and at every finished point after it: "from X". */
  | { kind: 'from'; index: number; value: SweepValue }
  /** Zero from the first point up to this one, above zero after it (a larger approach, say): "up to X". */
  | { kind: 'up-to'; index: number; value: SweepValue }
  /** Zero first at this point but not at every point after it. */
  | { kind: 'at'; index: number; value: SweepValue };

export function zeroMechanical(points: readonly SweepMechanical[]): ZeroMechanical {
  const indexed = points.map((p, index) => ({ ...p, index }));
  const leftOut = indexed.filter((p) => p.mechanicalHours !== null && p.breaksEnvelope).map((p) => ({ index: p.index, value: p.value }));
  const finished = indexed.filter((p) => p.mechanicalHours !== null && !p.breaksEnvelope);
  return { ...zeroAmong(finished), leftOut };
}

function zeroAmong(finished: (SweepMechanical & { index: number })[]): ZeroMechanicalKind {
  const first = finished.findIndex((p) => p.mechanicalHours === 0);
  if (first < 0) {
    let fewest: (typeof finished)[number] | null = null;
    for (const q of finished) if (fewest === null || q.mechanicalHours! < fewest.mechanicalHours!) fewest = q;
    return { kind: 'none', fewest: fewest && { index: fewest.index, value: fewest.value, mechanicalHours: fewest.mechanicalHours! } };
  }
  const rest = finished.slice(first);
  const p = finished[first];
  if (rest.every((q) => q.mechanicalHours === 0)) return { kind: 'from', index: p.index, value: p.value };
  if (first === 0) {
    const lastLeading = rest.findIndex((q) => q.mechanicalHours !== 0) - 1;
    const q = rest[lastLeading];
    return { kind: 'up-to', index: q.index, value: q.value };
  }
  return { kind: 'at', index: p.index, value: p.value };
}

/** "28 °C", "28 °C and 29 °C", "28 °C, 29 °C and 30 °C". */
export function listOf(items: string[]): string {
  return items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/** The sentence the sweep page shows, with the value formatted by the caller (units, SI/IP). */
export function zeroMechanicalText(zero: ZeroMechanical, format: (value: SweepValue) => string): string {
  const main = zeroSentence(zero, format);
  if (zero.leftOut.length === 0) return main;
  const names = listOf(zero.leftOut.map((p) => format(p.value)));
  const one = zero.leftOut.length === 1;
  return `${main.replace(/^No swept point/, 'No swept point inside the envelope')} Left out: ${names}, where the supply setpoint is outside the inlet envelope (derated for the site's elevation), so every hour ${one ? 'of that point' : 'of those points'} is an excursion.`;
}

function zeroSentence(zero: ZeroMechanical, format: (value: SweepValue) => string): string {
  switch (zero.kind) {
    case 'none':
      return zero.fewest
        ? `No swept point reaches zero mechanical hours; the fewest are ${zero.fewest.mechanicalHours.toLocaleString('en')} h, first at ${format(zero.fewest.value)}.`
        : 'No swept point reaches zero mechanical hours.';
    case 'from':
      return zero.index === 0
        ? `Mechanical hours are zero at every swept point, from ${format(zero.value)}.`
        : `Mechanical hours reach zero from ${format(zero.value)}.`;
    case 'up-to':
      return `Mechanical hours are zero up to ${format(zero.value)}.`;
    case 'at':
      return `Mechanical hours first reach zero at ${format(zero.value)}, but not at every point after it.`;
  }
}
