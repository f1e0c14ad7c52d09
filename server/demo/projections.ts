import { and, eq, isNull } from 'drizzle-orm';
import { standardOffsetMinutes } from '../../shared/climate';
import { zeroFactors, type ProjectionRequest } from '../../shared/morphing';
import { morphClimate } from '../../workers/morph-climate';
import { loadClimateSeries } from '../climate/store';
import type { Db } from '../db/client';
import { climateFiles, sites } from '../db/schema';
import { storeProjection } from '../projections/store';

/**
 * SYNTHETIC change factors for the demo only, not taken from any climate projection: a warmer decade with
 * summer maxima rising faster than minima, and a few percent more moisture.
 * ΔTmean, ΔTmax, ΔTmin in K and specific-humidity change in %, January to December.
 */
const demoFactors: [number, number, number, number][] = [
  [1.8, 1.6, 2.1, 4],
  [1.7, 1.5, 2.0, 4],
  [1.5, 1.6, 1.4, 3],
  [1.4, 1.7, 1.2, 3],
  [1.6, 2.0, 1.3, 2],
  [2.0, 2.6, 1.5, 2],
  [2.4, 3.1, 1.8, 1],
  [2.5, 3.2, 1.9, 1],
  [2.0, 2.4, 1.7, 2],
  [1.6, 1.8, 1.5, 3],
  [1.5, 1.4, 1.7, 4],
  [1.7, 1.5, 2.0, 4],
];

/**
 * One demo projection: the project's first uploaded climate file (or the one named) morphed by the synthetic
 * factors above, stored like one made in the app. Call after the demo seed, outside its transaction:
 * `seedDemoProjection(db, projectId, engineerId)`. Returns the new file's id, or null if there is no file.
 */
export function seedDemoProjection(db: Db, projectId: number, createdBy: number | null, parentName?: string): number | null {
  const parent = db
    .select()
    .from(climateFiles)
    .where(and(eq(climateFiles.projectId, projectId), isNull(climateFiles.derivationJson), parentName ? eq(climateFiles.name, parentName) : undefined))
    .orderBy(climateFiles.id)
    .get();
  if (!parent) return null;
  const site = db.select().from(sites).where(eq(sites.id, parent.siteId)).get()!;
  const series = loadClimateSeries(db, parent.id)!;
  const months = zeroFactors().map((m, i) => {
    const [deltaMeanK, deltaMaxK, deltaMinK, humidityChangePct] = demoFactors[i];
    return { ...m, deltaMeanK, deltaMaxK, deltaMinK, humidityChangePct };
  });
  const request: ProjectionRequest = {
    name: `${parent.name} — projection, warmer decade (synthetic factors)`,
    source: 'Synthetic demo factors, not from any climate projection',
    factors: { dryBulbMethod: 'shift-and-stretch', humidityMethod: 'stretch', months },
  };
  const utcOffsetMinutes = standardOffsetMinutes(site.timeZone);
  const morphed = morphClimate({ series, factors: request.factors, utcOffsetMinutes, elevationM: site.elevationM, keepSeries: true });
  if (!morphed.ok) throw new Error(`Demo projection refused: ${morphed.problems.join('; ')}`);
  return db.transaction((tx) => storeProjection(tx, { projectId, parent, request, morphed: { ...morphed, utcOffsetMinutes }, createdBy }).row.id);
}
