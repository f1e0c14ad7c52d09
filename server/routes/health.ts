import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { databaseLatencyMs } from '../db/client';
import { ENGINE_VERSION } from '../../shared/scenario/version';
import packageJson from '../../package.json' with { type: 'json' };

export function healthRoutes({ db }: AppDeps): RouteSpec[] {
  return [
    route('get', '/health', access.public, (_req, res) => {
      const latencyMs = databaseLatencyMs(db);
      res.json({
        status: 'ok',
        version: packageJson.version,
        engineVersion: ENGINE_VERSION,
        database: { reachable: true, latencyMs: Number(latencyMs.toFixed(3)) },
        time: new Date().toISOString(),
      });
    }),
  ];
}
