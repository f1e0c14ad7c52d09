// @ts-nocheck
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { and, asc, eq } from 'drizzle-orm';
import { parseScenario } from '../../shared/scenario';
import { prepareSweep, type SweepAxis } from '../../shared/sweep';
import type { Tx } from '../db/client';
import { climateFiles, runs, scenarios, sites } from '../db/schema';
import { appRoot } from '../paths';
import { newRunValues } from '../runs/new-run';
import { insertSweep } from '../runs/new-sweep';

/** The warm invented site the demo's hybrid hall stands on (sample-weather/sites.json, synthetic weather). */
const WARM_SITE_NAME = 'Teluk Hijau';

/**
 * The classic hybrid study: the share of heat to liquid against the facility-water supply (27 °C to 45 °C,
 * W27 to W45 in steps of about one class), to see which give zero liquid-loop mechanical hours on the site.
 */
const HYBRID_AXES: SweepAxis[] = [
  { input: 'system.liquidShare', from: 0.6, to: 0.9, step: 0.3 },
  { input: 'system.liquid.chilledWaterSupplyC', from: 27, to: 45, step: 6 },
];

/**
 * Adds the demo's hybrid hall (sample-weather/scenarios/hybrid-w32-dry-cooler.json, synthetic) to a demo project
 * that already has its sites and climate files: the scenario, one queued run on the warm site, and its sweep.
 * Returns the sweep id, or null when the warm site or its file is missing.
 */
export function seedDemoHybrid(tx: Tx, projectId: number, createdBy: number | null): number | null {
  const parsed = parseScenario(JSON.parse(readFileSync(path.join(appRoot, 'sample-weather', 'scenarios', 'hybrid-w32-dry-cooler.json'), 'utf8')));
  if (!parsed.ok) throw new Error(`Sample hybrid scenario is not valid: ${parsed.errors.join('; ')}`);
  const site = tx
    .select()
    .from(sites)
    .where(and(eq(sites.projectId, projectId), eq(sites.name, WARM_SITE_NAME)))
    .get();
  const file = site && tx.select().from(climateFiles).where(eq(climateFiles.siteId, site.id)).orderBy(asc(climateFiles.id)).get();
  if (!site || !file) return null;
  const scenarioJson = JSON.stringify(parsed.scenario);
  const scenario = tx.insert(scenarios).values({ projectId, name: parsed.scenario.name, scenarioJson, createdBy }).returning().get();
  tx.insert(runs)
    .values(newRunValues({ projectId, scenarioId: scenario.id, scenarioJson, file, site, createdBy }))
    .run();
  const prepared = prepareSweep(parsed.scenario, HYBRID_AXES);
  if (!prepared.ok) throw new Error(`The demo hybrid sweep does not prepare: ${prepared.errors.join('; ')}`);
  const { sweep } = insertSweep(tx, {
    projectId,
    name: 'Hybrid hall: liquid share × facility-water supply (synthetic demo)',
    scenarioId: scenario.id,
    base: parsed.scenario,
    axes: HYBRID_AXES,
    points: prepared.points,
    file,
    site,
    createdBy,
  });
  return sweep.id;
}
