// @ts-nocheck
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents } from '../../server/db/schema';
import { storedClimateRows } from '../support/study-setup';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';

/** Synthetic days of hourly weather (demo data, not a station), hour ending 1–24 in local standard time. */
function days(year: number, month: number, dayCount: number, dryBulbC = 12, firstDay = 1): string {
  const lines = ['Year,Month,Day,Hour,Dry bulb (C),RH (%)'];
  for (let d = firstDay; d < firstDay + dayCount; d++) for (let h = 1; h <= 24; h++) lines.push(`${year},${month},${d},${h},${dryBulbC + h / 10},70`);
  return `${lines.join('\n')}\n`;
}

let t: TestApp;
let engineer: TestPerson;
let viewer: TestPerson;
let projectId: number;
let siteId: number;

beforeAll(async () => {
  t = createTestApp({ uploadLimits: { bytes: 80_000, rows: 3_000 } });
  engineer = personWithSession(t.db, 'set.uploader@example.test');
  viewer = personWithSession(t.db, 'set.reader@example.test');
  projectId = projectWithMembers(t.db, 'File sets', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  const site = await request(t.app)
    .post(`/api/projects/${projectId}/sites`)
    .set(asPerson(engineer))
    .send({ name: 'Invented mesa', elevationM: 1100, timeZone: 'UTC-07:00' })
    .expect(201);
  siteId = site.body.site.id;
});
afterAll(() => t.close());

const stored = () => storedClimateRows(t.db);

function send(files: [string, string][], route = '', person = engineer, query = '?timeBasis=site-standard') {
  let req = request(t.app).post(`/api/projects/${projectId}/sites/${siteId}/climate-files${route}${query}`).set(asPerson(person));
  for (const [name, text] of files) req = req.attach('files', Buffer.from(text), name);
  return req;
}

describe('several files uploaded as one climate file', () => {
  it('previews the set on a fixed-offset site: each file listed, joined in time order, nothing stored', async () => {
    const res = await send(
      [
        ['jan-b.csv', days(2021, 1, 2, 12, 4)],
        ['jan-a.csv', days(2021, 1, 2)],
      ],
      '/preview',
    ).expect(200);
    expect(res.body.ok).toBe(true);
    expect(res.body.report.files.map((f: { fileName: string }) => f.fileName)).toEqual(['jan-a.csv', 'jan-b.csv']);
    expect(res.body.report.files[0]).toMatchObject({ hours: 48, firstLine: 2, lastLine: 49, ok: true });
    // hour ending 1 on 1 January local standard time (UTC−07:00) is the hour from 00:00 local = 07:00 UTC
    expect(res.body.preview[0].timestampMs).toBe(Date.UTC(2021, 0, 1, 7));
    // 3 January is in neither file: 24 hours with no data between them, beyond the 6 h filled
    const gap = res.body.report.issues.find((i: { kind: string }) => i.kind === 'files-gap');
    expect(gap).toMatchObject({ file: 'jan-b.csv', line: 2 });
    expect(gap.message).toContain('24 hours between jan-a.csv');
    expect(res.body.report.counts).toMatchObject({ hours: 120, missingHours: 24 });
    expect(stored().files).toBe(0);
  });

  it('stores the whole set or nothing, keeps each original in one archive, and audits it once', async () => {
    const before = stored();
    const res = await send([
      ['2021-01.csv', days(2021, 1, 3)],
      ['2021-01b.csv', days(2021, 1, 3).replace(/^2021,1,(\d),/gm, (_m, d) => `2021,1,${Number(d) + 3},`)],
    ]).expect(201);
    expect(res.body.climateFile).toMatchObject({ name: '2021-01–2021-01b (2 files)', originalFileName: '2021-01–2021-01b (2 files).tar', hours: 144 });
    expect(res.body.report.files).toHaveLength(2);
    expect(stored()).toEqual({ files: before.files + 1, originals: before.originals + 1, series: before.series + 1 });
    const audit = t.db
      .select()
      .from(auditEvents)
      .all()
      .filter((e) => e.action === 'climate.import');
    expect(JSON.parse(audit.at(-1)!.detailJson)).toMatchObject({ files: 2, hours: 144 });
    // the archive opens with the system's tar (POSIX ustar) and holds each file byte for byte
    const original = await request(t.app)
      .get(`/api/projects/${projectId}/climate-files/${res.body.climateFile.id}/original`)
      .set(asPerson(viewer))
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      })
      .expect(200);
    const dir = mkdtempSync(path.join(tmpdir(), 'set-'));
    writeFileSync(path.join(dir, 'set.tar'), original.body as Buffer);
    expect(execFileSync('tar', ['-tf', 'set.tar'], { cwd: dir, encoding: 'utf8' }).trim().split('\n')).toEqual(['2021-01.csv', '2021-01b.csv']);
    expect(execFileSync('tar', ['-xOf', 'set.tar', '2021-01.csv'], { cwd: dir, encoding: 'utf8' })).toBe(days(2021, 1, 3));
  });

  it('refuses a set with a file laid out differently, naming it, and stores nothing', async () => {
    const before = stored();
    const other = days(2021, 3, 2).replace('Dry bulb (C),RH (%)', 'Dry bulb (C),Dew point (C)').replace(/,70$/gm, ',2');
    const res = await send([
      ['2021-02.csv', days(2021, 2, 2)],
      ['2021-03.csv', other],
    ]).expect(422);
    const issue = res.body.error.details.report.issues.find((i: { kind: string }) => i.kind === 'files-layout-differs');
    expect(issue.file).toBe('2021-03.csv');
    expect(issue.message).toContain('2021-03.csv is laid out differently from 2021-02.csv');
    expect(stored()).toEqual(before);
  });

  it('applies the size and row limits to the whole set (413), and refuses non-file parts (400)', async () => {
    // each file alone is under 3,000 lines; the three together are not (the limit is checked before any is read)
    const month = days(2021, 1, 42);
    const res = await send([
      ['a.csv', month],
      ['b.csv', month.replace(/^2021,/gm, '2022,')],
      ['c.csv', month.replace(/^2021,/gm, '2023,')],
    ]);
    expect(res.body.error.message).toContain('3 files have');
    expect(res.status).toBe(413);
    const big = 'x'.repeat(30_000);
    expect(
      (
        await send([
          ['a.csv', big],
          ['b.csv', big],
          ['c.csv', big],
        ]).expect(413)
      ).body.error.message,
    ).toContain('limit');
    await request(t.app)
      .post(`/api/projects/${projectId}/sites/${siteId}/climate-files/preview`)
      .set(asPerson(engineer))
      .field('note', 'not a file')
      .expect(400);
  });

  it('refuses two files of the same name, and lets a viewer read but not upload a set', async () => {
    expect(
      (
        await send(
          [
            ['a.csv', days(2021, 1, 1)],
            ['a.csv', days(2021, 1, 1)],
          ],
          '/preview',
        ).expect(400)
      ).body.error.message,
    ).toContain('same name');
    await send(
      [
        ['a.csv', days(2021, 1, 1)],
        ['b.csv', days(2021, 1, 2)],
      ],
      '',
      viewer,
    ).expect(403);
  });

  it('answers a damaged multipart body with a 400 naming what is wrong, never a 500', async () => {
    const post = (contentType: string, body: string | Buffer) =>
      request(t.app)
        .post(`/api/projects/${projectId}/sites/${siteId}/climate-files/preview`)
        .set(asPerson(engineer))
        .set('content-type', contentType)
        .send(body);
    expect((await post('multipart/form-data', 'x').expect(400)).body.error.message).toContain('boundary');
    for (const body of [
      '',
      'garbage',
      '--b\r\nno header end',
      '--b\r\ncontent-disposition: form-data; name="f"; filename="a.csv"\r\n\r\n1,2,3',
      Buffer.from([0xff, 0, 0x2d, 0x2d, 0x62]),
    ]) {
      const res = await post('multipart/form-data; boundary=b', body);
      expect(res.status, String(body)).toBe(400);
      expect(res.body.error.message).toMatch(/multipart/);
    }
  });
});
