import { sql } from 'drizzle-orm';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';

export const engineVersion = '0.1.0';

export function healthRoutes({ db }: AppDeps): RouteSpec[] {
  return [
    route('get', '/health', access.public, (_req, res) => {
      const started = performance.now();
      db.get(sql`select 1`);
      res.json({
        status: 'ok',
        version: engineVersion,
        database: { reachable: true, latencyMs: Number((performance.now() - started).toFixed(3)) },
        time: new Date().toISOString(),
      });
    }),
  ];
}
