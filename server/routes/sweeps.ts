import { z } from 'zod';
import { sweepSpecSchema } from '../../shared/sweep';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { cancelSweep, deleteSweep, listSweeps, startSweep, sweepOr404, sweepWithPoints } from '../runs/sweep-store';
import { storageLimitOf } from '../storage/quota';

const sweepParams = z.object({ sweepId: z.coerce.number().int().positive('sweepId must be a positive whole number') });

/** Sweeps: one or two scenario inputs varied over a range on one climate file, each point a run. */
export function sweepRoutes(deps: AppDeps): RouteSpec[] {
  const { db, runQueue } = deps;
  const sweepOf = (projectId: number, params: unknown) => sweepOr404(db, projectId, sweepParams.parse(params).sweepId);

  return [
    route('get', '/projects/:projectId/sweeps', access.viewer, (req, res) => {
      res.json({ sweeps: listSweeps(db, req.projectId!) });
    }),

    route('post', '/projects/:projectId/sweeps', access.engineer, (req, res) => {
      const spec = sweepSpecSchema.parse(req.body);
      res.status(202).json({ sweep: startSweep(db, runQueue, { projectId: req.projectId!, spec, storageLimitBytes: storageLimitOf(deps) }, req) });
    }),

    route('get', '/projects/:projectId/sweeps/:sweepId', access.viewer, (req, res) => {
      res.json({ sweep: sweepWithPoints(db, sweepOf(req.projectId!, req.params)) });
    }),

    // Stops the points still waiting or running and keeps the finished ones, so a sweep started too wide can be cut short.
    route('post', '/projects/:projectId/sweeps/:sweepId/cancel', access.engineer, (req, res) => {
      res.json({ cancelled: cancelSweep(db, runQueue, sweepOf(req.projectId!, req.params), req) });
    }),

    route('delete', '/projects/:projectId/sweeps/:sweepId', access.engineer, (req, res) => {
      deleteSweep(db, runQueue, sweepOf(req.projectId!, req.params), req);
      res.status(204).end();
    }),
  ];
}
