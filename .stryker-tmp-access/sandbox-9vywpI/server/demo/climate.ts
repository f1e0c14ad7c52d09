// @ts-nocheck
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { importClimateText } from '../../shared/climate';
import { parseScenario, withoutOwnElevation } from '../../shared/scenario';
import { saveClimateFile } from '../climate/store';
import type { Tx } from '../db/client';
import { runs, scenarios, sites } from '../db/schema';
import { appRoot } from '../paths';
import type { SampleSite } from '../../sample-weather/sample-site';
import { newRunValues } from '../runs/new-run';

const sampleFolder = path.join(appRoot, 'sample-weather');

const demoScenarioFiles = ['direct-air-a1.json', 'indirect-air-recommended.json', 'water-side-tower.json'];

/**
 * The synthetic sample weather of every invented site, imported through the same importer as an
 * upload, the three sample scenarios, and one queued run of each scenario on each site, which the run
 * queue picks up at start-up. Throws (and so rolls the whole seed back) if a sample file does not import.
 */
export function seedDemoClimate(tx: Tx, projectId: number, createdBy: number | null): void {
  const { sites: samples } = JSON.parse(readFileSync(path.join(sampleFolder, 'sites.json'), 'utf8')) as { sites: SampleSite[] };
  const files = samples.map((sample) => {
    const site = tx
      .insert(sites)
      .values({
        projectId,
        name: sample.name,
        latitude: sample.latitude,
        longitude: sample.longitude,
        elevationM: sample.elevationM,
        timeZone: sample.timeZone,
      })
      .returning()
      .get();
    const bytes = readFileSync(path.join(sampleFolder, sample.file));
    const imported = importClimateText(bytes.toString('utf8'), { timeZone: sample.importTimeZone });
    if (!imported.ok || !imported.series) throw new Error(`Sample weather ${sample.file} did not import: ${imported.report.summary}`);
    const file = saveClimateFile(tx, {
      projectId,
      siteId: site.id,
      name: `${sample.name} synthetic ${yearSpan(imported.report.years)}`,
      originalFileName: sample.file,
      bytes,
      imported: { ...imported, series: imported.series },
      createdBy,
    });
    return { file, site };
  });

  for (const scenarioFile of demoScenarioFiles) {
    const parsed = parseScenario(JSON.parse(readFileSync(path.join(sampleFolder, 'scenarios', scenarioFile), 'utf8')));
    if (!parsed.ok) throw new Error(`Sample scenario ${scenarioFile} is not valid: ${parsed.errors.join('; ')}`);
    const scenarioJson = JSON.stringify(withoutOwnElevation(parsed.scenario));
    const scenario = tx.insert(scenarios).values({ projectId, name: parsed.scenario.name, scenarioJson, createdBy }).returning().get();
    for (const { file, site } of files) {
      tx.insert(runs)
        .values(newRunValues({ projectId, scenarioId: scenario.id, scenarioJson, file, site, createdBy }))
        .run();
    }
  }
}

/** "2021–2023", or one year alone. */
function yearSpan(years: number[]): string {
  const first = years[0];
  const last = years[years.length - 1];
  return first === last ? String(first) : `${first}–${last}`;
}
