import { eq } from 'drizzle-orm';
import { cleanedSeriesCsv, importClimateText, type ClimateSeries, type ImportReport } from '../../shared/climate';
import { MORPHING_CITATION, type Derivation, type ProjectionRequest } from '../../shared/morphing';
import type { MorphClimateTaskResult } from '../../workers/morph-climate';
import { recordRequestAudit, type Actor } from '../auth/audit';
import { saveClimateFile } from '../climate/store';
import type { Db, DbOrTx } from '../db/client';
import { climateFiles } from '../db/schema';
import { climateFileBytes, requireStorage } from '../storage/quota';

export const PROJECTION_METHOD = 'Belcher, Hacker and Powell (2005) morphing';
export const PROJECTION_NOTE =
  'A projection: the parent file re-shaped by the stated monthly change factors. It is a what-if for design comparison, not a forecast of any year.';

export type MorphedSeries = Extract<MorphClimateTaskResult, { ok: true }> & { utcOffsetMinutes: number };

/**
 * Stores a projection made in the app: within the project's storage limit (413 otherwise), with its audit line,
 * in one transaction.
 */
export function createProjection(
  db: Db,
  input: {
    projectId: number;
    storageLimitBytes: number;
    parent: typeof climateFiles.$inferSelect;
    request: ProjectionRequest;
    morphed: MorphedSeries;
    createdBy: number | null;
  },
  by: Actor,
): { row: typeof climateFiles.$inferSelect; derivation: Derivation } {
  const { projectId, parent, request, morphed: out } = input;
  return db.transaction((tx) => {
    // The projection stores its series and, as its original, the series as CSV (its few head lines left out here).
    const hours = out.series?.timestampsMs.length ?? 0;
    requireStorage(
      tx,
      projectId,
      input.storageLimitBytes,
      climateFileBytes(out.seriesCsv?.byteLength ?? 0, hours, Boolean(out.series?.pressurePa)),
      'the projection',
    );
    const stored = storeProjection(tx, { projectId, parent, request, morphed: out, createdBy: input.createdBy });
    recordRequestAudit(tx, by, 'climate.project', stored.row.name, {
      climateFileId: stored.row.id,
      parentId: parent.id,
      parentName: parent.name,
      method: PROJECTION_METHOD,
      dryBulbMethod: request.factors.dryBulbMethod,
      humidityMethod: request.factors.humidityMethod,
      clampedHighHours: out.clampedHighHours,
      clampedLowHours: out.clampedLowHours,
    });
    return stored;
  });
}

/**
 * Stores a morphed series as a projection: a climate file on the parent's site with its parentId and derivation,
 * and as its downloadable original the canonical CSV headed by what it is. Call inside a transaction.
 */
export function storeProjection(
  tx: DbOrTx,
  input: {
    projectId: number;
    parent: typeof climateFiles.$inferSelect;
    request: ProjectionRequest;
    morphed: MorphedSeries;
    createdBy: number | null;
  },
): { row: typeof climateFiles.$inferSelect; derivation: Derivation } {
  const { parent, request, morphed: out } = input;
  if (!out.series) throw new Error('storeProjection needs the morphed series (keepSeries: true)');
  // The name says it is a projection, so every list and picker that shows only names says so too.
  const name = projectionName(request.name ?? `${parent.name} — projection`);
  const derivation: Derivation = {
    kind: 'projection',
    method: PROJECTION_METHOD,
    citation: MORPHING_CITATION,
    note: PROJECTION_NOTE,
    humidityQuantity: 'specific humidity',
    parent: { id: parent.id, name: parent.name, sha256: parent.sha256, hours: parent.hours },
    source: request.source ?? null,
    factors: request.factors,
    utcOffsetMinutes: out.utcOffsetMinutes,
    alphaByMonth: out.alphaByMonth,
    clampedHighHours: out.clampedHighHours,
    clampedLowHours: out.clampedLowHours,
    lostHours: out.lostHours,
    comparison: { parent: out.parentMonthly, projection: out.projectionMonthly },
  };
  const csv = projectionCsv(out.seriesCsv ?? Buffer.from(cleanedSeriesCsv(out.series)), name, derivation);
  const report = projectionReport(JSON.parse(parent.reportJson) as ImportReport, out.series, derivation);
  // The mapping the importer reads from the CSV's head: what an upload of the download would be mapped as.
  const mapping = importClimateText(csv.subarray(0, 16_384).toString('utf8').split('\n', 60).join('\n'), { timeZone: 'UTC' }).mapping;
  const saved = saveClimateFile(tx, {
    projectId: input.projectId,
    siteId: parent.siteId,
    name,
    originalFileName: `${fileNameOf(name)}.csv`,
    bytes: csv,
    imported: { ok: true, series: out.series, report, mapping },
    createdBy: input.createdBy,
  });
  const link = { parentId: parent.id, derivationJson: JSON.stringify(derivation) };
  tx.update(climateFiles).set(link).where(eq(climateFiles.id, saved.id)).run();
  return { row: { ...saved, ...link }, derivation };
}

/** The name as given, with " (projection)" added unless it already says so. */
export function projectionName(name: string): string {
  return /projection/i.test(name) ? name : `${name} (projection)`;
}

/** A file name from a display name: letters, digits and dashes. */
function fileNameOf(name: string): string {
  return (
    name
      .normalize('NFKD')
      .replace(/[^\w.-]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 80) || 'projection'
  );
}

/**
 * The projection's downloadable "original": the series in the canonical columns (the same writer as the
 * hourly download), headed by comment lines saying what it is, so it can be uploaded again as it stands.
 */
function projectionCsv(seriesCsv: Uint8Array, name: string, d: Derivation): Buffer {
  const oneLine = (s: string) => s.replace(/[\r\n]+/g, ' ');
  const head = [
    `# ${oneLine(name)}: future-climate projection, not measured weather`,
    `# Made from "${oneLine(d.parent.name)}" by ${d.method}; dry-bulb by ${d.factors.dryBulbMethod}, specific humidity by ${d.factors.humidityMethod}`,
    `# ${d.citation}`,
    `# ${d.note}`,
  ];
  return Buffer.concat([Buffer.from(`${head.join('\n')}\n`), seriesCsv]);
}

/** The parent's validation report, restated for the projection (its line-level issues belong to the parent's file). */
function projectionReport(parent: ImportReport, series: ClimateSeries, d: Derivation): ImportReport {
  let measured = 0;
  let filled = 0;
  for (const f of series.flags) {
    if (f === 0) measured++;
    else if (f === 1) filled++;
  }
  const hours = series.flags.length;
  const bounded = d.clampedHighHours + d.clampedLowHours;
  return {
    ...parent,
    summary:
      `Projection of "${d.parent.name}" by ${d.method}: ${hours.toLocaleString('en')} hours, ` +
      `${(hours - measured - filled).toLocaleString('en')} without data; relative humidity bounded to 0–100 % in ${bounded.toLocaleString('en')} hours.`,
    counts: { ...parent.counts, hours, measuredHours: measured, filledHours: filled, missingHours: hours - measured - filled },
    issues: [],
    // The parent's series was stored over liquid water whatever its file said; the projection's RH is computed over water.
    humidityOverIce: false,
  };
}
