// @ts-nocheck
import { and, eq, isNull } from 'drizzle-orm';
import { ENGINE_VERSION, parseScenario } from '../../shared/scenario';
import type { Db } from '../db/client';
import { climateFiles, projects, runs, scenarios, sites } from '../db/schema';
import { newRunValues } from '../runs/new-run';
import { DEMO_PROJECT_NAME } from './seed';

/**
 * In a database whose demo project was seeded by an older engine, queues one new run of each demo scenario on each
 * climate file it was run on before, by the current engine, so the demo shows what the engine counts now. The old
 * runs stay as they were (a run is immutable and may be in a comparison or a shared report); a pair that already has
 * a run by the current engine, in any state, is not queued again, so a restart adds nothing. Sweep points are left:
 * a sweep is a study of its own, which a person starts again as a new sweep. Only the project the seed made, by its
 * name, is touched; nothing in a person's own projects. Returns the number of runs queued (the run queue's resume()
 * starts them).
 */
export function requeueOldDemoRuns(db: Db, engineVersion: string = ENGINE_VERSION): number {
  const demo = db.select({ id: projects.id }).from(projects).where(eq(projects.name, DEMO_PROJECT_NAME)).get();
  if (!demo) return 0;
  const demoRuns = db
    .select({ scenarioId: runs.scenarioId, climateFileId: runs.climateFileId, engineVersion: runs.engineVersion, createdBy: runs.createdBy })
    .from(runs)
    .where(and(eq(runs.projectId, demo.id), isNull(runs.sweepId)))
    .all();
  const key = (scenarioId: number | null, fileId: number | null) => `${scenarioId}:${fileId}`;
  const current = new Set(demoRuns.filter((r) => r.engineVersion === engineVersion).map((r) => key(r.scenarioId, r.climateFileId)));
  const pending = new Map<string, (typeof demoRuns)[number]>();
  for (const r of demoRuns) {
    if (r.scenarioId === null || r.climateFileId === null || r.engineVersion === engineVersion) continue;
    if (!current.has(key(r.scenarioId, r.climateFileId))) pending.set(key(r.scenarioId, r.climateFileId), r);
  }
  if (pending.size === 0) return 0;
  return db.transaction((tx) => {
    let queued = 0;
    for (const r of pending.values()) {
      const scenario = tx.select().from(scenarios).where(eq(scenarios.id, r.scenarioId!)).get();
      const file = tx.select().from(climateFiles).where(eq(climateFiles.id, r.climateFileId!)).get();
      if (!scenario || !file) continue;
      // A scenario that still does not read under the current schema is left for a person to fix in the editor.
      const parsed = parseScenario(JSON.parse(scenario.scenarioJson));
      if (!parsed.ok) continue;
      const site = tx.select().from(sites).where(eq(sites.id, file.siteId)).get();
      if (!site) continue;
      tx.insert(runs)
        .values(
          newRunValues({ projectId: demo.id, scenarioId: scenario.id, scenarioJson: JSON.stringify(parsed.scenario), file, site, createdBy: r.createdBy }),
        )
        .run();
      queued++;
    }
    return queued;
  });
}
