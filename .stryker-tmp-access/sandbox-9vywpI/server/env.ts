// @ts-nocheck
import path from 'node:path';
import { z } from 'zod';
import { DEFAULT_PROJECT_STORAGE_MB } from './storage/quota';

/** An on/off variable: 1/true or 0/false (unset is off). */
const flag = z
  .enum(['0', '1', 'true', 'false'], { error: 'must be 1 or 0' })
  .default('0')
  .transform((value) => value === '1' || value === 'true');

const LOOPBACK_HOSTS = new Set(['127.0.0.1', '::1', 'localhost']);

const envSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
    PORT: z.coerce.number().int().min(0).max(65_535).default(3000),
    HOST: z.string().min(1).default('127.0.0.1'),
    /** Folder holding the SQLite file and anything else the server keeps (keys, received mail). */
    TRAMONTANE_DATA_DIR: z.string().min(1).default('./data'),
    /** Worker threads for the hour classifier; 0 means one per core. */
    TRAMONTANE_WORKERS: z.coerce.number().int().min(0).max(256).default(0),
    /** Per-project limit on stored bytes (climate files, run hours, issue lists), MB of 1,000,000 bytes. */
    TRAMONTANE_PROJECT_STORAGE_MB: z.coerce.number().int().min(1).max(10_000_000).default(DEFAULT_PROJECT_STORAGE_MB),
    /** The address people open the app at; links in e-mails and the sign-in callback are built from it. */
    TRAMONTANE_PUBLIC_URL: z.string().url().optional(),
    /** Signs invitation links; when unset a random one is made once and kept in the data folder. */
    TRAMONTANE_SECRET: z.string().min(32, 'TRAMONTANE_SECRET must be at least 32 characters').optional(),

    /** A real OpenID Connect provider. Unset: the local fake provider starts with the app. */
    OIDC_ISSUER: z.string().url().optional(),
    OIDC_CLIENT_ID: z.string().min(1).optional(),
    OIDC_CLIENT_SECRET: z.string().min(1).optional(),
    /** Defaults to <public URL>/api/auth/callback; register exactly this URL with the provider. */
    OIDC_REDIRECT_URL: z.string().url().optional(),
    /** Port of the local fake provider when no OIDC_ISSUER is set. Kept fixed because people are linked to its issuer URL. */
    FAKE_OIDC_PORT: z.coerce.number().int().min(0).max(65_535).default(3001),

    /** A real SMTP server. Unset: the local fake SMTP server starts with the app and admins read its mailbox. */
    SMTP_HOST: z.string().min(1).optional(),
    SMTP_PORT: z.coerce.number().int().min(1).max(65_535).default(587),
    /** true: TLS from the first byte (usually port 465); false: STARTTLS, which is then required. */
    SMTP_SECURE: z
      .enum(['true', 'false'])
      .default('false')
      .transform((v) => v === 'true'),
    SMTP_USER: z.string().min(1).optional(),
    SMTP_PASSWORD: z.string().min(1).optional(),
    MAIL_FROM: z.string().min(3).default('Tramontane <tramontane@localhost>'),
    /** Port of the local fake SMTP server when no SMTP_HOST is set. */
    FAKE_SMTP_PORT: z.coerce.number().int().min(0).max(65_535).default(2525),

    /**
     * Demo mode: the local sign-in provider and mail server stand in where OIDC_ISSUER / SMTP_HOST are unset, and an
     * empty database gets the synthetic demo workspace. `npm start` and `npm run dev` turn it on; a deployment leaves it off.
     */
    TRAMONTANE_DEMO: flag,
    /** Lets demo mode listen beyond loopback; anyone who reaches it can pick the demo admin on the local provider's page. */
    TRAMONTANE_DEMO_PUBLIC: flag,
    /** Comma-separated e-mails that become organisation admins when they sign in with a provider-verified address. */
    TRAMONTANE_ADMIN_EMAILS: z
      .string()
      .default('')
      .transform((list) =>
        list
          .split(',')
          .map((email) => email.trim().toLowerCase())
          .filter(Boolean),
      )
      .pipe(z.array(z.email({ error: (issue) => `TRAMONTANE_ADMIN_EMAILS holds ${JSON.stringify(issue.input)}, which is not an e-mail address` }))),
  })
  .superRefine((env, ctx) => {
    if (!env.TRAMONTANE_DEMO) {
      const standIn = 'or set TRAMONTANE_DEMO=1 for the local stand-ins (never on a shared server)';
      if (!env.OIDC_ISSUER)
        ctx.addIssue({ code: 'custom', path: ['OIDC_ISSUER'], message: `OIDC_ISSUER is required outside demo mode: name your sign-in provider, ${standIn}` });
      if (!env.SMTP_HOST)
        ctx.addIssue({ code: 'custom', path: ['SMTP_HOST'], message: `SMTP_HOST is required outside demo mode: name your mail server, ${standIn}` });
    } else if (!LOOPBACK_HOSTS.has(env.HOST) && !env.TRAMONTANE_DEMO_PUBLIC) {
      ctx.addIssue({
        code: 'custom',
        path: ['HOST'],
        message: `demo mode listens on loopback only (HOST=${env.HOST}): its local sign-in page lets anyone pick the demo admin. Set TRAMONTANE_DEMO_PUBLIC=1 to allow it anyway`,
      });
    }
    if (env.OIDC_ISSUER && !env.OIDC_CLIENT_ID) {
      ctx.addIssue({ code: 'custom', path: ['OIDC_CLIENT_ID'], message: 'OIDC_CLIENT_ID is required when OIDC_ISSUER is set' });
    }
    if (!env.OIDC_ISSUER && (env.OIDC_CLIENT_ID || env.OIDC_CLIENT_SECRET)) {
      ctx.addIssue({ code: 'custom', path: ['OIDC_ISSUER'], message: 'OIDC_ISSUER is required when OIDC_CLIENT_ID or OIDC_CLIENT_SECRET is set' });
    }
    if (!env.SMTP_HOST && (env.SMTP_USER || env.SMTP_PASSWORD)) {
      ctx.addIssue({ code: 'custom', path: ['SMTP_HOST'], message: 'SMTP_HOST is required when SMTP_USER or SMTP_PASSWORD is set' });
    }
  });

export type Env = z.infer<typeof envSchema> & { databaseFile: string };

/** Reads and checks the environment once at start-up; a bad value stops the server with every problem named. */
export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`).join('\n');
    throw new Error(`The environment is not valid:\n${problems}`);
  }
  const dataDir = path.resolve(parsed.data.TRAMONTANE_DATA_DIR);
  return { ...parsed.data, TRAMONTANE_DATA_DIR: dataDir, databaseFile: path.join(dataDir, 'tramontane.db') };
}
