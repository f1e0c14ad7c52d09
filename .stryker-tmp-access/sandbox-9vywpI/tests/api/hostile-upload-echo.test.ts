// @ts-nocheck
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { rawBody } from '../support/raw-body';

let t: TestApp;
let engineer: TestPerson;
let viewer: TestPerson;
let projectId: number;
let siteId: number;

beforeAll(async () => {
  t = createTestApp({ uploadLimits: { bytes: 64 * 1024 * 1024, rows: 1_200_000 } });
  engineer = personWithSession(t.db, 'echo.engineer@example.test');
  viewer = personWithSession(t.db, 'echo.viewer@example.test');
  projectId = projectWithMembers(t.db, 'Hostile uploads', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  const site = await request(t.app)
    .post(`/api/projects/${projectId}/sites`)
    .set(asPerson(engineer))
    .send({ name: 'Fen', elevationM: 5, timeZone: 'UTC' })
    .expect(201);
  siteId = site.body.site.id;
});
afterAll(() => t.close());

const send = (path: '/preview' | '', body: string) =>
  request(t.app).post(`/api/projects/${projectId}/sites/${siteId}/climate-files${path}`).set(asPerson(engineer)).set('content-type', 'text/csv').send(body);

/** `hours` synthetic hourly rows from 2020-01-01 (not measured weather); `cell(i)` gives row i's dry-bulb text. */
function rows(hours: number, cell: (i: number) => string): string[] {
  const start = Date.UTC(2020, 0, 1);
  return Array.from({ length: hours }, (_, i) => `${new Date(start + i * 3_600_000).toISOString().slice(0, 16)}Z,${cell(i)},55`);
}

describe('what the server echoes of a hostile upload is bounded', () => {
  it('answers a 30 MB single-line upload with a small preview and a small 422, the line cut and marked', async () => {
    const line = 'a'.repeat(30_000_000);
    const preview = await send('/preview', line).expect(200);
    // Before: the line came back twice (first lines and mapping), a 63 MB response.
    expect(preview.text.length).toBeLessThan(20_000);
    expect(preview.body.ok).toBe(false);
    expect(preview.body.firstLines).toEqual([`${'a'.repeat(1_000)}… [cut: 30,000,000 characters]`]);
    expect(preview.body.report.issues[0]).toMatchObject({ kind: 'line-too-long', line: 1 });

    const refused = await send('', line).expect(422);
    expect(refused.text.length).toBeLessThan(20_000);
    expect(refused.body.error.details.report.ok).toBe(false);
  }, 120_000);

  it('cuts a 9,000-character header cell to 200 characters, marked, wherever it is echoed', async () => {
    const header = `timestamp,dry_bulb_c,relative_humidity_pct,${'h'.repeat(9_000)}`;
    const body = [header, ...rows(48, (i) => `${(i % 10) + 5}.5`).map((r) => `${r},x`)].join('\n');
    const res = await send('/preview', body).expect(200);
    const cut = `${'h'.repeat(200)}… [cut: 9,000 characters]`;
    expect(res.body.ok).toBe(true);
    expect(res.body.mapping.headers).toEqual(['timestamp', 'dry_bulb_c', 'relative_humidity_pct', cut]);
    const unused = res.body.report.issues.find((i: { kind: string }) => i.kind === 'unrecognised-column');
    expect(unused).toMatchObject({ column: cut, message: `Column "${cut}" is not used.` });
    expect(res.body.firstLines[0]).toBe(`${header.slice(0, 1_000)}… [cut: 9,043 characters]`);
    expect(res.text.length).toBeLessThan(30_000);
  });

  it('lists the first 200 problems of a refused upload, counts the rest, and gives every one as a CSV download', async () => {
    // 1,000 hours, the dry-bulb of every third unreadable: 334 unreadable cells (33 %, over the 10 % that refuses a file).
    const bad = (i: number) => i % 3 === 0;
    const body = ['timestamp,dry_bulb_c,relative_humidity_pct', ...rows(1_000, (i) => (bad(i) ? `warm${i}` : '12.5'))].join('\n');
    const res = await send('', body).expect(422);
    const report = res.body.error.details.report;
    const issues = report.issues as Array<{ kind: string; severity: string; line: number; value?: string }>;
    const listedWarnings = issues.filter((i) => i.severity !== 'error');
    expect(listedWarnings).toHaveLength(200);
    expect(listedWarnings[0]).toMatchObject({ kind: 'unparsable-value', line: 2, value: 'warm0' });
    expect(issues.filter((i) => i.severity === 'error').map((i) => i.kind)).toContain('too-many-rejected');
    const total = issues.length + report.counts.issuesNotListed;
    expect(report.fullIssueList).toEqual({ path: expect.stringMatching(/^\/api\/projects\/\d+\/climate-issue-lists\/\d+$/), issues: total });

    const csv = await request(t.app).get(report.fullIssueList.path).set(asPerson(viewer)).buffer(true).parse(rawBody).expect(200);
    expect(csv.headers['content-type']).toBe('text/csv; charset=utf-8');
    const lines = csv.body.toString().trimEnd().split('\n');
    expect(lines[0]).toBe('severity,kind,line,column,value,message');
    expect(lines).toHaveLength(total + 1);
    const unreadable = lines.filter((l: string) => l.startsWith('warning,unparsable-value,'));
    expect(unreadable).toHaveLength(334);
    // row 999 is on line 1,001 (the header is line 1)
    expect(unreadable[333]).toBe(
      'warning,unparsable-value,1001,dry_bulb_c,warm999,"""warm999"" in column ""dry_bulb_c"" is not a number; the value is treated as missing."',
    );
  });
});
