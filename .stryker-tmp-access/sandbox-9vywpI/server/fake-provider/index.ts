// @ts-nocheck
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import express from 'express';
import { rateLimit } from 'express-rate-limit';
import { decodeJwt } from 'jose';
import { OAuth2Issuer, OAuth2Service, type MutableRedirectUri, type MutableResponse, type MutableToken } from 'oauth2-mock-server';
import { z } from 'zod';
import { FakePeople, type FakePerson } from './people-store';
import { pickerPage } from './picker-page';

export type { FakePerson } from './people-store';

export interface FakeProviderOptions {
  /** Invented people offered on the picker. */
  people: FakePerson[];
  /** The client id this provider accepts. */
  clientId: string;
  /** Callback URLs this provider will redirect to; anything else is refused. */
  redirectUris: string[];
  host?: string;
  /** 0 picks a free port. */
  port?: number;
  /** Folder for the signing keys and typed-in people; without it they live in memory only. */
  dataDir?: string;
  /** Token requests allowed per minute per address. */
  tokenRequestsPerMinute?: number;
  /** Tests only: change each token's claims before signing (an expired or foreign token, say). */
  alterClaims?: (claims: Record<string, unknown>) => void;
}

export interface FakeProvider {
  issuer: string;
  close: () => Promise<void>;
}

// The mock's own authorize endpoint hands out a code at once; it sits behind the picker at a private path.
const innerAuthorizePath = '/_provider/authorize';
const pickLifetimeMs = 5 * 60_000;

const authorizeParams = z.object({
  response_type: z.literal('code'),
  client_id: z.string().min(1),
  redirect_uri: z.string().url(),
  state: z.string().min(1),
  code_challenge: z.string().min(43),
  code_challenge_method: z.literal('S256'),
  scope: z.string().optional(),
  nonce: z.string().optional(),
});

/**
 * A local OpenID Connect provider for the default set-up and the tests: oauth2-mock-server does the
 * protocol (discovery, JWKS, code + PKCE, RS256 ID tokens, userinfo); this wrapper adds the person
 * picker, keeps the signing keys in the data folder, and puts the picked person into the tokens.
 */
export async function startFakeProvider(options: FakeProviderOptions): Promise<FakeProvider> {
  const folder = options.dataDir ? path.join(options.dataDir, 'fake-provider') : undefined;
  const people = new FakePeople(options.people, folder && path.join(folder, 'people.json'));
  const issuer = new OAuth2Issuer();
  await loadOrCreateKeys(issuer, folder && path.join(folder, 'signing-keys.json'));
  const service = new OAuth2Service(issuer, { authorize: innerAuthorizePath });

  const picks = new Map<string, { person: FakePerson; expiresAt: number }>();
  const codes = new Map<string, FakePerson>();

  // A code is minted only for a request that came through the picker, and remembers who was picked.
  service.on('beforeAuthorizeRedirect', (redirect: MutableRedirectUri, req: express.Request) => {
    const pickId = typeof req.query.pick === 'string' ? req.query.pick : '';
    const pick = picks.get(pickId);
    picks.delete(pickId);
    const code = redirect.url.searchParams.get('code');
    if (!pick || pick.expiresAt < Date.now() || !code) {
      redirect.url.searchParams.delete('code');
      redirect.url.searchParams.set('error', 'access_denied');
      redirect.url.searchParams.set('error_description', 'Pick a person on the sign-in page.');
      return;
    }
    codes.set(code, pick.person);
  });
  service.on('beforeTokenSigning', (token: MutableToken, req: express.Request & { body: { code?: string } }) => {
    const person = req.body.code ? codes.get(req.body.code) : undefined;
    if (!person) return;
    Object.assign(token.payload, { sub: person.subject, email: person.email, email_verified: true, name: person.name });
    options.alterClaims?.(token.payload);
  });
  service.on('beforeResponse', (response: MutableResponse, req: express.Request & { body: { code?: string; grant_type?: string } }) => {
    if (req.body.grant_type !== 'authorization_code') {
      response.statusCode = 400;
      response.body = { error: 'unsupported_grant_type', error_description: 'This provider only does the authorization code flow.' };
      return;
    }
    const code = req.body.code ?? '';
    if (!codes.has(code)) {
      response.statusCode = 400;
      response.body = { error: 'invalid_grant', error_description: 'The code is unknown or was already used.' };
    }
    codes.delete(code);
  });
  service.on('beforeUserinfo', (response: MutableResponse, req: express.Request) => {
    const bearer = req.headers.authorization?.replace(/^Bearer\s+/i, '') ?? '';
    let person: FakePerson | undefined;
    try {
      person = people.bySubject(String(decodeJwt(bearer).sub));
    } catch {
      person = undefined;
    }
    if (!person) {
      response.statusCode = 401;
      response.body = { error: 'invalid_token' };
      return;
    }
    response.body = { sub: person.subject, email: person.email, email_verified: true, name: person.name };
  });

  const app = express();
  app.disable('x-powered-by');
  app.get('/.well-known/openid-configuration', (_req, res) => {
    const base = issuer.url!;
    res.json({
      issuer: base,
      authorization_endpoint: `${base}/authorize`,
      token_endpoint: `${base}/token`,
      userinfo_endpoint: `${base}/userinfo`,
      jwks_uri: `${base}/jwks`,
      response_types_supported: ['code'],
      grant_types_supported: ['authorization_code'],
      subject_types_supported: ['public'],
      id_token_signing_alg_values_supported: ['RS256'],
      code_challenge_methods_supported: ['S256'],
      token_endpoint_auth_methods_supported: ['none', 'client_secret_basic', 'client_secret_post'],
      scopes_supported: ['openid', 'profile', 'email'],
      claims_supported: ['sub', 'iss', 'aud', 'exp', 'iat', 'nonce', 'name', 'email', 'email_verified'],
    });
  });

  const checkRequest = (source: Record<string, unknown>) => {
    const parsed = authorizeParams.safeParse(source);
    if (!parsed.success) return { problem: `This sign-in request is incomplete: ${parsed.error.issues.map((i) => i.path.join('.')).join(', ')}.` };
    if (parsed.data.client_id !== options.clientId) return { problem: `Unknown client "${parsed.data.client_id}".` };
    if (!options.redirectUris.includes(parsed.data.redirect_uri)) return { problem: `The return address ${parsed.data.redirect_uri} is not registered.` };
    const { response_type, client_id, redirect_uri, state, code_challenge, code_challenge_method } = parsed.data;
    const params: Record<string, string> = { response_type, client_id, redirect_uri, state, code_challenge, code_challenge_method };
    if (parsed.data.scope) params.scope = parsed.data.scope;
    if (parsed.data.nonce) params.nonce = parsed.data.nonce;
    return { params };
  };

  app.get('/authorize', (req, res) => {
    const checked = checkRequest(req.query);
    res.set('cache-control', 'no-store');
    if (!checked.params) {
      res
        .status(400)
        .type('html')
        .send(pickerPage({}, { demo: [], typed: [] }, checked.problem));
      return;
    }
    res.type('html').send(pickerPage(checked.params, people.all()));
  });

  app.post('/authorize', express.urlencoded({ extended: false, limit: '20kb' }), (req, res) => {
    const body = (req.body ?? {}) as Record<string, string>;
    const checked = checkRequest(body);
    if (!checked.params) {
      res
        .status(400)
        .type('html')
        .send(pickerPage({}, { demo: [], typed: [] }, checked.problem));
      return;
    }
    let person: FakePerson | undefined;
    if (body.subject) {
      person = people.bySubject(body.subject);
    } else {
      const typed = z.object({ name: z.string().trim().min(1).max(120), email: z.string().trim().email().max(200) }).safeParse(body);
      if (!typed.success) {
        res
          .status(400)
          .type('html')
          .send(pickerPage(checked.params, people.all(), 'Type a name and a valid e-mail address.'));
        return;
      }
      person = people.addTyped(typed.data.name, typed.data.email);
    }
    if (!person) {
      res
        .status(400)
        .type('html')
        .send(pickerPage(checked.params, people.all(), 'That person is not known here.'));
      return;
    }
    const pickId = randomBytes(16).toString('base64url');
    picks.set(pickId, { person, expiresAt: Date.now() + pickLifetimeMs });
    const next = new URLSearchParams({ ...checked.params, pick: pickId });
    res.redirect(303, `${innerAuthorizePath}?${next.toString()}`);
  });

  app.post(
    '/token',
    rateLimit({
      windowMs: 60_000,
      limit: options.tokenRequestsPerMinute ?? 60,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      message: { error: 'slow_down', error_description: 'Too many token requests; wait a minute.' },
    }),
  );
  app.use(service.requestHandler);

  const server: Server = createServer(app);
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, options.host ?? '127.0.0.1', () => resolve());
  });
  const address = server.address() as AddressInfo;
  // A wildcard bind is not an address a browser can visit; name the machine itself instead.
  const wildcard = address.address === '0.0.0.0' || address.address === '::';
  const host = wildcard ? 'localhost' : address.family === 'IPv6' ? `[${address.address}]` : address.address;
  issuer.url = `http://${host}:${address.port}`;
  return {
    issuer: issuer.url,
    close: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}

/** RS256 keys made on first start and kept, so tokens and sessions survive a restart of the fake provider. */
async function loadOrCreateKeys(issuer: OAuth2Issuer, file: string | undefined): Promise<void> {
  if (file && existsSync(file)) {
    for (const jwk of JSON.parse(readFileSync(file, 'utf8')) as Record<string, unknown>[]) await issuer.keys.add(jwk);
    return;
  }
  await issuer.keys.generate('RS256');
  if (file) {
    mkdirSync(path.dirname(file), { recursive: true });
    writeFileSync(file, JSON.stringify(issuer.keys.toJSON(true), null, 2), { mode: 0o600 });
  }
}
