// @ts-nocheck
import { readFileSync } from 'node:fs';
import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ENGINE_VERSION, parseScenario } from '../../shared/scenario';
import { auditEvents, climateFiles, runs, scenarios, sweeps } from '../../server/db/schema';
import { requeueOldDemoRuns } from '../../server/demo/rerun';
import { seedDemo } from '../../server/demo/seed';
import { prepareStoredData } from '../../server/start-up';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { createTestApp, type TestApp } from '../support/test-app';

/** The synthetic demo scenario as engine 1.0.0 saved it (fan heat 1 K over a 12 K IT rise, blowdown ratio 0.33). */
const OLD_SCENARIO_JSON = JSON.stringify({
  name: 'Direct outdoor air, A1 allowable, 25 \u00b0C supply (synthetic demo)',
  elevationM: 120,
  envelope: {
    presetId: 'ashrae-2021-a1',
    dryBulbMinC: 15,
    dryBulbMaxC: 32,
    dewPointMinC: -12,
    dewPointMaxC: 17,
    rhMinPct: 8,
    rhMaxPct: 80,
    altitudeDerating: { aboveElevationM: 900, metresPerKelvin: 300 },
  },
  system: { kind: 'direct-air', supplyAirC: 25, itDeltaTK: 12, fanHeatK: 1, evaporativeEffectiveness: 0.85 },
  energy: { itLoadKw: 1000, mechanicalCop: 4.5, copSlopePerK: -0.08, copReferenceC: 35, fanPowerFraction: 0.04, pumpPowerFraction: 0.005, blowdownRatio: 0.33 },
});
/** A scenario in today's inputs: the synthetic demo file as shipped. */
const CURRENT_SCENARIO_JSON = readFileSync('sample-weather/scenarios/direct-air-a1.json', 'utf8');

let t: TestApp;
let viewer: TestPerson;
let engineer: TestPerson;
let projectId: number;
let scenarioId: number;
let runId: number;
let sweepId: number;

beforeAll(() => {
  t = createTestApp();
  viewer = personWithSession(t.db, 'viewer@example.test');
  engineer = personWithSession(t.db, 'engineer@example.test');
  projectId = projectWithMembers(t.db, 'Migration study', [
    [viewer, 'viewer'],
    [engineer, 'engineer'],
  ]);
  // Rows as an engine-1.0.0 installation left them: a saved scenario, a run of it, a sweep based on it.
  scenarioId = t.db.insert(scenarios).values({ projectId, name: 'Old direct air', scenarioJson: OLD_SCENARIO_JSON }).returning().get().id;
  runId = t.db
    .insert(runs)
    .values({
      projectId,
      scenarioId,
      scenarioJson: OLD_SCENARIO_JSON,
      climateJson: '{}',
      engineVersion: 'scenario-engine 1.0.0',
      status: 'done',
      resultsJson: '{}',
    })
    .returning()
    .get().id;
  const spec = { baseScenario: JSON.parse(OLD_SCENARIO_JSON), axes: [], climate: { name: 'x', siteName: 'y' } };
  sweepId = t.db
    .insert(sweeps)
    .values({ projectId, name: 'Old sweep', baseScenarioId: scenarioId, specJson: JSON.stringify(spec) })
    .returning()
    .get().id;
});
afterAll(() => t.close());

const getScenario = (person: TestPerson) => request(t.app).get(`/api/projects/${projectId}/scenarios/${scenarioId}`).set(asPerson(person));
const dismiss = (person: TestPerson) =>
  request(t.app).post(`/api/projects/${projectId}/scenarios/${scenarioId}/migration-notice/dismiss`).set(asPerson(person));
const auditOf = (action: string) =>
  t.db
    .select()
    .from(auditEvents)
    .where(and(eq(auditEvents.action, action), eq(auditEvents.projectId, projectId)))
    .all();

describe('saved scenarios at start-up', () => {
  it('the old scenario is refused by the current schema before the migration', () => {
    const parsed = parseScenario(JSON.parse(OLD_SCENARIO_JSON));
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.errors.join(' ')).toContain('energy.fanPowerFraction');
  });

  it('comes back migrated, with the changes recorded, the run untouched and the sweep base migrated', async () => {
    const outcome = prepareStoredData(t.db, { demo: true });
    expect(outcome).toMatchObject({ seeded: false, migratedScenarios: 1, migratedSweeps: 1, skipped: [], requeuedDemoRuns: 0 });

    const res = await getScenario(viewer);
    expect(res.status).toBe(200);
    const { scenario, migration } = res.body.scenario;
    expect(parseScenario(scenario).ok).toBe(true);
    expect(scenario.system.fanHeatK).toBeUndefined();
    // Fan heat ΔT_fan = P_fan / (ṁ·cp) with the hall flow ṁ = P_IT / (cp·ΔT_IT), so P_fan / P_IT = ΔT_fan / ΔT_IT = 1 K / 12 K
    // (steady-flow sensible-heat balance, ASHRAE Handbook—Fundamentals 2017 ch. 1); stored to 4 decimals.
    expect(scenario.energy.fanPowerFraction).toBeCloseTo(1 / 12, 4);
    // Dissolved-solids balance: blowdown / evaporation = 1 / (C − 1), so C = 1 + 1/0.33 = 4.03 (common practice relation).
    expect(scenario.energy.cyclesOfConcentration).toBeCloseTo(1 + 1 / 0.33, 2);
    expect(migration.dismissedAt).toBeNull();
    const paths = migration.changes.map((c: { path: string }) => c.path);
    expect(paths).toEqual(
      expect.arrayContaining(['system.fanHeatK', 'energy.fanPowerFraction', 'energy.copSlopePerK', 'energy.blowdownRatio', 'energy.cyclesOfConcentration']),
    );
    expect(migration.changes.find((c: { path: string }) => c.path === 'system.fanHeatK')).toMatchObject({ before: 1 });
    expect(migration.changes.find((c: { path: string }) => c.path === 'energy.fanPowerFraction')).toMatchObject({ before: 0.04, after: 0.0833 });
    for (const c of migration.changes) expect(c.note.length).toBeGreaterThan(10);

    // The run keeps the inputs it was made with, byte for byte.
    expect(t.db.select().from(runs).where(eq(runs.id, runId)).get()!.scenarioJson).toBe(OLD_SCENARIO_JSON);
    const spec = JSON.parse(t.db.select().from(sweeps).where(eq(sweeps.id, sweepId)).get()!.specJson);
    expect(spec.baseScenario.system.fanHeatK).toBeUndefined();
    expect(spec.baseScenarioMigrations[0].changes.length).toBe(migration.changes.length);
    // The migration is audited as a change of the scenario, made by the system.
    const lines = auditOf('scenario.update');
    expect(lines).toHaveLength(1);
    expect(lines[0].actorId).toBeNull();
    expect(JSON.parse(lines[0].detailJson).migrated).toHaveLength(migration.changes.length);
  });

  it('a second start-up changes nothing more', async () => {
    expect(prepareStoredData(t.db, { demo: true })).toMatchObject({ migratedScenarios: 0, migratedSweeps: 0 });
    expect((await getScenario(viewer)).body.scenario.migration.dismissedAt).toBeNull();
  });

  it('shows the notice until an engineer or owner dismisses it, once; a viewer may not', async () => {
    const refused = await dismiss(viewer);
    expect(refused.status).toBe(403);
    expect((await getScenario(viewer)).body.scenario.migration.dismissedAt).toBeNull();

    const done = await dismiss(engineer);
    expect(done.status).toBe(200);
    expect(done.body.scenario.migration).toMatchObject({ dismissedBy: engineer.id });
    expect(typeof done.body.scenario.migration.dismissedAt).toBe('string');
    // The record of what changed is kept after the notice is gone.
    expect(done.body.scenario.migration.changes.length).toBeGreaterThan(3);
    const seen = await getScenario(viewer);
    expect(seen.body.scenario.migration.dismissedAt).toBe(done.body.scenario.migration.dismissedAt);

    const dismissals = () => auditOf('scenario.update').filter((line) => JSON.parse(line.detailJson).migrationNoticeDismissed);
    expect(dismissals()).toHaveLength(1);
    expect(dismissals()[0].actorId).toBe(engineer.id);
    // Dismissing again answers with the scenario as it is and records nothing new.
    expect((await dismiss(engineer)).status).toBe(200);
    expect(dismissals()).toHaveLength(1);
  });

  it('refuses to dismiss a notice a scenario never had', async () => {
    const other = t.db.insert(scenarios).values({ projectId, name: 'New', scenarioJson: CURRENT_SCENARIO_JSON }).returning().get();
    const res = await request(t.app).post(`/api/projects/${projectId}/scenarios/${other.id}/migration-notice/dismiss`).set(asPerson(engineer));
    expect(res.status).toBe(409);
    expect(res.body.error.message).toContain('never migrated');
  });
});

describe('demo runs made by an older engine', () => {
  let demo: TestApp;
  beforeAll(() => {
    demo = createTestApp();
  });
  afterAll(() => demo.close());

  it('are queued again once by the current engine; the old runs and the sweep points stay as they were', () => {
    expect(seedDemo(demo.db)).toEqual({ seeded: true });
    // As an engine-1.0.0 installation left it: every run finished by the old engine.
    demo.db.update(runs).set({ engineVersion: 'scenario-engine 1.0.0', status: 'done', resultsJson: '{}' }).run();
    const before = demo.db.select().from(runs).all();
    // The demo's plain runs: 3 scenarios on 4 sites, and the hybrid hall on its warm site.
    expect(requeueOldDemoRuns(demo.db)).toBe(13);
    const after = demo.db.select().from(runs).all();
    const added = after.filter((r) => !before.some((b) => b.id === r.id));
    expect(added).toHaveLength(13);
    for (const r of added) expect(r).toMatchObject({ engineVersion: ENGINE_VERSION, status: 'queued', sweepId: null });
    // Each pair of scenario and climate file that had a plain run gets one new run.
    expect(new Set(added.map((r) => `${r.scenarioId}:${r.climateFileId}`)).size).toBe(13);
    for (const b of before) expect(after.find((r) => r.id === b.id)).toEqual(b);
    // A restart adds nothing more.
    expect(requeueOldDemoRuns(demo.db)).toBe(0);
    expect(demo.db.select().from(climateFiles).all().length).toBeGreaterThan(0);
  });
});
