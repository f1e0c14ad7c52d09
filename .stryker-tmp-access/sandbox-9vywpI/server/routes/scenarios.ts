// @ts-nocheck
import { and, desc, eq } from 'drizzle-orm';
import { z } from 'zod';
import { parseScenario, withoutOwnElevation, type Scenario } from '../../shared/scenario';
import { MODE_NAMES } from '../../shared/scenario';
import { standardOffsetMinutes } from '../../shared/climate';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { recordRequestAudit } from '../auth/audit';
import { findClimateFile, loadClimateSeries } from '../climate/store';
import { scenarios, sites } from '../db/schema';
import { HttpError } from '../http-error';
import { closedRequestSignal } from '../request-signal';
import { parseMigrationRecord, type ScenarioMigrationRecord } from '../scenarios/saved-migration';

const scenarioParams = z.object({ scenarioId: z.coerce.number().int().positive('scenarioId must be a positive whole number') });
const previewInput = z.object({ scenario: z.unknown(), climateFileId: z.number().int().positive() });

/** The scenario JSON checked by the shared schema; its problems come back as a 400 naming each field. */
export function validScenario(input: unknown): Scenario {
  const parsed = parseScenario(input);
  if (!parsed.ok) throw new HttpError(400, 'invalid_scenario', parsed.errors.join('; '), { errors: parsed.errors });
  // One elevation: the site's. A scenario file written for the command line may carry its own; it is not kept.
  return withoutOwnElevation(parsed.scenario);
}

/** A saved scenario as the API gives it; `migration` lists what the start-up migration changed (null if never migrated). */
function present(row: typeof scenarios.$inferSelect) {
  const { scenarioJson, migrationJson, ...rest } = row;
  return { ...rest, scenario: JSON.parse(scenarioJson) as Scenario, migration: parseMigrationRecord(migrationJson) };
}

export function scenarioRoutes(deps: AppDeps): RouteSpec[] {
  const { db, pool } = deps;

  function scenarioOr404(projectId: number, params: unknown) {
    const { scenarioId } = scenarioParams.parse(params);
    const row = db
      .select()
      .from(scenarios)
      .where(and(eq(scenarios.id, scenarioId), eq(scenarios.projectId, projectId)))
      .get();
    if (!row) throw new HttpError(404, 'not_found', `Scenario ${scenarioId} was not found in this project.`);
    return row;
  }

  return [
    route('get', '/projects/:projectId/scenarios', access.viewer, (req, res) => {
      const rows = db.select().from(scenarios).where(eq(scenarios.projectId, req.projectId!)).orderBy(desc(scenarios.updatedAt)).all();
      res.json({ scenarios: rows.map(present) });
    }),
    route('post', '/projects/:projectId/scenarios', access.engineer, (req, res) => {
      const scenario = validScenario(req.body?.scenario);
      const row = db.transaction((tx) => {
        const created = tx
          .insert(scenarios)
          .values({ projectId: req.projectId!, name: scenario.name, scenarioJson: JSON.stringify(scenario), createdBy: req.user!.id })
          .returning()
          .get();
        recordRequestAudit(tx, req, 'scenario.create', created.name, { scenarioId: created.id });
        return created;
      });
      res.status(201).json({ scenario: present(row) });
    }),
    route('get', '/projects/:projectId/scenarios/:scenarioId', access.viewer, (req, res) => {
      res.json({ scenario: present(scenarioOr404(req.projectId!, req.params)) });
    }),
    route('put', '/projects/:projectId/scenarios/:scenarioId', access.engineer, (req, res) => {
      const existing = scenarioOr404(req.projectId!, req.params);
      const scenario = validScenario(req.body?.scenario);
      const row = db.transaction((tx) => {
        const updated = tx
          .update(scenarios)
          .set({ name: scenario.name, scenarioJson: JSON.stringify(scenario), updatedAt: new Date() })
          .where(eq(scenarios.id, existing.id))
          .returning()
          .get();
        recordRequestAudit(tx, req, 'scenario.update', updated.name, { scenarioId: existing.id, previousName: existing.name });
        return updated;
      });
      res.json({ scenario: present(row) });
    }),
    // The notice of what the start-up migration changed is shown until an engineer or owner dismisses it, once.
    route('post', '/projects/:projectId/scenarios/:scenarioId/migration-notice/dismiss', access.engineer, (req, res) => {
      const existing = scenarioOr404(req.projectId!, req.params);
      const record = parseMigrationRecord(existing.migrationJson);
      if (!record) throw new HttpError(409, 'no_migration', `Scenario ${existing.id} was never migrated, so there is no notice to dismiss.`);
      if (record.dismissedAt) {
        res.json({ scenario: present(existing) });
        return;
      }
      const dismissed: ScenarioMigrationRecord = { ...record, dismissedAt: new Date().toISOString(), dismissedBy: req.user!.id };
      const row = db.transaction((tx) => {
        const updated = tx
          .update(scenarios)
          .set({ migrationJson: JSON.stringify(dismissed) })
          .where(eq(scenarios.id, existing.id))
          .returning()
          .get();
        recordRequestAudit(tx, req, 'scenario.update', existing.name, {
          scenarioId: existing.id,
          migrationNoticeDismissed: true,
          changes: record.changes.length,
        });
        return updated;
      });
      res.json({ scenario: present(row) });
    }),
    route('post', '/projects/:projectId/scenarios/:scenarioId/duplicate', access.engineer, (req, res) => {
      const existing = present(scenarioOr404(req.projectId!, req.params));
      const copy = { ...existing.scenario, name: `${existing.scenario.name} (copy)`.slice(0, 120) };
      const row = db.transaction((tx) => {
        const created = tx
          .insert(scenarios)
          .values({ projectId: req.projectId!, name: copy.name, scenarioJson: JSON.stringify(copy), createdBy: req.user!.id })
          .returning()
          .get();
        recordRequestAudit(tx, req, 'scenario.create', created.name, { scenarioId: created.id, duplicateOf: existing.id });
        return created;
      });
      res.status(201).json({ scenario: present(row) });
    }),
    route('delete', '/projects/:projectId/scenarios/:scenarioId', access.engineer, (req, res) => {
      const existing = scenarioOr404(req.projectId!, req.params);
      db.transaction((tx) => {
        tx.delete(scenarios).where(eq(scenarios.id, existing.id)).run();
        recordRequestAudit(tx, req, 'scenario.delete', existing.name, { scenarioId: existing.id });
      });
      res.status(204).end();
    }),
    // Hours per mode while the scenario is being edited: computed on the pool, never stored.
    route('post', '/projects/:projectId/scenarios/preview', access.engineer, async (req, res) => {
      const input = previewInput.parse(req.body);
      const scenario = validScenario(input.scenario);
      const file = findClimateFile(db, req.projectId!, input.climateFileId);
      if (!file) throw new HttpError(404, 'not_found', `Climate file ${input.climateFileId} was not found in this project.`);
      const site = db.select().from(sites).where(eq(sites.id, file.siteId)).get()!;
      const series = loadClimateSeries(db, file.id)!;
      const out = await pool.run(
        'executeRun',
        {
          scenario,
          series,
          options: { elevationM: site.elevationM, utcOffsetMinutes: standardOffsetMinutes(site.timeZone) },
        },
        { lane: 'interactive', signal: closedRequestSignal(res) },
      );
      const loops = out.results.loops;
      res.json({
        hours: out.results.hours,
        modes: MODE_NAMES,
        energy: out.results.energy,
        water: out.results.water,
        // A hybrid hall's preview shows each loop's hours beside the hall's.
        ...(loops ? { loops: { liquid: { hours: loops.liquid.hours }, air: { hours: loops.air.hours } } } : {}),
      });
    }),
  ];
}
