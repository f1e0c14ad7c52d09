// @ts-nocheck
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sessions, signInAttempts, users } from '../../server/db/schema';
import { sessionCookieName } from '../../server/auth/session';
import { startFakeProvider } from '../../server/fake-provider';
import { OidcClient } from '../../server/auth/oidc';
import { createTestApp } from '../support/test-app';
import { seedDemo } from '../../server/demo/seed';
import { signInThroughProvider, startSignInStack, type SignInStack } from '../support/sign-in';

const hour = 3_600_000;
let now = Date.parse('2026-03-02T09:00:00Z');
const clock = () => new Date(now);

let t: SignInStack;
beforeAll(async () => {
  t = await startSignInStack({
    overrides: { clock, sessionPolicy: { idleMs: 2 * hour, absoluteMs: 10 * hour }, signInRateLimit: { limit: 100, windowMs: 60_000 } },
  });
});
afterAll(() => t.close());

const agent = () => request.agent(t.app).set('x-tramontane-request', '1');
const problemOf = (res: request.Response) => new URL(res.headers.location, 'http://x').searchParams.get('problem');
const sessionCookie = (res: request.Response) => ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith(`${sessionCookieName}=`));

describe('the first person to sign in on a new installation', () => {
  it('goes through the provider page, comes back signed in, and is made admin', async () => {
    const a = agent();
    const { callback } = await signInThroughProvider(t, a, { name: 'Ada Brennholt', email: 'Ada.Brennholt@firm.example' }, '/settings');
    expect(callback.status).toBe(303);
    expect(callback.headers.location).toBe('/settings');
    const cookie = sessionCookie(callback)!;
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).not.toMatch(/Secure/);
    const session = await a.get('/api/auth/session').expect(200);
    expect(session.body).toMatchObject({ signedIn: true, user: { name: 'Ada Brennholt', email: 'ada.brennholt@firm.example', isAdmin: true } });
  });

  it('stores only the hash of the session token', async () => {
    const a = agent();
    const { callback } = await signInThroughProvider(t, a, { name: 'Ada Brennholt', email: 'ada.brennholt@firm.example' });
    const token = decodeURIComponent(sessionCookie(callback)!.split(';')[0].split('=')[1]);
    const stored = t.db.select().from(sessions).all();
    expect(stored.length).toBeGreaterThan(0);
    expect(stored.some((s) => s.tokenHash === token)).toBe(false);
    expect(JSON.stringify(t.db.$client.prepare('select * from sessions').all())).not.toContain(token);
  });

  it('the second person is not an admin', async () => {
    const a = agent();
    await signInThroughProvider(t, a, { name: 'Bo Lindqvist', email: 'bo@firm.example' });
    const me = await a.get('/api/me').expect(200);
    expect(me.body.user.isAdmin).toBe(false);
  });

  it('gets Secure cookies when the app is reached over https through a local proxy', async () => {
    const start = await request(t.app).get('/api/auth/sign-in').set('x-forwarded-proto', 'https').expect(302);
    const stateCookie = ([] as string[]).concat(start.headers['set-cookie']).find((c) => c.startsWith('tramontane_sign_in='))!;
    expect(stateCookie).toMatch(/Secure/);
    const form = new URLSearchParams(new URL(start.headers.location).searchParams);
    form.set('subject', 'demo-viewer');
    const picked = await fetch(`${t.provider.issuer}/authorize`, { method: 'POST', body: form, redirect: 'manual' });
    const minted = await fetch(new URL(picked.headers.get('location')!, t.provider.issuer), { redirect: 'manual' });
    const back = new URL(minted.headers.get('location')!);
    const callback = await request(t.app)
      .get(`${back.pathname}${back.search}`)
      .set('x-forwarded-proto', 'https')
      .set('cookie', stateCookie.split(';')[0])
      .expect(303);
    expect(sessionCookie(callback)).toMatch(/Secure/);
  });
});

describe('signing in again in the same browser', () => {
  it('replaces the old session instead of keeping both', async () => {
    const a = agent();
    await signInThroughProvider(t, a, { name: 'Gil Marsh', email: 'gil@firm.example' });
    await signInThroughProvider(t, a, { name: 'Gil Marsh', email: 'gil@firm.example' });
    const gil = t.db.select().from(users).where(eq(users.email, 'gil@firm.example')).get()!;
    expect(t.db.select().from(sessions).where(eq(sessions.userId, gil.id)).all()).toHaveLength(1);
  });
});

describe('a provider whose discovery document names another issuer', () => {
  it('is refused before anyone is sent to it', async () => {
    const logged: unknown[] = [];
    const s = await startSignInStack({ overrides: { logError: (e) => logged.push(e) } });
    try {
      const wrong = new OidcClient({
        issuer: s.provider.issuer.replace('127.0.0.1', 'localhost'),
        clientId: 'tramontane-test',
        clientSecret: null,
        redirectUri: s.redirectUri,
      });
      const app = createTestApp({ oidc: wrong, logError: (e) => logged.push(e) });
      try {
        const res = await request(app.app).get('/api/auth/sign-in').expect(503);
        expect(res.body.error.code).toBe('provider_unavailable');
        expect(String(logged[0])).toContain('names the issuer');
      } finally {
        await app.close();
      }
    } finally {
      await s.close();
    }
  });
});

describe('the callback refuses what does not belong to a sign-in it started', () => {
  it('a state that differs from the one this browser was given', async () => {
    const a = agent();
    await a.get('/api/auth/sign-in').expect(302);
    const res = await a.get('/api/auth/callback?code=abc&state=someone-elses-state').expect(303);
    expect(problemOf(res)).toBe('state_mismatch');
    expect(sessionCookie(res)).toBeUndefined();
    // The failed attempt's state cookie is cleared on its own path.
    const cleared = ([] as string[]).concat(res.headers['set-cookie']).find((c) => c.startsWith('tramontane_sign_in='));
    expect(cleared).toMatch(/Path=\/api\/auth/);
    expect(cleared).toMatch(/Expires=Thu, 01 Jan 1970/);
  });

  it('a callback in a browser that never started a sign-in', async () => {
    const res = await request(t.app).get('/api/auth/callback?code=abc&state=xyz').expect(303);
    expect(problemOf(res)).toBe('no_sign_in_started');
  });

  it('a sign-in whose PKCE verifier is gone (expired and swept, or already used)', async () => {
    const a = agent();
    const start = await a.get('/api/auth/sign-in').expect(302);
    const state = new URL(start.headers.location).searchParams.get('state')!;
    t.db.delete(signInAttempts).run();
    const res = await a.get(`/api/auth/callback?code=abc&state=${state}`).expect(303);
    expect(problemOf(res)).toBe('missing_verifier');
  });

  it('a replayed callback, and a reused code under a fresh state', async () => {
    const a = agent();
    const first = await signInThroughProvider(t, a, { subject: 'demo-viewer' });
    expect(first.callback.status).toBe(303);
    // Replaying the same URL: the attempt was consumed and the state cookie cleared.
    const replay = await a.get(`${first.callbackUrl.pathname}${first.callbackUrl.search}`).expect(303);
    expect(problemOf(replay)).not.toBeNull();
    // A new sign-in in the same browser, fed the old code: the provider refuses the code.
    const start = await a.get('/api/auth/sign-in').expect(302);
    const state = new URL(start.headers.location).searchParams.get('state')!;
    const reused = await a.get(`/api/auth/callback?code=${first.callbackUrl.searchParams.get('code')}&state=${state}`).expect(303);
    expect(problemOf(reused)).toBe('code_rejected');
    expect(sessionCookie(reused)).toBeUndefined();
  });

  it('an ID token whose nonce is not the one sent', async () => {
    const a = agent();
    const start = await a.get('/api/auth/sign-in').expect(302);
    t.db.update(signInAttempts).set({ nonce: 'a-different-nonce' }).run();
    const authorizeUrl = new URL(start.headers.location);
    const form = new URLSearchParams(authorizeUrl.searchParams);
    form.set('subject', 'demo-engineer');
    const picked = await fetch(`${t.provider.issuer}/authorize`, { method: 'POST', body: form, redirect: 'manual' });
    const minted = await fetch(new URL(picked.headers.get('location')!, t.provider.issuer), { redirect: 'manual' });
    const back = new URL(minted.headers.get('location')!);
    const res = await a.get(`${back.pathname}${back.search}`).expect(303);
    expect(problemOf(res)).toBe('code_rejected');
  });

  it('an error sent back by the provider', async () => {
    const a = agent();
    await a.get('/api/auth/sign-in').expect(302);
    const res = await a.get('/api/auth/callback?error=access_denied&state=x').expect(303);
    expect(problemOf(res)).toBe('provider_refused');
  });
});

describe('no open redirect', () => {
  it.each([
    '//evil.example/steal',
    'https://evil.example/',
    '/\\evil.example',
    'javascript:alert(1)',
    '/%0d%0aLocation: x'.replace('%0d%0a', '\r\n'),
    // Paths that only become another host once normalised.
    '/.//evil.example/x',
    '/..//evil.example',
    '/a/..//evil.example/x?y=1',
    '/%2e%2e//evil.example',
    '/./%2e//evil.example',
  ])('refuses returnTo=%s', async (returnTo) => {
    const res = await request(t.app)
      .get(`/api/auth/sign-in?returnTo=${encodeURIComponent(returnTo)}`)
      .expect(400);
    expect(res.body.error.code).toBe('invalid_request');
  });

  it('returns to a path with its query after sign-in', async () => {
    const a = agent();
    const { callback } = await signInThroughProvider(t, a, { subject: 'demo-engineer' }, '/invites/accept?token=abc.def');
    expect(callback.headers.location).toBe('/invites/accept?token=abc.def');
  });
});

describe('sessions end', () => {
  it('after the idle limit without a request', async () => {
    const a = agent();
    await signInThroughProvider(t, a, { name: 'Cleo Amsel', email: 'cleo@firm.example' });
    now += 1.5 * hour;
    await a.get('/api/me').expect(200);
    now += 1.5 * hour; // 1.5 h since the last request: still inside the 2 h idle limit
    await a.get('/api/me').expect(200);
    now += 2.5 * hour;
    await a.get('/api/me').expect(401);
  });

  it('at the absolute limit even when used all along', async () => {
    const a = agent();
    await signInThroughProvider(t, a, { name: 'Cleo Amsel', email: 'cleo@firm.example' });
    for (let i = 0; i < 9; i += 1) {
      now += hour;
      await a.get('/api/me').expect(200);
    }
    now += 1.5 * hour; // 10.5 h after sign-in
    await a.get('/api/me').expect(401);
  });

  it('on sign-out, and the cookie is cleared', async () => {
    const a = agent();
    await signInThroughProvider(t, a, { name: 'Cleo Amsel', email: 'cleo@firm.example' });
    const out = await a.post('/api/auth/sign-out').expect(204);
    expect(sessionCookie(out)).toMatch(/Expires=Thu, 01 Jan 1970/);
    await a.get('/api/me').expect(401);
  });

  it('everywhere at once', async () => {
    const laptop = agent();
    const phone = agent();
    await signInThroughProvider(t, laptop, { name: 'Dara Kell', email: 'dara@firm.example' });
    await signInThroughProvider(t, phone, { name: 'Dara Kell', email: 'dara@firm.example' });
    const res = await laptop.post('/api/auth/sign-out-everywhere').expect(200);
    expect(res.body.ended).toBe(2);
    await phone.get('/api/me').expect(401);
    await laptop.get('/api/me').expect(401);
  });
});

describe('cross-site requests', () => {
  it('a signed-in change without the client header is refused; with it, it goes through', async () => {
    const a = request.agent(t.app);
    await signInThroughProvider(t, a, { name: 'Eli Sand', email: 'eli@firm.example' });
    const refused = await a.patch('/api/me').send({ unitSystem: 'ip' }).expect(403);
    expect(refused.body.error.code).toBe('cross_site_refused');
    await a.patch('/api/me').set('x-tramontane-request', '1').send({ unitSystem: 'ip' }).expect(200);
  });

  it('a change from a foreign origin is refused even with the header', async () => {
    const a = agent();
    await signInThroughProvider(t, a, { name: 'Eli Sand', email: 'eli@firm.example' });
    const res = await a.patch('/api/me').set('origin', 'https://evil.example').send({ runNotices: true }).expect(403);
    expect(res.body.error.code).toBe('cross_site_refused');
  });
});

describe('per-person settings', () => {
  it('starts at SI without run notices, and remembers a change', async () => {
    const a = agent();
    await signInThroughProvider(t, a, { name: 'Fen Okoro', email: 'fen@firm.example' });
    expect((await a.get('/api/me').expect(200)).body.settings).toEqual({ unitSystem: 'si', runNotices: false });
    await a.patch('/api/me').send({ unitSystem: 'ip', runNotices: true }).expect(200);
    expect((await a.get('/api/me').expect(200)).body.settings).toEqual({ unitSystem: 'ip', runNotices: true });
  });

  it('refuses an unknown unit system, naming the field', async () => {
    const a = agent();
    await signInThroughProvider(t, a, { name: 'Fen Okoro', email: 'fen@firm.example' });
    const res = await a.patch('/api/me').send({ unitSystem: 'imperial' }).expect(400);
    expect(res.body.error.message).toContain('unitSystem');
  });
});

describe('the demo people', () => {
  it('sign in as the seeded person with the same e-mail, keeping their project role', async () => {
    const s = await startSignInStack();
    try {
      seedDemo(s.db);
      const a = request.agent(s.app);
      await signInThroughProvider(s, a, { subject: 'demo-engineer' });
      const me = await a.get('/api/me').expect(200);
      expect(me.body.user).toMatchObject({ name: 'Tobias Ferrand', isAdmin: false });
      expect(me.body.projects).toEqual([expect.objectContaining({ name: 'Larchfield campus study (demo)', role: 'engineer' })]);
      const linked = s.db.select().from(users).where(eq(users.email, 'tobias.ferrand@tramontane.example')).get()!;
      expect(linked.oidcSubject).toBe('demo-engineer');
      expect(linked.oidcIssuer).toBe(s.provider.issuer);
    } finally {
      await s.close();
    }
  });
});

describe('rate limits', () => {
  it('the sign-in start answers 429 past the limit', async () => {
    const s = await startSignInStack({ overrides: { signInRateLimit: { limit: 3, windowMs: 60_000 } } });
    try {
      for (let i = 0; i < 3; i += 1) await request(s.app).get('/api/auth/sign-in').expect(302);
      const res = await request(s.app).get('/api/auth/sign-in').expect(429);
      expect(res.body.error.code).toBe('too_many_requests');
      await request(s.app).get('/api/auth/callback?code=a&state=b').expect(303);
    } finally {
      await s.close();
    }
  });

  it("the fake provider's token endpoint answers 429 past its limit", async () => {
    const provider = await startFakeProvider({ people: [], clientId: 'c', redirectUris: [], tokenRequestsPerMinute: 2 });
    try {
      const post = () => fetch(`${provider.issuer}/token`, { method: 'POST', body: new URLSearchParams({ grant_type: 'authorization_code', code: 'x' }) });
      expect((await post()).status).toBe(400);
      expect((await post()).status).toBe(400);
      expect((await post()).status).toBe(429);
    } finally {
      await provider.close();
    }
  });
});

describe('the fake provider', () => {
  it('publishes discovery, an RS256 JWKS, and keeps its keys in the data folder across restarts', async () => {
    const dataDir = mkdtempSync(path.join(tmpdir(), 'tramontane-provider-'));
    try {
      const first = await startFakeProvider({ people: [], clientId: 'c', redirectUris: [], dataDir });
      const discovery = await (await fetch(`${first.issuer}/.well-known/openid-configuration`)).json();
      expect(discovery).toMatchObject({
        issuer: first.issuer,
        authorization_endpoint: `${first.issuer}/authorize`,
        token_endpoint: `${first.issuer}/token`,
        jwks_uri: `${first.issuer}/jwks`,
        userinfo_endpoint: `${first.issuer}/userinfo`,
        code_challenge_methods_supported: ['S256'],
      });
      const jwks = await (await fetch(discovery.jwks_uri)).json();
      expect(jwks.keys).toHaveLength(1);
      expect(jwks.keys[0]).toMatchObject({ kty: 'RSA', alg: 'RS256' });
      expect(jwks.keys[0].d).toBeUndefined();
      await first.close();
      const second = await startFakeProvider({ people: [], clientId: 'c', redirectUris: [], dataDir });
      const again = await (await fetch(`${second.issuer}/jwks`)).json();
      expect(again.keys[0].kid).toBe(jwks.keys[0].kid);
      await second.close();
    } finally {
      rmSync(dataDir, { recursive: true, force: true });
    }
  });

  it('refuses an authorize request for an unregistered return address', async () => {
    const res = await fetch(
      `${t.provider.issuer}/authorize?response_type=code&client_id=tramontane-test&redirect_uri=${encodeURIComponent('https://evil.example/cb')}&state=s&code_challenge=${'a'.repeat(43)}&code_challenge_method=S256`,
    );
    expect(res.status).toBe(400);
    expect(await res.text()).toContain('is not registered');
  });

  it('does not mint a code for a request that skipped the picker', async () => {
    const params = new URLSearchParams({
      response_type: 'code',
      client_id: 'tramontane-test',
      redirect_uri: t.redirectUri,
      state: 's',
      code_challenge: 'a'.repeat(43),
      code_challenge_method: 'S256',
    });
    const res = await fetch(`${t.provider.issuer}/_provider/authorize?${params}`, { redirect: 'manual' });
    const back = new URL(res.headers.get('location')!);
    expect(back.searchParams.get('code')).toBeNull();
    expect(back.searchParams.get('error')).toBe('access_denied');
  });
});

describe('ID tokens that fail a check are refused', () => {
  const cases: [string, (claims: Record<string, unknown>) => void][] = [
    ['expired', (c) => Object.assign(c, { iat: Math.floor(Date.now() / 1000) - 7200, exp: Math.floor(Date.now() / 1000) - 3600 })],
    ['for another client', (c) => Object.assign(c, { aud: 'someone-else' })],
    ['from another issuer', (c) => Object.assign(c, { iss: 'https://issuer.elsewhere.example' })],
  ];
  it.each(cases)('%s', async (_label, alterClaims) => {
    const stack = await startSignInStack({ provider: { alterClaims } });
    try {
      const a = request.agent(stack.app);
      const { callback } = await signInThroughProvider(stack, a, { subject: 'demo-engineer' });
      expect(problemOf(callback)).toBe('code_rejected');
      expect(sessionCookie(callback)).toBeUndefined();
    } finally {
      await stack.close();
    }
  });
});

describe('userinfo at the fake provider', () => {
  it('answers with the picked person for their access token', async () => {
    const { OAuth2Client, CodeChallengeMethod, generateCodeVerifier, generateState } = await import('arctic');
    const client = new OAuth2Client('tramontane-test', null, t.redirectUri);
    const verifier = generateCodeVerifier();
    const url = client.createAuthorizationURLWithPKCE(`${t.provider.issuer}/authorize`, generateState(), CodeChallengeMethod.S256, verifier, ['openid']);
    const form = new URLSearchParams(url.searchParams);
    form.set('subject', 'demo-viewer');
    const picked = await fetch(`${t.provider.issuer}/authorize`, { method: 'POST', body: form, redirect: 'manual' });
    const minted = await fetch(new URL(picked.headers.get('location')!, t.provider.issuer), { redirect: 'manual' });
    const code = new URL(minted.headers.get('location')!).searchParams.get('code')!;
    const tokens = await client.validateAuthorizationCode(`${t.provider.issuer}/token`, code, verifier);
    const info = await (await fetch(`${t.provider.issuer}/userinfo`, { headers: { authorization: `Bearer ${tokens.accessToken()}` } })).json();
    expect(info).toEqual({ sub: 'demo-viewer', name: 'Priya Castellane', email: 'priya.castellane@calloway-halls.example', email_verified: true });
  });
});
