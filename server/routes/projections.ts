import type { AppDeps } from '../app';
import type { RouteSpec } from '../auth/access';

/** Future-climate files derived from an uploaded one by Belcher morphing. */
export function projectionRoutes(_deps: AppDeps): RouteSpec[] {
  return [];
}
