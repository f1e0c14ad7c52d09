// @ts-nocheck
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { AppDeps } from '../app';
import { demoPickerPeople } from '../demo/people';
import type { Env } from '../env';
import { startFakeProvider } from '../fake-provider';
import { startFakeSmtp } from '../mail/fake-smtp';
import { createSmtpMailer } from '../mail/mailer';
import { OidcClient } from './oidc';

/** The fake provider's client id in the default set-up. */
export const localClientId = 'tramontane-local';

export type AuthDeps = Pick<AppDeps, 'oidc' | 'mailer' | 'mailbox' | 'secret' | 'publicUrl'>;

/**
 * Sign-in and mail for `npm start`: the real provider and SMTP server when the environment names
 * them, otherwise the local fake provider and fake SMTP server, started here on loopback.
 */
export async function startAuthRuntime(env: Env, log: (line: string) => void): Promise<{ deps: AuthDeps; close: () => Promise<void> }> {
  const closers: (() => Promise<void> | void)[] = [];
  const publicUrl = (env.TRAMONTANE_PUBLIC_URL ?? `http://localhost:${env.PORT}`).replace(/\/$/, '');
  const redirectUri = env.OIDC_REDIRECT_URL ?? `${publicUrl}/api/auth/callback`;

  let oidc: OidcClient;
  if (env.OIDC_ISSUER) {
    oidc = new OidcClient({ issuer: env.OIDC_ISSUER, clientId: env.OIDC_CLIENT_ID!, clientSecret: env.OIDC_CLIENT_SECRET ?? null, redirectUri });
    log(`Sign-in: ${env.OIDC_ISSUER}`);
  } else {
    const provider = await startFakeProvider({
      people: demoPickerPeople,
      clientId: localClientId,
      redirectUris: [redirectUri],
      host: env.HOST,
      port: env.FAKE_OIDC_PORT,
      dataDir: env.TRAMONTANE_DATA_DIR,
    });
    closers.push(provider.close);
    oidc = new OidcClient({ issuer: provider.issuer, clientId: localClientId, clientSecret: null, redirectUri });
    log(`Sign-in: local fake provider at ${provider.issuer} (pick a demo person on its page)`);
  }

  let mailbox: AppDeps['mailbox'];
  let mailer;
  if (env.SMTP_HOST) {
    mailer = createSmtpMailer({
      host: env.SMTP_HOST,
      port: env.SMTP_PORT,
      secure: env.SMTP_SECURE,
      requireTls: !env.SMTP_SECURE,
      user: env.SMTP_USER,
      password: env.SMTP_PASSWORD,
      from: env.MAIL_FROM,
    });
    log(`Mail: SMTP ${env.SMTP_HOST}:${env.SMTP_PORT}`);
  } else {
    const smtp = await startFakeSmtp({ folder: path.join(env.TRAMONTANE_DATA_DIR, 'mailbox'), host: '127.0.0.1', port: env.FAKE_SMTP_PORT });
    closers.push(smtp.close);
    mailbox = smtp.mailbox;
    mailer = createSmtpMailer({ host: smtp.host, port: smtp.port, secure: false, from: env.MAIL_FROM });
    log(`Mail: local fake SMTP server on ${smtp.host}:${smtp.port}; admins read it at ${publicUrl}/mailbox`);
  }
  closers.push(mailer.close);

  return {
    deps: { oidc, mailer, mailbox, secret: loadSecret(env), publicUrl },
    close: async () => {
      await Promise.allSettled(closers.map((close) => close()));
    },
  };
}

function loadSecret(env: Env): Uint8Array {
  if (env.TRAMONTANE_SECRET) return new TextEncoder().encode(env.TRAMONTANE_SECRET);
  const file = path.join(env.TRAMONTANE_DATA_DIR, 'secret.key');
  if (!existsSync(file)) {
    mkdirSync(env.TRAMONTANE_DATA_DIR, { recursive: true });
    writeFileSync(file, randomBytes(32).toString('base64url'), { mode: 0o600 });
  }
  return new TextEncoder().encode(readFileSync(file, 'utf8').trim());
}
