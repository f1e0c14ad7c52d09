import { and, desc, eq, inArray } from 'drizzle-orm';
import { parseScenario, withoutOwnElevation, type Scenario } from '../../shared/scenario';
import { recordRequestAudit, type Actor } from '../auth/audit';
import type { Db } from '../db/client';
import { scenarios } from '../db/schema';
import { HttpError } from '../http-error';
import { parseMigrationRecord, type ScenarioMigrationRecord } from './saved-migration';

type ScenarioRow = typeof scenarios.$inferSelect;

/** The scenario JSON checked by the shared schema; its problems come back as a 400 naming each field. */
export function validScenario(input: unknown): Scenario {
  const parsed = parseScenario(input);
  if (!parsed.ok) throw new HttpError(400, 'invalid_scenario', parsed.errors.join('; '), { errors: parsed.errors });
  // One elevation: the site's. A scenario file written for the command line may carry its own; it is not kept.
  return withoutOwnElevation(parsed.scenario);
}

/** A saved scenario as the API gives it; `migration` lists what the start-up migration changed (null if never migrated). */
export function presentScenario(row: ScenarioRow) {
  const { scenarioJson, migrationJson, ...rest } = row;
  return { ...rest, scenario: JSON.parse(scenarioJson) as Scenario, migration: parseMigrationRecord(migrationJson) };
}

/** The saved scenario with this id in this project; 404 when there is none. */
export function scenarioOr404(db: Db, projectId: number, scenarioId: number): ScenarioRow {
  const row = db
    .select()
    .from(scenarios)
    .where(and(eq(scenarios.id, scenarioId), eq(scenarios.projectId, projectId)))
    .get();
  if (!row) throw new HttpError(404, 'not_found', `Scenario ${scenarioId} was not found in this project.`);
  return row;
}

/** The saved scenarios with these ids, in the order asked; 404 naming the first that is not in this project. */
export function scenariosOr404(db: Db, projectId: number, scenarioIds: number[]): ScenarioRow[] {
  const rows = db
    .select()
    .from(scenarios)
    .where(and(eq(scenarios.projectId, projectId), inArray(scenarios.id, scenarioIds)))
    .all();
  return scenarioIds.map((id) => {
    const row = rows.find((s) => s.id === id);
    if (!row) throw new HttpError(404, 'not_found', `Scenario ${id} was not found in this project.`);
    return row;
  });
}

export function listScenarios(db: Db, projectId: number): ScenarioRow[] {
  return db.select().from(scenarios).where(eq(scenarios.projectId, projectId)).orderBy(desc(scenarios.updatedAt)).all();
}

/** Saves a checked scenario as a new one; `duplicateOf` goes into the audit line of a copy. Writes take `by`, the request, for the audit line. */
export function createScenario(db: Db, projectId: number, scenario: Scenario, by: Actor, duplicateOf?: number): ScenarioRow {
  return db.transaction((tx) => {
    const created = tx
      .insert(scenarios)
      .values({ projectId, name: scenario.name, scenarioJson: JSON.stringify(scenario), createdBy: by.user?.id ?? null })
      .returning()
      .get();
    recordRequestAudit(
      tx,
      by,
      'scenario.create',
      created.name,
      duplicateOf === undefined ? { scenarioId: created.id } : { scenarioId: created.id, duplicateOf },
    );
    return created;
  });
}

export function updateScenario(db: Db, existing: ScenarioRow, scenario: Scenario, by: Actor): ScenarioRow {
  return db.transaction((tx) => {
    const updated = tx
      .update(scenarios)
      .set({ name: scenario.name, scenarioJson: JSON.stringify(scenario), updatedAt: new Date() })
      .where(eq(scenarios.id, existing.id))
      .returning()
      .get();
    recordRequestAudit(tx, by, 'scenario.update', updated.name, { scenarioId: existing.id, previousName: existing.name });
    return updated;
  });
}

/** A copy named "… (copy)", cut to the 120 characters a name may have. */
export function duplicateScenario(db: Db, existing: ScenarioRow, by: Actor): ScenarioRow {
  const original = presentScenario(existing).scenario;
  const copy = { ...original, name: `${original.name} (copy)`.slice(0, 120) };
  return createScenario(db, existing.projectId, copy, by, existing.id);
}

/**
 * The notice of what the start-up migration changed is shown until an engineer or owner dismisses it, once: a second
 * dismissal changes nothing; a scenario never migrated has no notice (409).
 */
export function dismissMigrationNotice(db: Db, existing: ScenarioRow, by: Actor): ScenarioRow {
  const record = parseMigrationRecord(existing.migrationJson);
  if (!record) throw new HttpError(409, 'no_migration', `Scenario ${existing.id} was never migrated, so there is no notice to dismiss.`);
  if (record.dismissedAt) return existing;
  const dismissed: ScenarioMigrationRecord = { ...record, dismissedAt: new Date().toISOString(), dismissedBy: by.user?.id ?? null };
  return db.transaction((tx) => {
    const updated = tx
      .update(scenarios)
      .set({ migrationJson: JSON.stringify(dismissed) })
      .where(eq(scenarios.id, existing.id))
      .returning()
      .get();
    recordRequestAudit(tx, by, 'scenario.update', existing.name, {
      scenarioId: existing.id,
      migrationNoticeDismissed: true,
      changes: record.changes.length,
    });
    return updated;
  });
}

export function deleteScenario(db: Db, existing: ScenarioRow, by: Actor): void {
  db.transaction((tx) => {
    tx.delete(scenarios).where(eq(scenarios.id, existing.id)).run();
    recordRequestAudit(tx, by, 'scenario.delete', existing.name, { scenarioId: existing.id });
  });
}
