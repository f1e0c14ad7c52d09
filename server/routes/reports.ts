import type { AppDeps } from '../app';
import type { RouteSpec } from '../auth/access';

/** Report data, hourly and summary downloads, and read-only share links. */
export function reportRoutes(_deps: AppDeps): RouteSpec[] {
  return [];
}
