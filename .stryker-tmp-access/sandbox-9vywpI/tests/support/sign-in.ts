// @ts-nocheck
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Agent } from 'supertest';
import type { AppDeps } from '../../server/app';
import { OidcClient } from '../../server/auth/oidc';
import { demoPickerPeople } from '../../server/demo/people';
import { startFakeProvider, type FakeProvider, type FakeProviderOptions } from '../../server/fake-provider';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import { createSmtpMailer } from '../../server/mail/mailer';
import { createTestApp, type TestApp } from './test-app';

export const testClientId = 'tramontane-test';

export interface SignInStack extends TestApp {
  provider: FakeProvider;
  smtp: FakeSmtp;
  redirectUri: string;
  publicUrl: string;
}

/**
 * A test app wired like `npm start`: the fake OpenID provider and the fake SMTP server on free loopback
 * ports, nodemailer sending to it. `publicUrl` is where the app is (or will be) reachable; API tests never
 * listen, they take the callback URL from the provider's redirect and hand it to supertest.
 */
export async function startSignInStack(
  options: { publicUrl?: string; overrides?: Partial<AppDeps>; provider?: Partial<FakeProviderOptions> } = {},
): Promise<SignInStack> {
  const publicUrl = options.publicUrl ?? 'http://127.0.0.1:1';
  const redirectUri = `${publicUrl}/api/auth/callback`;
  const provider = await startFakeProvider({ people: demoPickerPeople, clientId: testClientId, redirectUris: [redirectUri], ...options.provider });
  const smtpFolder = mkdtempSync(path.join(tmpdir(), 'tramontane-mailbox-'));
  const smtp = await startFakeSmtp({ folder: smtpFolder });
  const mailer = createSmtpMailer({ host: smtp.host, port: smtp.port, secure: false, from: 'Tramontane test <tramontane@test.invalid>' });
  const t = createTestApp({
    oidc: new OidcClient({ issuer: provider.issuer, clientId: testClientId, clientSecret: null, redirectUri }),
    mailer,
    mailbox: smtp.mailbox,
    publicUrl,
    ...options.overrides,
  });
  return {
    ...t,
    provider,
    smtp,
    redirectUri,
    publicUrl,
    close: async () => {
      mailer.close();
      await Promise.all([provider.close(), smtp.close()]);
      await t.close();
      rmSync(smtpFolder, { recursive: true, force: true });
    },
  };
}

export type WhoSignsIn = { subject: string } | { name: string; email: string };

/** Follows the provider's redirects by hand, as a browser would, without following into the app. */
async function fetchManual(url: string, init: RequestInit = {}): Promise<Response> {
  return fetch(url, { ...init, redirect: 'manual' });
}

/**
 * Walks the whole code flow: the app's sign-in redirect, the provider's picker page, the pick, the
 * provider's redirect back with a code, and the app's callback. Returns the callback's response and
 * the callback URL (for replay tests).
 */
export async function signInThroughProvider(stack: SignInStack, agent: Agent, who: WhoSignsIn, returnTo = '/') {
  const start = await agent.get(`/api/auth/sign-in?returnTo=${encodeURIComponent(returnTo)}`).expect(302);
  const authorizeUrl = new URL(start.headers.location);
  const picker = await fetchManual(authorizeUrl.toString());
  if (picker.status !== 200) throw new Error(`The picker page answered ${picker.status}.`);
  const form = new URLSearchParams(authorizeUrl.searchParams);
  if ('subject' in who) form.set('subject', who.subject);
  else {
    form.set('name', who.name);
    form.set('email', who.email);
  }
  const picked = await fetchManual(`${stack.provider.issuer}/authorize`, { method: 'POST', body: form });
  if (picked.status !== 303) throw new Error(`The pick answered ${picked.status}: ${await picked.text()}`);
  const minted = await fetchManual(new URL(picked.headers.get('location')!, stack.provider.issuer).toString());
  const callbackUrl = new URL(minted.headers.get('location')!);
  const callback = await agent.get(`${callbackUrl.pathname}${callbackUrl.search}`);
  return { callback, callbackUrl, authorizeUrl };
}
