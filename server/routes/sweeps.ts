import type { AppDeps } from '../app';
import type { RouteSpec } from '../auth/access';

/** Sweeps: one or two scenario inputs varied over a range on one climate file, each point a run. */
export function sweepRoutes(_deps: AppDeps): RouteSpec[] {
  return [];
}
