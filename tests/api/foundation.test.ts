import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

describe('a visitor checking the server', () => {
  it('sees it healthy with its database answering', async () => {
    const res = await request(t.app).get('/api/health').expect(200);
    expect(res.body.status).toBe('ok');
    expect(res.body.database.reachable).toBe(true);
    expect(res.body.database.latencyMs).toBeGreaterThanOrEqual(0);
  });

  it('is told to sign in before listing projects, in the one error shape', async () => {
    const res = await request(t.app).get('/api/projects').expect(401);
    expect(res.body).toEqual({ error: { code: 'unauthenticated', message: 'Sign in to use this.' } });
  });

  it('gets a JSON 404 for an API route that does not exist', async () => {
    const res = await request(t.app).get('/api/nowhere').expect(404);
    expect(res.body.error.code).toBe('not_found');
    expect(res.body.error.message).toContain('/api/nowhere');
  });

  it('gets a 400 naming the problem for malformed JSON, without a stack trace', async () => {
    const res = await request(t.app).post('/api/series/summary').set('content-type', 'application/json').send('{bad').expect(400);
    expect(res.body.error.message).toBeTypeOf('string');
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts:\d+/);
  });
});

describe('summarising a column on the worker pool', () => {
  it('returns count, missing, min, max and mean computed on a pool thread', async () => {
    const res = await request(t.app)
      .post('/api/series/summary')
      .send({ values: [12.5, -3, null, 20.5, 6] })
      .expect(200);
    // Hand computation: four numbers, one missing; mean = (12.5 - 3 + 20.5 + 6) / 4 = 9.
    expect(res.body.summary).toEqual({ count: 4, missing: 1, min: -3, max: 20.5, mean: 9 });
  });

  it('refuses an empty column with a message naming the field', async () => {
    const res = await request(t.app).post('/api/series/summary').send({ values: [] }).expect(400);
    expect(res.body.error.code).toBe('invalid_request');
    expect(res.body.error.message).toContain('values');
  });

  it('refuses text where numbers belong', async () => {
    const res = await request(t.app).post('/api/series/summary').send({ values: [1, 'warm'] }).expect(400);
    expect(res.body.error.details[0].path).toBe('values.1');
  });
});
