// @ts-nocheck
import { migrateScenario } from '../shared/scenario';
import type { Db } from './db/client';
import { requeueOldDemoRuns } from './demo/rerun';
import { seedDemo } from './demo/seed';
import { migrateSavedScenarios } from './scenarios/saved-migration';

/**
 * What the server does to its stored data before it answers anyone: in demo mode, the demo workspace in an empty database; every
 * saved scenario (and sweep base) that carries retired inputs brought to the current inputs, with the changes kept for
 * the editor's one-time notice; and the demo's runs queued again by the current engine where the demo was run by an
 * older one. Runs themselves are never rewritten. The run queue's resume() then starts whatever is queued.
 */
export function prepareStoredData(
  db: Db,
  { demo }: { demo: boolean },
): { seeded: boolean; migratedScenarios: number; migratedSweeps: number; skipped: string[]; requeuedDemoRuns: number } {
  const { seeded } = demo ? seedDemo(db) : { seeded: false };
  const migrated = migrateSavedScenarios(db, migrateScenario);
  const requeuedDemoRuns = demo ? requeueOldDemoRuns(db) : 0;
  return { seeded, migratedScenarios: migrated.scenarios, migratedSweeps: migrated.sweeps, skipped: migrated.skipped, requeuedDemoRuns };
}
