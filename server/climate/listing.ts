import type { ImportReport } from '../../shared/climate';
import type { climateFiles } from '../db/schema';

/**
 * A file as lists show it: no mapping or report, but the calendar years it covers on its own clock, and for a
 * future-climate projection (parentId, derivationJson) a short note of what it was made from.
 */
export function listing(file: typeof climateFiles.$inferSelect, siteName: string) {
  const { mappingJson: _m, reportJson, derivationJson, ...rest } = file;
  const { years } = JSON.parse(reportJson) as ImportReport;
  return { ...rest, siteName, years, projection: derivationJson ? projectionNote(derivationJson) : null };
}

/** What a list says of a projection: its method and the parent's name (kept after the parent is deleted). */
function projectionNote(derivationJson: string): { method: string; parentName: string } {
  const d = JSON.parse(derivationJson) as { method?: string; parent?: { name?: string } };
  return { method: d.method ?? 'projection', parentName: d.parent?.name ?? 'an earlier file' };
}
