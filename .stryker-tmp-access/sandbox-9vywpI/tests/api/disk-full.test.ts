// @ts-nocheck
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, type TestPerson } from '../support/people';

let t: TestApp;
let engineer: TestPerson;
const logged: unknown[] = [];

beforeAll(() => {
  t = createTestApp({ logError: (error) => logged.push(error) });
  engineer = personWithSession(t.db, 'lene.strand@example.test');
});
afterAll(() => t.close());

describe('a full disk', () => {
  it('answers 507 saying nothing was stored, logs it, and leaves no half-made project', async () => {
    const sqlite = t.db.$client;
    // SQLite's own limit on the file's pages: the first write that needs a page more fails with SQLITE_FULL,
    // as a full disk does.
    sqlite.pragma(`max_page_count = ${sqlite.pragma('page_count', { simple: true })}`);
    let stored = 0;
    let refused: request.Response | undefined;
    for (let i = 0; i < 40 && !refused; i++) {
      const res = await request(t.app)
        .post('/api/projects')
        .set(asPerson(engineer))
        .send({ name: `Overflow ${i}`, description: 'x'.repeat(2000) });
      if (res.status === 201) stored++;
      else refused = res;
    }
    expect(refused?.status).toBe(507);
    expect(refused?.body.error).toEqual({ code: 'disk_full', message: "The server's disk is full; nothing was stored. Tell the administrator." });
    expect(logged.some((e) => (e as { code?: string }).code === 'SQLITE_FULL')).toBe(true);
    sqlite.pragma('max_page_count = 1073741823');
    const list = await request(t.app).get('/api/projects').set(asPerson(engineer)).expect(200);
    expect(list.body.projects).toHaveLength(stored);
  });
});
