// @ts-nocheck
import { and, asc, eq } from 'drizzle-orm';
import { parseScenario } from '../../shared/scenario';
import { prepareSweep, type SweepAxis } from '../../shared/sweep';
import type { Tx } from '../db/client';
import { climateFiles, scenarios, sites } from '../db/schema';
import { insertSweep } from '../runs/new-sweep';

/** The demo sweep: the supply setpoint of the demo's direct-air scenario from 18 to 30 °C by 1 K. */
const DEMO_AXES: SweepAxis[] = [{ input: 'system.supplyAirC', from: 18, to: 30, step: 1 }];

/**
 * Adds one synthetic demo sweep to a demo project that already has its scenarios and climate files
 * (call it after seedDemoClimate, inside the same transaction). Its points are stored as queued runs,
 * which `runQueue.resume()` picks up at start-up like the demo's other runs. Returns the sweep id, or
 * null when the project has no direct-air scenario or no climate file.
 */
export function seedDemoSweep(tx: Tx, projectId: number, createdBy: number | null): number | null {
  const scenarioRow = tx
    .select()
    .from(scenarios)
    .where(eq(scenarios.projectId, projectId))
    .orderBy(asc(scenarios.id))
    .all()
    .find((s) => (JSON.parse(s.scenarioJson) as { system: { kind: string } }).system.kind === 'direct-air');
  const file = tx
    .select()
    .from(climateFiles)
    .where(and(eq(climateFiles.projectId, projectId)))
    .orderBy(asc(climateFiles.id))
    .get();
  if (!scenarioRow || !file) return null;
  const site = tx.select().from(sites).where(eq(sites.id, file.siteId)).get()!;
  const parsed = parseScenario(JSON.parse(scenarioRow.scenarioJson));
  if (!parsed.ok) return null;
  const prepared = prepareSweep(parsed.scenario, DEMO_AXES);
  if (!prepared.ok) return null;
  const { sweep } = insertSweep(tx, {
    projectId,
    name: 'Supply setpoint sweep, 18–30 °C (synthetic demo)',
    scenarioId: scenarioRow.id,
    base: parsed.scenario,
    axes: DEMO_AXES,
    points: prepared.points,
    file,
    site,
    createdBy,
  });
  return sweep.id;
}
