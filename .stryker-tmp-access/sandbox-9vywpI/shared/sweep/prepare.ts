/**
 * A sweep checked whole before anything is stored: every input applies to the base scenario's system,
 * and every point's scenario passes the shared scenario schema. Server and form call the same check.
 */
// @ts-nocheck

import { parseScenario, type Scenario } from '../scenario/schema';
import { applySweepPoint, pointAsText } from './apply';
import { expandSweep, type SweepAxis, type SweepPointValues } from './expand';
import { sweepInputRefusal } from './inputs';

export interface PreparedPoint {
  values: SweepPointValues;
  scenario: Scenario;
}

export type PreparedSweep = { ok: true; points: PreparedPoint[] } | { ok: false; errors: string[] };

/** At most this many point errors are listed; the rest are counted. */
const LISTED = 5;

export function prepareSweep(base: Scenario, axes: readonly SweepAxis[]): PreparedSweep {
  const refusals = axes.map((a) => sweepInputRefusal(a.input, base.system)).filter((r): r is string => r !== null);
  if (refusals.length) return { ok: false, errors: refusals };
  let values: SweepPointValues[];
  try {
    values = expandSweep(axes);
  } catch (error) {
    return { ok: false, errors: [(error as Error).message] };
  }
  const points: PreparedPoint[] = [];
  const errors: string[] = [];
  let bad = 0;
  for (const v of values) {
    const parsed = parseScenario(applySweepPoint(base, v));
    if (parsed.ok) {
      points.push({ values: v, scenario: parsed.scenario });
      continue;
    }
    bad++;
    // "system.supplyAirC: must be …" reads as "system.supplyAirC must be …" after the point's own values.
    if (errors.length < LISTED) errors.push(`${pointAsText(v)} is refused: ${parsed.errors.map((e) => e.replace(/^([\w.]+): /, '$1 ')).join('; ')}`);
  }
  if (bad > LISTED) errors.push(`and ${bad - LISTED} more points`);
  return bad ? { ok: false, errors } : { ok: true, points };
}
