// @ts-nocheck
import { createHash } from 'node:crypto';
import { once } from 'node:events';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { storeLongClimateFile, syntheticLongSeries } from '../support/long-climate-file';
import { rawBody } from '../support/raw-body';
import { watchedPool } from '../support/watched-pool';

// 870,000 hours: the 99-year file of issue 15, which stalled /api/health for 5.7–9.0 s when its downloads were
// built on the main thread. The series is synthetic (tests/support/long-climate-file.ts).
const HOURS = 870_000;

/**
 * SHA-256 of each response as the main-thread code wrote it (recorded from that code on this same synthetic file
 * before the work moved to the pool): moving it must not change a byte.
 */
const before = {
  'hourly.csv': '7736d0f447c7480c268f05caae5d40439c018a846299e79b7296430ba98d7dd9',
  hours: '0f65f9b139c82c734e174359fa003338c8fa8adec03bbbe7cf75a4dddd255bb5',
  'hours?year=1950': '2dfa2e322569298c08252026f8137405dd1034c5ff10fae4d1b0dc19486f568e',
  'hours?year=2024': '798dc299ee3ed38b196b8d62eca970cf3f897ec0fb14ed0913321c8ed5b3d711',
};

let t: TestApp;
let watched: ReturnType<typeof watchedPool>;
let app: ReturnType<typeof createApp>;
let viewer: TestPerson;
let base: string;

beforeAll(async () => {
  t = createTestApp();
  watched = watchedPool(t.pool);
  app = createApp({ db: t.db, pool: watched.pool, runQueue: t.runQueue });
  viewer = personWithSession(t.db, 'reader.long@example.test');
  const engineer = personWithSession(t.db, 'eng.long@example.test');
  const projectId = projectWithMembers(t.db, 'Century record', [
    [viewer, 'viewer'],
    [engineer, 'engineer'],
  ]);
  const site = await request(app)
    .post(`/api/projects/${projectId}/sites`)
    .set(asPerson(engineer))
    .send({ name: 'High plain', elevationM: 120, timeZone: 'America/Denver' })
    .expect(201);
  const fileId = storeLongClimateFile(t.db, projectId, site.body.site.id, syntheticLongSeries(HOURS));
  base = `/api/projects/${projectId}/climate-files/${fileId}`;
});
afterAll(() => t.close());

const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

describe("a long climate file's hours and hourly CSV are built off the main thread", () => {
  it.each(['hourly.csv', 'hours'] as const)(
    'answers /api/health while %s of a 99-year file is being built, then sends the same bytes as before',
    async (path) => {
      watched.hold('formatClimateSeries');
      let settled = false;
      const download = request(app)
        .get(`${base}/${path}`)
        .set(asPerson(viewer))
        .buffer(true)
        .parse(rawBody)
        .then((res) => {
          settled = true;
          return res;
        });
      // Wait until the work is on the pool (or, in the main-thread code, until the download has already finished).
      const call = await Promise.race([watched.started('formatClimateSeries'), download]);
      expect(settled).toBe(false);
      await request(app).get('/api/health').expect(200);
      expect(settled).toBe(false);
      expect((call as { options: { lane?: string } }).options.lane).toBe('interactive');
      watched.release('formatClimateSeries');

      const res = await download;
      expect(res.status).toBe(200);
      expect(sha256(res.body)).toBe(before[path]);
      if (path === 'hourly.csv') {
        expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
        expect(res.headers['content-disposition']).toBe('attachment; filename="Synthetic long record-hourly.csv"');
        // Hour 1 by hand from the generator: 11 + 13·sin(2π/8760) + 4.5·sin(2π/24) + 919/1234 = 12.919 °C;
        // 65 − 20·sin(2π/24) + 29/7 = 63.966 %; 101,300 + 800·sin(2π/131) + 1 = 101,339.35 Pa = 101.339 kPa.
        expect(res.body.toString('utf8', 0, 160).split('\n').slice(0, 3)).toEqual([
          'timestamp,dry_bulb_c,relative_humidity_pct,pressure_kpa,flag',
          '1926-01-01T00:00:00Z,11,65,101.3,measured',
          '1926-01-01T01:00:00Z,12.919,63.966,101.339,measured',
        ]);
        expect(res.body.toString().trimEnd().split('\n')).toHaveLength(HOURS + 1);
      } else {
        expect(res.headers['content-type']).toBe('application/json; charset=utf-8');
      }
    },
    180_000,
  );

  it.each(['hours?year=1950', 'hours?year=2024'] as const)(
    'sends %s (a year on the site’s standard time) byte for byte as before',
    async (path) => {
      const res = await request(app).get(`${base}/${path}`).set(asPerson(viewer)).buffer(true).parse(rawBody).expect(200);
      expect(sha256(res.body)).toBe(before[path]);
      const hours = JSON.parse(res.body.toString()) as { timestampsMs: number[] };
      // Denver's standard time is UTC−07:00, so the year starts at 07:00Z on 1 January.
      const year = Number(path.slice(-4));
      expect(hours.timestampsMs[0]).toBe(Date.UTC(year, 0, 1, 7));
      expect(hours.timestampsMs).toHaveLength(year % 4 === 0 ? 8784 : 8760);
    },
    60_000,
  );

  it('stops building when the client goes away', async () => {
    const server = app.listen(0, '127.0.0.1');
    await once(server, 'listening');
    try {
      const { port } = server.address() as AddressInfo;
      const started = watched.started('formatClimateSeries');
      const req = http.get({ host: '127.0.0.1', port, path: `${base}/hourly.csv`, headers: asPerson(viewer) });
      req.on('error', () => {});
      const call = await started;
      req.destroy();
      const signal = call.options.signal!;
      if (!signal.aborted) await once(signal, 'abort');
      expect(signal.aborted).toBe(true);
      await call.computed;
    } finally {
      server.close();
    }
  }, 60_000);
});
