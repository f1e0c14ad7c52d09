import express, { type Express } from 'express';
import type { WorkerPool } from '../workers/pool';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { Db } from './db/client';
import type { RunQueue } from './runs/queue';
import { loadSession } from './auth/session';
import { mountRoutes, type RouteSpec } from './auth/access';
import { apiNotFound, errorHandler } from './middleware/errors';
import { healthRoutes } from './routes/health';
import { projectRoutes } from './routes/projects';
import { seriesToolRoutes } from './routes/series-tools';
import { siteRoutes } from './routes/sites';
import { climateFileRoutes } from './routes/climate-files';
import { envelopeRoutes } from './routes/envelopes';
import { scenarioRoutes } from './routes/scenarios';
import { runRoutes } from './routes/runs';

export interface AppDeps {
  db: Db;
  pool: WorkerPool;
  runQueue: RunQueue;
  /** Climate-file upload limits; defaults in routes/climate-files.ts. */
  uploadLimits?: { bytes: number; rows: number };
  /** Built client to serve; omitted in API-only tests. */
  clientDist?: string;
  /** Vite dev middleware, in development. */
  devMiddleware?: express.RequestHandler;
  logError?: (error: unknown) => void;
}

/** Every API route with its access rule; the role-matrix test walks this same list. */
export function apiRoutes(deps: AppDeps): RouteSpec[] {
  return [
    ...healthRoutes(deps),
    ...projectRoutes(deps),
    ...seriesToolRoutes(deps),
    ...siteRoutes(deps),
    ...climateFileRoutes(deps),
    ...envelopeRoutes(deps),
    ...scenarioRoutes(deps),
    ...runRoutes(deps),
  ];
}

/** Builds the app without listening, so tests can hand it to supertest. */
export function createApp(deps: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');

  const api = express.Router();
  api.use(express.json({ limit: '20mb' }));
  api.use(loadSession(deps.db));
  mountRoutes(api, deps.db, apiRoutes(deps));
  api.use(apiNotFound);
  app.use('/api', api);

  if (deps.devMiddleware) {
    app.use(deps.devMiddleware);
  } else if (deps.clientDist && existsSync(deps.clientDist)) {
    const indexHtml = path.join(deps.clientDist, 'index.html');
    app.use(express.static(deps.clientDist, { index: false, maxAge: '1h' }));
    app.get('/{*splat}', (_req, res) => res.sendFile(indexHtml));
  }

  app.use(errorHandler(deps.logError ?? ((error) => console.error(error))));
  return app;
}
