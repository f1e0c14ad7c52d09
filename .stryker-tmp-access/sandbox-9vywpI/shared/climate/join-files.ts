/**
 * Several files, one climate file: the imports of files uploaded together (thirty yearly station
 * files, twelve monthly ones) joined in time order into one hourly series, with one report that lists
 * each file. Each file is imported on its own first (importClimateText, in parallel on the pool);
 * this module only checks that they share a layout and joins them.
 *
 * Rules (each reported with the file's name and line):
 *  - every file must be importable and read with the same layout (delimiter, time layout, the same
 *    columns in the same units): a file that differs refuses the set, by name;
 *  - hours that two files both hold are kept from the earlier file, the later file's repeats left out
 *    (a warning says whether the values agree); a file whose hours all repeat another's refuses the set;
 *  - hours between two files are a gap: filled by linear interpolation up to maxGapHours, else missing;
 *  - the joined series obeys the single-file rules (span at most 100 years, at least half measured).
 */
// @ts-nocheck

import { interpolate } from './hourly-grid';
import { MAX_SERIES_HOURS, MIN_MEASURED_SHARE, emptyCounts, emptyMapping, percent } from './import-context';
import { IssueLog } from './issue-log';
import { importPeriodWords } from './import-period';
import { formatUtc, MS_PER_HOUR } from './time-cells';
import { HOUR_FLAG, type ClimateSeries, type DetectedMapping, type FileInSet, type ImportCounts, type ImportResult } from './types';

export interface FileImport {
  fileName: string;
  bytes: number;
  sha256: string;
  result: ImportResult;
}

/** What must agree between the files of a set, in words, for the message naming a file that differs. */
function layoutOf(m: DetectedMapping): Record<string, string> {
  const column = (a: { column: number; unit: string; quantity?: string } | null) => (a ? `${a.quantity ?? ''} column ${a.column + 1} in ${a.unit}` : 'none');
  const t = m.time;
  return {
    delimiter: JSON.stringify(m.delimiter),
    'decimal separator': JSON.stringify(m.decimalSeparator),
    'time layout': t ? `${t.layout}${t.layout === 'ymdh' ? ` (${t.hourConvention})` : ''}` : 'none',
    'dry-bulb': column(m.dryBulb),
    humidity: column(m.humidity),
    pressure: column(m.pressure),
  };
}

const utc = (ms: number) => formatUtc(ms).slice(0, 16).replace('T', ' ');

/** Joins the imports of a set (any order) into one result; never throws. */
export function joinClimateFiles(files: FileImport[], maxGapHours: number, siteTimeZone?: string): ImportResult & { report: { files: FileInSet[] } } {
  const log = new IssueLog(true);
  const counts: ImportCounts = emptyCounts();
  const fileReports: FileInSet[] = files.map((f) => ({
    fileName: f.fileName,
    bytes: f.bytes,
    sha256: f.sha256,
    ok: f.result.ok,
    summary: f.result.report.summary,
    firstTimestamp: f.result.report.firstTimestamp,
    lastTimestamp: f.result.report.lastTimestamp,
    hours: f.result.series?.timestampsMs.length ?? 0,
    firstLine: f.result.hourLines?.[0] || null,
    lastLine: f.result.hourLines?.[f.result.hourLines.length - 1] || null,
    errors: f.result.report.issues.filter((i) => i.severity === 'error').length,
    warnings: f.result.report.issues.filter((i) => i.severity === 'warning').length,
  }));
  // each file's own issues, named by file
  for (const f of files) {
    for (const issue of f.result.report.issues) log.list({ ...issue, file: f.fileName });
    log.notListed += f.result.report.counts.issuesNotListed;
    if (f.result.issueList) log.adoptRows(f.result.issueList.rows, f.result.issueList.notWritten, f.fileName);
  }
  for (const f of files) {
    for (const key of Object.keys(counts) as (keyof ImportCounts)[]) {
      if (key === 'hours' || key === 'measuredHours' || key === 'filledHours' || key === 'missingHours' || key === 'gaps' || key === 'longestGapHours')
        continue;
      counts[key] += f.result.report.counts[key];
    }
  }
  const first = files[0];
  const fail = (): ImportResult & { report: { files: FileInSet[] } } => finishSet(files, fileReports, log, counts, maxGapHours, null, siteTimeZone);
  if (!first) {
    log.error('empty-input', 'No file was sent.');
    return fail();
  }
  const refused = files.filter((f) => !f.result.ok || !f.result.series);
  for (const f of refused) {
    log.error('too-little-data', `${f.fileName} could not be imported: ${f.result.report.summary.replace(/^Not imported: /, '')}`, { file: f.fileName });
  }
  if (refused.length > 0) return fail();

  const reference = layoutOf(first.result.mapping);
  for (const f of files.slice(1)) {
    const layout = layoutOf(f.result.mapping);
    const differs = Object.keys(reference).filter((k) => reference[k] !== layout[k]);
    if (differs.length > 0) {
      log.error(
        'files-layout-differs',
        `${f.fileName} is laid out differently from ${first.fileName} (${differs.map((k) => `${k}: ${layout[k]} instead of ${reference[k]}`).join('; ')}); the files of a set must share one layout.`,
        { file: f.fileName, line: f.result.mapping.headerLine ?? undefined },
      );
    }
  }
  if (log.hasErrors()) return fail();

  const ordered = [...files].sort((a, b) => a.result.series!.timestampsMs[0] - b.result.series!.timestampsMs[0]);
  // the report lists the files in time order
  fileReports.splice(0, fileReports.length, ...ordered.map((f) => fileReports[files.indexOf(f)]));
  const startMs = ordered[0].result.series!.timestampsMs[0];
  let endMs = startMs;
  for (const f of ordered) endMs = Math.max(endMs, f.result.series!.timestampsMs[f.result.series!.timestampsMs.length - 1]);
  const hours = Math.round((endMs - startMs) / MS_PER_HOUR) + 1;
  if (hours > MAX_SERIES_HOURS) {
    log.error('span-too-long', `The files span ${Math.round(hours / 8766)} years (${utc(startMs)} to ${utc(endMs)}); a garbled date is likely.`);
    return fail();
  }
  const kind = first.result.series!.humidity.kind;
  const withPressure = ordered.every((f) => f.result.series!.pressurePa !== null);
  if (!withPressure && ordered.some((f) => f.result.series!.pressurePa !== null)) {
    log.warning('pressure-ignored', 'Some files of the set have no usable pressure column; pressure for the whole set will come from the site elevation.');
  }
  const series: ClimateSeries = {
    timestampsMs: new Float64Array(hours),
    dryBulbC: new Float64Array(hours).fill(NaN),
    humidity: { kind, values: new Float64Array(hours).fill(NaN) },
    pressurePa: withPressure ? new Float64Array(hours).fill(NaN) : null,
    flags: new Uint8Array(hours).fill(HOUR_FLAG.missing),
  };
  for (let h = 0; h < hours; h++) series.timestampsMs[h] = startMs + h * MS_PER_HOUR;

  let coveredUntil = -1; // last hour index written
  let previous: FileImport | null = null;
  for (const f of ordered) {
    const s = f.result.series!;
    const lines = f.result.hourLines ?? null;
    const offset = Math.round((s.timestampsMs[0] - startMs) / MS_PER_HOUR);
    const n = s.timestampsMs.length;
    const lastIndex = offset + n - 1;
    if (previous && lastIndex <= coveredUntil) {
      log.error(
        'files-overlap',
        `${f.fileName} holds only hours that ${previous.fileName} already holds (${utc(s.timestampsMs[0])} to ${utc(s.timestampsMs[n - 1])}); is it the same file twice?`,
        {
          file: f.fileName,
          line: lines?.[0] || undefined,
        },
      );
      continue;
    }
    let from = 0;
    if (previous && offset <= coveredUntil) {
      from = coveredUntil - offset + 1;
      let same = true;
      for (let k = 0; k < from && same; k++) {
        const h = offset + k;
        same = sameValue(series.dryBulbC[h], s.dryBulbC[k]) && sameValue(series.humidity.values[h], s.humidity.values[k]);
      }
      const prevLines = previous.result.hourLines ?? null;
      const prevIndex = offset - Math.round((previous.result.series!.timestampsMs[0] - startMs) / MS_PER_HOUR);
      log.warning(
        'files-overlap',
        `${f.fileName} lines ${lines?.[0] || '?'}–${lines?.[from - 1] || '?'} (${utc(s.timestampsMs[0])} to ${utc(s.timestampsMs[from - 1])}) repeat ${from} hour${from === 1 ? '' : 's'} of ${previous.fileName} (from line ${prevLines?.[prevIndex] || '?'})${same ? ' with the same values' : ' with different values'}; the earlier file's hours are kept.`,
        { file: f.fileName, line: lines?.[0] || undefined },
      );
      counts.duplicateTimestamps += from;
    } else if (previous && offset > coveredUntil + 1) {
      const gapHours = offset - coveredUntil - 1;
      const prevLines = previous.result.hourLines ?? null;
      const filled = gapHours <= maxGapHours;
      log.warning(
        'files-gap',
        `${gapHours} hour${gapHours === 1 ? '' : 's'} between ${previous.fileName} (ends ${utc(series.timestampsMs[coveredUntil])}, line ${prevLines?.[prevLines.length - 1] || '?'}) and ${f.fileName} (starts ${utc(s.timestampsMs[0])}, line ${lines?.[0] || '?'}) ${filled ? 'filled by linear interpolation' : `have no data and stay missing (longer than ${maxGapHours} h)`}.`,
        { file: f.fileName, line: lines?.[0] || undefined },
      );
    }
    series.dryBulbC.set(s.dryBulbC.subarray(from), offset + from);
    series.humidity.values.set(s.humidity.values.subarray(from), offset + from);
    if (series.pressurePa && s.pressurePa) series.pressurePa.set(s.pressurePa.subarray(from), offset + from);
    series.flags.set(s.flags.subarray(from), offset + from);
    if (previous && offset > coveredUntil + 1 && offset - coveredUntil - 1 <= maxGapHours) {
      const before = coveredUntil;
      const after = offset;
      interpolate(series.dryBulbC, before, after);
      interpolate(series.humidity.values, before, after);
      if (series.pressurePa) interpolate(series.pressurePa, before, after);
      series.flags.fill(HOUR_FLAG.filled, before + 1, after);
    }
    coveredUntil = Math.max(coveredUntil, lastIndex);
    previous = f;
  }
  if (log.hasErrors()) return fail();
  return finishSet(ordered, fileReports, log, counts, maxGapHours, series, siteTimeZone);
}

function sameValue(a: number, b: number): boolean {
  return a === b || (a !== a && b !== b) || Math.abs(a - b) < 1e-9;
}

function finishSet(
  files: FileImport[],
  fileReports: FileInSet[],
  log: IssueLog,
  counts: ImportCounts,
  maxGapHours: number,
  series: ClimateSeries | null,
  siteTimeZone: string | undefined,
): ImportResult & { report: { files: FileInSet[] } } {
  if (series) {
    const n = series.flags.length;
    let filled = 0;
    let missing = 0;
    let gaps = 0;
    let longest = 0;
    let run = 0;
    for (let h = 0; h < n; h++) {
      const flag = series.flags[h];
      if (flag === HOUR_FLAG.filled) filled++;
      else if (flag === HOUR_FLAG.missing) missing++;
      if (flag !== HOUR_FLAG.measured) {
        if (run === 0) gaps++;
        run++;
        if (run > longest) longest = run;
      } else run = 0;
    }
    Object.assign(counts, { hours: n, filledHours: filled, missingHours: missing, measuredHours: n - filled - missing, gaps, longestGapHours: longest });
    if (counts.measuredHours < MIN_MEASURED_SHARE * n) {
      log.error(
        'too-little-data',
        `Only ${counts.measuredHours} of ${n} hours (${percent(counts.measuredHours / n)}) of the set hold measured values; at least half are needed.`,
      );
    }
  }
  const ok = series !== null && !log.hasErrors();
  counts.issuesNotListed = log.notListed;
  const firstReport = files[0]?.result.report;
  const first = ok ? series!.timestampsMs[0] : NaN;
  const last = ok ? series!.timestampsMs[series!.timestampsMs.length - 1] : NaN;
  const years = new Set<number>();
  for (const f of files) if (f.result.ok) for (const y of f.result.report.years) years.add(y);
  const summary = ok
    ? `Imported ${counts.hours} hours from ${files.length} files, ${importPeriodWords(first, last, siteTimeZone)}: ${counts.measuredHours} measured, ${counts.filledHours} filled, ${counts.missingHours} missing.`
    : `Not imported: ${log.firstError()?.message ?? 'no usable data.'}`;
  return {
    ok,
    series: ok ? series : null,
    mapping: files[0]?.result.mapping ?? emptyMapping(),
    hourLines: null,
    issueList: { rows: log.rows, notWritten: log.notWritten, ofSet: true },
    report: {
      ok,
      summary,
      timeLayout: firstReport?.timeLayout ?? null,
      stepMinutes: firstReport?.stepMinutes ?? null,
      firstTimestamp: ok ? new Date(first).toISOString() : null,
      lastTimestamp: ok ? new Date(last).toISOString() : null,
      years: ok ? [...years].sort((a, b) => a - b) : [],
      maxGapHours,
      timeZone: firstReport?.timeZone ?? 'UTC',
      // One reading for the whole set: the same import options were applied to every file.
      humidityOverIce: firstReport?.humidityOverIce === true,
      counts,
      issues: log.issues,
      files: fileReports,
    },
  };
}
