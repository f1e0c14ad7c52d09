// @ts-nocheck
import { axisValues, SWEEP_INPUTS, type PreparedPoint, type SweepAxis } from '../../shared/sweep';
import type { Scenario } from '../../shared/scenario';
import type { Tx } from '../db/client';
import { runs, sweeps, type climateFiles, type sites } from '../db/schema';
import { newRunValues } from './new-run';

/** What sweeps.specJson holds: the base scenario as swept, the axes as asked with each axis's values, the file's names. */
export interface StoredSweepSpec {
  baseScenario: Scenario;
  axes: (SweepAxis & { values: (number | string)[] })[];
  climate: { name: string; siteName: string };
}

/**
 * Stores a checked sweep inside the caller's transaction: the sweep row and one queued run per point
 * (runs.sweepId, runs.sweepPointJson). The caller enqueues the runs after the transaction commits.
 */
export function insertSweep(
  tx: Tx,
  input: {
    projectId: number;
    name?: string;
    scenarioId: number;
    base: Scenario;
    axes: SweepAxis[];
    points: PreparedPoint[];
    file: typeof climateFiles.$inferSelect;
    site: typeof sites.$inferSelect;
    createdBy: number | null;
  },
) {
  const { projectId, base, axes, file, site, createdBy } = input;
  const spec: StoredSweepSpec = {
    baseScenario: base,
    axes: axes.map((axis) => ({ ...axis, values: axisValues(axis) })),
    climate: { name: file.name, siteName: site.name },
  };
  const name = (input.name || `${base.name} · ${axes.map((a) => SWEEP_INPUTS[a.input].short).join(' × ')}`).slice(0, 200);
  const sweep = tx
    .insert(sweeps)
    .values({ projectId, name, baseScenarioId: input.scenarioId, climateFileId: file.id, specJson: JSON.stringify(spec), createdBy })
    .returning()
    .get();
  const created = input.points.map((point) =>
    tx
      .insert(runs)
      .values({
        ...newRunValues({ projectId, scenarioId: input.scenarioId, scenarioJson: JSON.stringify(point.scenario), file, site, createdBy }),
        sweepId: sweep.id,
        sweepPointJson: JSON.stringify(point.values),
      })
      .returning()
      .get(),
  );
  return { sweep, created };
}
