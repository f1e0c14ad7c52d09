import express, { type Express } from 'express';
import type { WorkerPool } from '../workers/pool';
import { existsSync } from 'node:fs';
import type { Db } from './db/client';
import type { RunQueue } from './runs/queue';
import { loadSession, type Clock, type SessionPolicy } from './auth/session';
import { refuseCrossSite } from './auth/csrf';
import type { OidcClient } from './auth/oidc';
import type { Mailer } from './mail/mailer';
import type { Mailbox } from './mail/fake-smtp';
import { mountRoutes, type RouteSpec } from './auth/access';
import { refuseDeepJson } from './middleware/json-depth';
import { securityHeaders } from './middleware/security-headers';
import { clientFiles } from './middleware/client-files';
import { compressAnswers } from './middleware/compress';
import { apiNotFound, errorHandler } from './middleware/errors';
import { healthRoutes } from './routes/health';
import { projectRoutes } from './routes/projects';
import { authRoutes } from './routes/auth';
import { meRoutes } from './routes/me';
import { memberRoutes } from './routes/members';
import { inviteRoutes } from './routes/invites';
import { auditRoutes } from './routes/audit';
import { mailboxRoutes } from './routes/mailbox';
import { siteRoutes } from './routes/sites';
import { climateFileRoutes } from './routes/climate-files';
import { envelopeRoutes } from './routes/envelopes';
import { scenarioRoutes } from './routes/scenarios';
import { runRoutes } from './routes/runs';
import { sweepRoutes } from './routes/sweeps';
import { projectionRoutes } from './routes/projections';
import { excursionRoutes } from './routes/excursions';
import { reportRoutes } from './routes/reports';
import { openApiRoutes } from './routes/openapi';

export interface AppDeps {
  db: Db;
  pool: WorkerPool;
  runQueue: RunQueue;
  /** Per-project limit on stored bytes (server/storage/quota.ts); 1 GB when absent. */
  storageLimitBytes?: number;
  /** Climate-file upload limits; defaults in climate/upload.ts. */
  uploadLimits?: { bytes: number; rows: number };
  /** Built client to serve; omitted in API-only tests. */
  clientDist?: string;
  /** Vite dev middleware, in development. */
  devMiddleware?: express.RequestHandler;
  logError?: (error: unknown) => void;
  /** The sign-in provider; without it sign-in answers 503 (API tests that make sessions directly need none). */
  oidc?: OidcClient;
  /** Outgoing mail (invitations, run notices); without it inviting answers 503. */
  mailer?: Mailer;
  /** The local fake SMTP server's catch, shown to admins; only in the default set-up. */
  mailbox?: Mailbox;
  /** Signs invitation links; keep it across restarts or outstanding links stop working. Random per app when absent. */
  secret?: Uint8Array;
  /** The address people open the app at, for links in e-mails (`https://tramontane.firm.example`). */
  publicUrl?: string;
  clock?: Clock;
  sessionPolicy?: SessionPolicy;
  inviteLifetimeMs?: number;
  /** E-mails (lower case) that become organisation admins when they sign in with a provider-verified address. */
  adminEmails?: readonly string[];
  /** Share-link reads (report and downloads) allowed per address per window; tokens are unguessable, this bounds the load. */
  sharedLinkRateLimit?: { limit: number; windowMs: number };
  /** Sign-in and callback requests allowed per address per window. */
  signInRateLimit?: { limit: number; windowMs: number };
  /** Tests only: runs before everything else (tests/support/answer-check.ts checks each JSON answer against its schema). */
  answerCheck?: express.RequestHandler;
}

/** Every API route with its access rule; the role-matrix test walks this same list. */
export function apiRoutes(deps: AppDeps): RouteSpec[] {
  const routes: RouteSpec[] = [
    ...healthRoutes(deps),
    ...openApiRoutes(() => routes),
    ...projectRoutes(deps),
    ...siteRoutes(deps),
    ...climateFileRoutes(deps),
    ...envelopeRoutes(deps),
    ...scenarioRoutes(deps),
    ...runRoutes(deps),
    ...sweepRoutes(deps),
    ...projectionRoutes(deps),
    ...excursionRoutes(deps),
    ...reportRoutes(deps),
    ...authRoutes(deps),
    ...meRoutes(deps),
    ...memberRoutes(deps),
    ...inviteRoutes(deps),
    ...auditRoutes(deps),
    ...mailboxRoutes(deps),
  ];
  return routes;
}

/** Builds the app without listening, so tests can hand it to supertest. */
export function createApp(deps: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  if (deps.answerCheck) app.use(deps.answerCheck);
  app.use(securityHeaders({ development: Boolean(deps.devMiddleware) }));
  app.use(compressAnswers());

  const api = express.Router();
  api.use(express.json({ limit: '20mb', verify: (_req, _res, raw) => refuseDeepJson(raw) }));
  api.use(loadSession(deps.db, { clock: deps.clock, policy: deps.sessionPolicy }));
  api.use(refuseCrossSite);
  mountRoutes(api, deps.db, apiRoutes(deps));
  api.use(apiNotFound);
  app.use('/api', api);

  if (deps.devMiddleware) {
    app.use(deps.devMiddleware);
  } else if (deps.clientDist && existsSync(deps.clientDist)) {
    app.use(clientFiles(deps.clientDist));
  }

  app.use(errorHandler(deps.logError ?? ((error) => console.error(error))));
  return app;
}
