// @ts-nocheck
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

describe('security headers on every response', () => {
  it('a policy that allows no inline or foreign script and no framing, nosniff and a same-origin referrer', async () => {
    const res = await request(t.app).get('/api/health').expect(200);
    const csp = res.headers['content-security-policy'];
    expect(csp).toContain("script-src 'self'");
    expect(csp).toContain("script-src-attr 'none'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("default-src 'self'");
    expect(csp).not.toMatch(/script-src[^;]*unsafe/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['referrer-policy']).toBe('same-origin');
  });

  it('HSTS only on requests that arrived over https', async () => {
    expect((await request(t.app).get('/api/health')).headers['strict-transport-security']).toBeUndefined();
    const secure = await request(t.app).get('/api/health').set('x-forwarded-proto', 'https');
    expect(secure.headers['strict-transport-security']).toBe('max-age=15552000; includeSubDomains');
  });

  it('errors carry them too', async () => {
    const res = await request(t.app).get('/api/nowhere').expect(404);
    expect(res.headers['content-security-policy']).toContain("frame-ancestors 'none'");
  });
});

describe('share links are rate-limited per address', () => {
  it('answers 429 in the one error shape past the limit, for the report and its downloads together', async () => {
    const limited = createTestApp({ sharedLinkRateLimit: { limit: 3, windowMs: 60_000 } });
    try {
      for (let i = 0; i < 2; i++)
        await request(limited.app)
          .get('/api/shared/not-a-token')
          .expect((res) => expect(res.status).not.toBe(429));
      await request(limited.app)
        .get('/api/shared/not-a-token/downloads/summary.csv')
        .expect((res) => expect(res.status).not.toBe(429));
      const res = await request(limited.app).get('/api/shared/not-a-token').expect(429);
      expect(res.body.error).toEqual({ code: 'too_many_requests', message: 'Too many report-link requests from this address; wait a minute and try again.' });
    } finally {
      await limited.close();
    }
  });
});
