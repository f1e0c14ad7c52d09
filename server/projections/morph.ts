import { standardOffsetMinutes, type ClimateSeries } from '../../shared/climate';
import type { ChangeFactors } from '../../shared/morphing';
import type { MorphClimateTaskResult } from '../../workers/morph-climate';
import type { WorkerPool } from '../../workers/pool';
import { HttpError } from '../http-error';
import type { MorphedSeries } from './store';

/**
 * Morphs a parent file's series by Belcher's method on the pool: a preview (no series kept) in its interactive lane,
 * a projection to store in the long one; stopped when `signal` aborts. Refusals (a daily range turned upside down)
 * come back as 422 naming the month.
 */
export async function morphOnPool(
  pool: WorkerPool,
  input: { series: ClimateSeries; site: { timeZone: string; elevationM: number }; factors: ChangeFactors; keepSeries: boolean },
  signal: AbortSignal,
): Promise<MorphedSeries> {
  const { series, site, factors, keepSeries } = input;
  const utcOffsetMinutes = standardOffsetMinutes(site.timeZone);
  const result: MorphClimateTaskResult = await pool.run(
    'morphClimate',
    { series, factors, utcOffsetMinutes, elevationM: site.elevationM, keepSeries },
    { lane: keepSeries ? 'long' : 'interactive', signal },
  );
  if (!result.ok) {
    throw new HttpError(422, 'invalid_factors', `The change factors do not fit this file: ${result.problems.join('; ')}.`, { problems: result.problems });
  }
  return { ...result, utcOffsetMinutes };
}
