// @ts-nocheck
import { ENGINE_VERSION } from '../../shared/scenario';
import { standardOffsetMinutes } from '../../shared/climate';
import type { ImportReport } from '../../shared/climate';
import type { climateFiles, runs, sites } from '../db/schema';

/**
 * The row of a new queued run: the scenario as it is now and a snapshot of the climate file and
 * its site, so the run stays what it was whatever is edited or deleted later.
 */
export function newRunValues(input: {
  projectId: number;
  scenarioId: number;
  scenarioJson: string;
  file: typeof climateFiles.$inferSelect;
  site: typeof sites.$inferSelect;
  createdBy: number | null;
}): typeof runs.$inferInsert {
  const { file, site } = input;
  return {
    projectId: input.projectId,
    scenarioId: input.scenarioId,
    climateFileId: file.id,
    scenarioJson: input.scenarioJson,
    climateJson: JSON.stringify({
      id: file.id,
      name: file.name,
      sha256: file.sha256,
      hours: file.hours,
      firstHourMs: file.firstHourMs,
      lastHourMs: file.lastHourMs,
      site: { id: site.id, name: site.name, elevationM: site.elevationM, timeZone: site.timeZone },
      elevationM: site.elevationM,
      utcOffsetMinutes: standardOffsetMinutes(site.timeZone),
      // How the file's humidity was read (an import option); shown with the run's inputs.
      humidityOverIce: (JSON.parse(file.reportJson) as Partial<ImportReport>).humidityOverIce === true,
    }),
    engineVersion: ENGINE_VERSION,
    createdBy: input.createdBy,
  };
}
