// @ts-nocheck
import { readFileSync } from 'node:fs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { createTestApp, type TestApp } from '../support/test-app';
import { watchedPool } from '../support/watched-pool';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';

const threeDays = readFileSync(new URL('../fixtures/api/three-days.csv', import.meta.url));

/** Ten synthetic years of canonical CSV (not measured weather): an import that keeps a thread busy for a while. */
function tenYears(startYear: number): string {
  const lines = ['timestamp,dry_bulb_c,relative_humidity_pct'];
  const start = Date.UTC(startYear, 0, 1);
  for (let i = 0; i < 87_600; i++) lines.push(`${new Date(start + i * 3_600_000).toISOString().slice(0, 16)}Z,${(10 + (i % 17)).toFixed(1)},${40 + (i % 29)}`);
  return lines.join('\n');
}

let t: TestApp;
let watched: ReturnType<typeof watchedPool>;
let app: ReturnType<typeof createApp>;
let engineer: TestPerson;
let projectId: number;
let siteId: number;

beforeAll(async () => {
  // One thread for long work, one for interactive work: the smallest pool, so the queue behind imports is real.
  t = createTestApp({ uploadLimits: { bytes: 16 * 1024 * 1024, rows: 200_000 } }, { threads: 1, interactiveThreads: 1 });
  watched = watchedPool(t.pool);
  app = createApp({ db: t.db, pool: watched.pool, runQueue: t.runQueue, uploadLimits: { bytes: 16 * 1024 * 1024, rows: 200_000 } });
  engineer = personWithSession(t.db, 'lane.engineer@example.test');
  projectId = projectWithMembers(t.db, 'Busy pool', [[engineer, 'engineer']]);
  const site = await request(app)
    .post(`/api/projects/${projectId}/sites`)
    .set(asPerson(engineer))
    .send({ name: 'Ridge', elevationM: 300, timeZone: 'UTC' })
    .expect(201);
  siteId = site.body.site.id;
});
afterAll(() => t.close());

describe('interactive pool work does not wait behind long imports', () => {
  it('answers an upload preview while three ten-year imports hold the long lane', async () => {
    let importsSettled = 0;
    const imports = [2001, 2011, 2021].map((year) =>
      request(app)
        .post(`/api/projects/${projectId}/sites/${siteId}/climate-files?name=Decade%20${year}`)
        .set(asPerson(engineer))
        .set('content-type', 'text/csv')
        .send(tenYears(year))
        .then((res) => {
          importsSettled++;
          return res;
        }),
    );
    // The preview is sent once all three imports are on the pool (the first computing, two queued behind it).
    await watched.whenCalls((calls) => calls.filter((c) => c.task === 'importClimate').length === 3);
    const preview = await request(app)
      .post(`/api/projects/${projectId}/sites/${siteId}/climate-files/preview`)
      .set(asPerson(engineer))
      .set('content-type', 'text/csv')
      .send(threeDays)
      .expect(200);
    expect(preview.body.ok).toBe(true);
    expect(preview.body.report.counts.hours).toBe(72);
    expect(importsSettled).toBe(0);

    const stored = await Promise.all(imports);
    expect(stored.map((r) => [r.status, r.body.climateFile.hours])).toEqual([
      [201, 87_600],
      [201, 87_600],
      [201, 87_600],
    ]);
  }, 180_000);
});
