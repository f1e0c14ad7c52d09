import type { AppDeps } from '../app';
import type { RouteSpec } from '../auth/access';

/** Excursion analysis of a run's hours against a proposed envelope or setpoint, for operators. */
export function excursionRoutes(_deps: AppDeps): RouteSpec[] {
  return [];
}
