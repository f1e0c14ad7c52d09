import { Router } from 'express';
import { sql } from 'drizzle-orm';
import type { AppDeps } from '../app';

export const engineVersion = '0.1.0';

export function healthRoutes({ db }: AppDeps): Router {
  const router = Router();
  router.get('/health', (_req, res) => {
    const started = performance.now();
    db.get(sql`select 1`);
    res.json({
      status: 'ok',
      version: engineVersion,
      database: { reachable: true, latencyMs: Number((performance.now() - started).toFixed(3)) },
      time: new Date().toISOString(),
    });
  });
  return router;
}
