import { z } from 'zod';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';

const summariseRequest = z.object({
  values: z.array(z.number().nullable()).min(1, 'values must hold at least one number').max(1_000_000),
});

/** Summarises a column on the worker pool: min, max, mean and missing count (null marks a missing hour). */
export function seriesToolRoutes({ pool }: AppDeps): RouteSpec[] {
  return [
    route('post', '/series/summary', access.public, async (req, res) => {
      const { values } = summariseRequest.parse(req.body);
      const column = Float64Array.from(values, (v) => (v === null ? NaN : v));
      const summary = await pool.run('summarise', column, { transferList: [column.buffer] });
      res.json({ summary });
    }),
  ];
}
