// @ts-nocheck
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

  it('reads the release and the engine that new runs are made by, each under its own name', async () => {
    const res = await request(t.app).get('/api/health').expect(200);
    expect(res.body.version).toBe('0.1.0');
    expect(res.body.engineVersion).toBe('scenario-engine 2.0.0');
  });

  it('is told to sign in before reading their settings, in the one error shape', async () => {
    const res = await request(t.app).get('/api/me').expect(401);
    expect(res.body).toEqual({ error: { code: 'unauthenticated', message: 'Sign in to use this.' } });
  });

  it('gets an empty project list signed out, not a 401 that every signed-out page would log (issue 17)', async () => {
    const res = await request(t.app).get('/api/projects').expect(200);
    expect(res.body).toEqual({ projects: [], signedIn: false });
  });

  it('gets a JSON 404 for an API route that does not exist', async () => {
    const res = await request(t.app).get('/api/nowhere').expect(404);
    expect(res.body.error.code).toBe('not_found');
    expect(res.body.error.message).toContain('/api/nowhere');
  });

  it('gets a 400 naming the problem for malformed JSON, without a stack trace', async () => {
    const res = await request(t.app).post('/api/projects').set('content-type', 'application/json').send('{bad').expect(400);
    expect(res.body.error.message).toBeTypeOf('string');
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts:\d+/);
  });
});

describe('routes that are not there', () => {
  it('has no public column summary: nothing in the client used it, and anyone signed out could stall the server with it', async () => {
    await request(t.app)
      .post('/api/series/summary')
      .send({ values: [1, 2, 3] })
      .expect(404);
  });
});

describe('hostile or unlucky requests', () => {
  it('answers 400 naming the limit for a body nested thousands deep (a 9 KB request), not 500', async () => {
    const deep = `{"name":"x","envelope":${'['.repeat(4500)}${']'.repeat(4500)}}`;
    const res = await request(t.app).post('/api/projects').set('content-type', 'application/json').send(deep).expect(400);
    expect(res.body.error).toEqual({ code: 'too_deep', message: 'The request body is nested more than 32 levels deep; no Tramontane request needs that.' });
  });

  it('does not count brackets inside strings', async () => {
    const text = JSON.stringify({ name: '['.repeat(100) });
    // Signed out, so the route answers 401: the body got past the depth check.
    await request(t.app).post('/api/projects').set('content-type', 'application/json').send(text).expect(401);
  });
});
