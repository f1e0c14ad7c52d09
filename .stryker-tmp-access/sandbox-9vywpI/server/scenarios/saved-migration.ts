// @ts-nocheck
import { eq } from 'drizzle-orm';
import type { Db } from '../db/client';
import { scenarios, sweeps } from '../db/schema';
import { recordAudit } from '../auth/audit';

/** One retired input replaced by the scenario migration (shared/scenario/migrate.ts). */
export interface ScenarioChange {
  path: string;
  before: unknown;
  after: unknown;
  note: string;
}

/** The scenario migration: the JSON in its new form and what was changed (none when nothing was retired). */
export type MigrateScenarioFn = (json: unknown) => { scenario: unknown; changes: ScenarioChange[] };

/** What scenarios.migrationJson holds. */
export interface ScenarioMigrationRecord {
  /** ISO time of the start-up that migrated the scenario. */
  migratedAt: string;
  changes: ScenarioChange[];
  /** Set once an engineer or owner has read the notice and dismissed it; until then the editor shows it. */
  dismissedAt: string | null;
  dismissedBy: number | null;
}

/** A sweep's base scenario keeps its migration inside sweeps.specJson, beside the scenario it changed. */
export interface SweepBaseMigration {
  migratedAt: string;
  changes: ScenarioChange[];
}

export function parseMigrationRecord(json: string | null): ScenarioMigrationRecord | null {
  if (!json) return null;
  try {
    return JSON.parse(json) as ScenarioMigrationRecord;
  } catch {
    return null;
  }
}

/**
 * Brings every saved scenario, and every sweep's base scenario, to the current inputs: each whose JSON still carries
 * retired inputs is rewritten by `migrate`, with the changes kept (scenarios.migrationJson, or the sweep's spec) so the
 * editor can show them once. Each scenario is its own transaction with its audit line (scenario.update, by the system).
 * Runs are left exactly as they were: a run keeps the inputs it was made with. JSON that cannot be read is left alone
 * and reported in `skipped`, so one bad row never stops the server.
 */
export function migrateSavedScenarios(db: Db, migrate: MigrateScenarioFn, now: Date = new Date()): { scenarios: number; sweeps: number; skipped: string[] } {
  const skipped: string[] = [];
  let migratedScenarios = 0;
  let migratedSweeps = 0;
  const at = now.toISOString();

  for (const row of db
    .select({
      id: scenarios.id,
      projectId: scenarios.projectId,
      name: scenarios.name,
      scenarioJson: scenarios.scenarioJson,
      migrationJson: scenarios.migrationJson,
    })
    .from(scenarios)
    .all()) {
    const result = migrateJson(row.scenarioJson, migrate);
    if (result === 'unreadable') {
      skipped.push(`scenario ${row.id}`);
      continue;
    }
    if (result.changes.length === 0) continue;
    const previous = parseMigrationRecord(row.migrationJson);
    // A second migration adds to the first and shows the notice again.
    const record: ScenarioMigrationRecord = {
      migratedAt: at,
      changes: [...(previous?.changes ?? []), ...result.changes],
      dismissedAt: null,
      dismissedBy: null,
    };
    db.transaction((tx) => {
      tx.update(scenarios)
        .set({ scenarioJson: JSON.stringify(result.scenario), migrationJson: JSON.stringify(record) })
        .where(eq(scenarios.id, row.id))
        .run();
      recordAudit(
        tx,
        { actorId: null, projectId: row.projectId, action: 'scenario.update', target: row.name, detail: { scenarioId: row.id, migrated: result.changes } },
        now,
      );
    });
    migratedScenarios++;
  }

  for (const row of db.select({ id: sweeps.id, specJson: sweeps.specJson }).from(sweeps).all()) {
    let spec: { baseScenario?: unknown; baseScenarioMigrations?: SweepBaseMigration[] };
    try {
      spec = JSON.parse(row.specJson) as typeof spec;
    } catch {
      skipped.push(`sweep ${row.id}`);
      continue;
    }
    if (spec.baseScenario === undefined) continue;
    const result = migrateJson(JSON.stringify(spec.baseScenario), migrate);
    if (result === 'unreadable') {
      skipped.push(`sweep ${row.id}`);
      continue;
    }
    if (result.changes.length === 0) continue;
    const next = {
      ...spec,
      baseScenario: result.scenario,
      baseScenarioMigrations: [...(spec.baseScenarioMigrations ?? []), { migratedAt: at, changes: result.changes }],
    };
    db.update(sweeps)
      .set({ specJson: JSON.stringify(next) })
      .where(eq(sweeps.id, row.id))
      .run();
    migratedSweeps++;
  }
  return { scenarios: migratedScenarios, sweeps: migratedSweeps, skipped };
}

function migrateJson(json: string, migrate: MigrateScenarioFn): ReturnType<MigrateScenarioFn> | 'unreadable' {
  try {
    return migrate(JSON.parse(json));
  } catch {
    return 'unreadable';
  }
}
