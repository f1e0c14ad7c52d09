import { and, eq } from 'drizzle-orm';
import {
  comparisonCsv,
  comparisonRows,
  runSummaryRows,
  summaryCsv,
  summaryRowsIn,
  type ReportData,
  type ReportRun,
  type SummaryUnits,
} from '../../shared/report';
import type { WorkerPool } from '../../workers/pool';
import type { Db } from '../db/client';
import { runs } from '../db/schema';
import { HttpError } from '../http-error';
import { hourlyFileOf } from './hourly-results';

export type ReportFile = 'hourly.csv' | 'hourly.json' | 'summary.csv' | 'summary.json';

/** A file to send: its name for the attachment, its type and its bytes or text. */
export interface Download {
  fileName: string;
  type: string;
  body: Buffer | string;
}

/** Lower-case ASCII words joined by hyphens, for file names that survive every system. */
export function fileSlug(text: string): string {
  const slug = text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/ß/g, 'ss')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
    .replace(/-+$/, '');
  return slug || 'report';
}

const runFileName = (run: ReportRun, what: string, ext: string) => `run-${run.id}-${fileSlug(run.scenario.name)}-${what}.${ext}`;

/**
 * One download of a report: the hourly results of one of its runs (`runId`, the first when absent; made on the
 * pool's interactive lane, stopped when `signal` aborts; always SI, as the command line writes them), or its summary
 * in the units asked for.
 */
export async function reportDownload(
  { db, pool }: { db: Db; pool: WorkerPool },
  projectId: number,
  report: ReportData,
  file: ReportFile,
  units: SummaryUnits,
  signal: AbortSignal,
  runId?: number,
): Promise<Download> {
  const suffix = units === 'IP' ? '-ip' : '';
  const reportRuns = report.kind === 'run' ? [report.run] : report.runs;
  if (file === 'hourly.csv' || file === 'hourly.json') {
    const run = reportRuns.find((r) => r.id === (runId ?? reportRuns[0].id));
    if (!run) throw new HttpError(404, 'not_found', `Run ${runId} is not part of this report.`);
    const row = db
      .select()
      .from(runs)
      .where(and(eq(runs.id, run.id), eq(runs.projectId, projectId)))
      .get();
    if (!row) throw new HttpError(404, 'not_found', `Run ${run.id} was not found in this project.`);
    if (file === 'hourly.json') {
      const about = { id: run.id, scenario: run.scenario.name, site: run.site.name, climateFile: run.climate.name };
      const body = await hourlyFileOf(db, pool, row, 'json', about, signal);
      return { fileName: runFileName(run, 'hourly', 'json'), type: 'application/json', body };
    }
    const body = await hourlyFileOf(db, pool, row, 'csv', undefined, signal);
    return { fileName: runFileName(run, 'hourly', 'csv'), type: 'text/csv; charset=utf-8', body };
  }
  if (report.kind === 'run') {
    const run = report.run;
    const rows = summaryRowsIn(runSummaryRows(run), units);
    if (file === 'summary.csv') return { fileName: runFileName(run, `summary${suffix}`, 'csv'), type: 'text/csv; charset=utf-8', body: summaryCsv(rows) };
    // The report data itself stays in SI, as the engine computed it; the rows are in the units asked for.
    return {
      fileName: runFileName(run, `summary${suffix}`, 'json'),
      type: 'application/json',
      body: JSON.stringify({ report, units, summary: rows }, null, 1),
    };
  }
  const name = `comparison-${report.runs.map((r) => r.id).join('-')}-summary${suffix}`;
  if (file === 'summary.csv') return { fileName: `${name}.csv`, type: 'text/csv; charset=utf-8', body: comparisonCsv(report.runs, report.baselineId, units) };
  return {
    fileName: `${name}.json`,
    type: 'application/json',
    body: JSON.stringify({ report, units, table: comparisonRows(report.runs, report.baselineId, units) }, null, 1),
  };
}
