import { readFileSync } from 'node:fs';
import request from 'supertest';
import { count } from 'drizzle-orm';
import type { Db } from '../../server/db/client';
import { climateFiles, climateOriginals, climateSeries } from '../../server/db/schema';
import type { TestApp } from './test-app';
import { asPerson, type TestPerson } from './people';

/** Synthetic test weather: 72 hours of July at an invented site, 6.3…22.0 °C (tests/fixtures/api/three-days.csv). */
export const threeDaysCsv = readFileSync(new URL('../fixtures/api/three-days.csv', import.meta.url), 'utf8');
/** The sample direct-air scenario the command-line guide (docs/guide/command-line.md) uses (sample-weather/scenarios/direct-air-a1.json). */
export const directAirSample = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));

export interface StudySetup {
  siteId: number;
  climateFileId: number;
  scenarioId: number;
}

/**
 * What most API tests start from, made through the API as `person` (an engineer or owner of the project): a site,
 * the three-day weather uploaded to it, and a saved scenario (the sample direct-air one unless another is given).
 */
export async function siteFileAndScenario(
  t: TestApp,
  projectId: number,
  person: TestPerson,
  options: { siteName?: string; elevationM?: number; scenario?: unknown } = {},
): Promise<StudySetup> {
  const as = asPerson(person);
  const site = await request(t.app)
    .post(`/api/projects/${projectId}/sites`)
    .set(as)
    .send({ name: options.siteName ?? 'Brackenfold', elevationM: options.elevationM ?? 120 })
    .expect(201);
  const file = await request(t.app)
    .post(`/api/projects/${projectId}/sites/${site.body.site.id}/climate-files?fileName=three-days.csv`)
    .set(as)
    .set('content-type', 'text/csv')
    .send(threeDaysCsv)
    .expect(201);
  const scenario = await request(t.app)
    .post(`/api/projects/${projectId}/scenarios`)
    .set(as)
    .send({ scenario: options.scenario ?? directAirSample })
    .expect(201);
  return { siteId: site.body.site.id, climateFileId: file.body.climateFile.id, scenarioId: scenario.body.scenario.id };
}

/** Climate files, originals and series rows stored: an upload stores all three or none. */
export function storedClimateRows(db: Db): { files: number; originals: number; series: number } {
  const rows = (table: typeof climateFiles | typeof climateOriginals | typeof climateSeries) => db.select({ n: count() }).from(table).get()!.n;
  return { files: rows(climateFiles), originals: rows(climateOriginals), series: rows(climateSeries) };
}

/**
 * The stored length of a project's run hour columns, as SQLite reads it (not as the storage code sums it): what the
 * storage figures must show for its finished runs.
 */
export function storedRunHourBytes(db: Db, projectId: number): number {
  const query =
    'select sum(length(modes) + length(mechanical_fraction) + length(humidified)) as n from run_hours h join runs r on r.id = h.run_id where r.project_id = ?';
  return Number((db.$client.prepare(query).get(projectId) as { n: number | null }).n ?? 0);
}
