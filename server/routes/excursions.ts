import { z } from 'zod';
import { proposalQuerySchema } from '../../shared/excursions/proposal-query';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { runExcursions } from '../excursions/analyse';
import { closedRequestSignal } from '../request-signal';

const runParams = z.object({ runId: z.coerce.number().int().positive('runId must be a positive whole number') });

/** Excursion analysis of a run's hours against a proposed envelope or setpoint, for operators. */
export function excursionRoutes({ db, pool }: AppDeps): RouteSpec[] {
  return [
    // Read-only: the proposal travels in the address, so a page can be bookmarked and taken to a review.
    route('get', '/projects/:projectId/runs/:runId/excursions', access.viewer, async (req, res) => {
      const { runId } = runParams.parse(req.params);
      const query = proposalQuerySchema.parse(req.query);
      res.json(await runExcursions(db, pool, req.projectId!, runId, query, closedRequestSignal(res)));
    }),
  ];
}
