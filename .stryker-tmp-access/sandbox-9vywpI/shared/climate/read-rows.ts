/** Data rows → UTC times and SI values, with the checks each row gets. */
// @ts-nocheck

import { cellText, newRowCells, rowCellTexts, type ParsedRows, type RowCells } from './delimited-text';
import type { RowColumns } from './hourly-grid';
import { toHourlySeries } from './hourly-series';
import { percent, REJECT_SHARE, round, type Context } from './import-context';
import { utcOffsetLabel } from '../time-zone';
import { moveHourEndingToStart } from './hour-starts';
import { createLocalToUtc, type LocalToUtc } from './local-time';
import { classifyUnreadableCell, parseNumberAt } from './number-cells';
import { describeYmdh, unitOf } from './recognise-columns';
import { isBlankRow, isCommentRow, type Layout } from './table-layout';
import { civilDays, formatUtc, lastParse, MS_PER_DAY, MS_PER_MINUTE, parseDateCell, parseDateTimeAt, parseIntegerCell, parseTimeCell } from './time-cells';
import type { ClimateSeries, HumidityQuantity, QuantityAssignment, TimeMapping } from './types';
import { detectTypicalYear, intoYear, sourceYearByMonth } from './typical-year';
import { conversionToSi, type AffineConversion } from './units';
import { checkHumidity, DRY_BULB_MAX_C, DRY_BULB_MIN_C, humidityCheck, PRESSURE_MAX_PA, PRESSURE_MIN_PA } from './value-limits';

interface ValueReader {
  assignment: QuantityAssignment;
  conversion: AffineConversion;
  bad: number;
}

function reader(a: QuantityAssignment): ValueReader {
  return { assignment: a, conversion: conversionToSi(unitOf(a)), bad: 0 };
}

/** The heart of the import: rows → time and SI values, with per-row checks. */
export function readRows(
  parsed: ParsedRows,
  layout: Layout,
  time: TimeMapping,
  dryBulb: QuantityAssignment,
  humidity: QuantityAssignment,
  pressure: QuantityAssignment | null,
  ctx: Context,
  /** At least the number of data rows: the size of the columns. */
  dataRows: number,
): ClimateSeries | null {
  const { log, counts } = ctx;
  const decimalComma = ctx.mapping.decimalSeparator === ',';
  const headers = layout.headers;
  const dry = reader(dryBulb);
  const hum = reader(humidity);
  const pres = pressure ? reader(pressure) : null;
  const humidityQuantity = humidity.quantity as HumidityQuantity;
  const rows: RowColumns = {
    count: 0,
    timeMs: new Float64Array(dataRows),
    dryBulbC: new Float64Array(dataRows),
    humidity: new Float64Array(dataRows),
    pressurePa: pres ? new Float64Array(dataRows) : null,
    line: new Int32Array(dataRows),
    dropped: new Uint8Array(dataRows),
  };
  const localTimes = new Float64Array(dataRows);
  const zone: LocalToUtc | null = ctx.timeZone === 'UTC' ? null : createLocalToUtc(ctx.timeZone);
  const timeColumns =
    time.layout === 'iso' ? [time.column] : time.layout === 'date-time' ? [time.dateColumn, time.timeColumn] : [time.year, time.month, time.day, time.hour];
  const needed = Math.max(...timeColumns, dryBulb.column, humidity.column, pressure?.column ?? 0) + 1;
  const timeHeader = timeColumns.map((c) => headers[c]).join(' + ');
  let hourZero = false;
  let hour24 = false;
  let anyOffset = false;
  let previousOffset = NaN;
  let previousLine = 0;

  // Cells are read in place from the row's text; a cell's string is made only for a message.
  const row: RowCells = newRowCells();
  const cell = (column: number): string | undefined => cellText(row, column);
  const readValue = (r: ValueReader, column: number, line: number, min: number, max: number): number => {
    const raw = column < row.count ? parseNumberAt(row.text, row.starts[column], row.ends[column], decimalComma) : NaN;
    const header = r.assignment.header;
    if (raw !== raw) return unreadableValue(r, cell(column), line);
    const si = raw * r.conversion.scale + r.conversion.offset;
    if (si < min || si > max) {
      r.bad++;
      counts.impossibleValues++;
      const text = cell(column)?.trim();
      log.warning(
        'impossible-value',
        `${r.assignment.quantity} ${text} ${r.assignment.unit} in column "${header}" is outside the possible range; treated as missing.`,
        {
          line,
          column: header,
          value: text,
        },
      );
      return NaN;
    }
    return si;
  };
  const unreadableValue = (r: ValueReader, cell: string | undefined, line: number): number => {
    const header = r.assignment.header;
    counts.cellsUnreadable++;
    if (cell === undefined || classifyUnreadableCell(cell, decimalComma) === 'unreadable') {
      r.bad++;
      const text = (cell ?? '').trim();
      log.warning('unparsable-value', `"${text}" in column "${header}" is not a number; the value is treated as missing.`, {
        line,
        column: header,
        value: text,
      });
    } else {
      log.info('missing-value-marker', `Column "${header}" marks a missing value with "${cell.trim()}".`, { line, column: header, value: cell.trim() });
    }
    return NaN;
  };

  for (let r = layout.dataStart; r < parsed.count; r++) {
    parsed.rowCells(r, row);
    if (isBlankOrComment(row)) continue;
    counts.rows++;
    const line = parsed.lineOf(r);
    if (row.count < needed) {
      log.warning('wrong-field-count', `The row has ${row.count} fields where ${headers.length} were expected.`, {
        line,
        value: rowCellTexts(row).join(ctx.mapping.delimiter).slice(0, 120),
      });
    }

    // time of the row, in local ms, with the offset when the cell gives one
    let localMs = NaN;
    let offsetMinutes = NaN;
    if (time.layout === 'iso') {
      localMs = time.column < row.count ? parseDateTimeAt(row.text, row.starts[time.column], row.ends[time.column], time.dateOrder ?? 'YMD') : NaN;
      offsetMinutes = lastParse.offsetMinutes;
    } else if (time.layout === 'date-time') {
      const day = parseDateCell(cell(time.dateColumn) ?? '', time.dateOrder);
      const clock = parseTimeCell(cell(time.timeColumn) ?? '');
      localMs = day + clock;
      if (clock === 0) hourZero = true;
      else if (clock === MS_PER_DAY) hour24 = true;
    } else {
      const days = civilDays(parseIntegerCell(cell(time.year) ?? ''), parseIntegerCell(cell(time.month) ?? ''), parseIntegerCell(cell(time.day) ?? ''));
      // the hour cell may be a whole hour (13), hhmm (1300) or a clock time (13:00)
      const hourMs = parseTimeCell(cell(time.hour) ?? '');
      let minute = time.minute === null ? 0 : parseIntegerCell(cell(time.minute) ?? '');
      if (minute === 60) minute = 0; // some exports write minute 60 beside an hour-ending hour
      if (hourMs >= 0 && minute >= 0 && minute < 60) {
        localMs = days * MS_PER_DAY + hourMs + minute * MS_PER_MINUTE;
        if (hourMs === 0) hourZero = true;
        else if (hourMs === MS_PER_DAY) hour24 = true;
      }
    }
    if (localMs !== localMs) {
      counts.rowsRejected++;
      const cells = timeColumns.map((c) => (cell(c) ?? '').trim()).join(' ');
      log.warning('unparsable-time', `The time "${cells}" could not be read; the row is left out.`, { line, column: timeHeader, value: cells });
      continue;
    }
    let utcMs: number;
    if (offsetMinutes === offsetMinutes) {
      anyOffset = true;
      utcMs = localMs - offsetMinutes * MS_PER_MINUTE;
    } else if (zone) {
      utcMs = zone.toUtc(localMs);
      if (zone.lastEvent?.kind === 'nonexistent') {
        log.warning(
          'daylight-saving-jump',
          `Local time ${formatUtc(localMs).slice(0, 16).replace('T', ' ')} does not exist in ${ctx.timeZone} (clocks go forward); read with the offset before the change.`,
          {
            line,
            column: timeHeader,
          },
        );
      }
    } else {
      utcMs = localMs;
    }
    const offsetNow = localMs - utcMs;
    if (rows.count === 0) ctx.fileOffsetMs = offsetNow;
    if (previousOffset === previousOffset && offsetNow !== previousOffset) {
      counts.daylightSavingJumps++;
      log.info(
        'daylight-saving-jump',
        `The UTC offset changes from ${utcOffsetLabel(Math.round(previousOffset / MS_PER_MINUTE))} to ${utcOffsetLabel(Math.round(offsetNow / MS_PER_MINUTE))} between lines ${previousLine} and ${line}; times are converted to UTC, so the series stays continuous.`,
        {
          line,
          column: timeHeader,
        },
      );
    }
    previousOffset = offsetNow;
    previousLine = line;

    // values
    const d = readValue(dry, dryBulb.column, line, DRY_BULB_MIN_C, DRY_BULB_MAX_C);
    let w = readValue(hum, humidity.column, line, -Infinity, Infinity);
    if (w === w) {
      checkHumidity(humidityQuantity, w, d);
      if (humidityCheck.verdict === 'impossible') {
        hum.bad++;
        counts.impossibleValues++;
        const text = cell(humidity.column)!;
        log.warning('impossible-value', impossibleHumidityMessage(humidity, text, d), {
          line,
          column: humidity.header,
          value: text.trim(),
        });
        w = NaN;
      } else if (humidityCheck.verdict === 'clamped') {
        counts.clampedValues++;
        const text = cell(humidity.column)!.trim();
        log.info(
          'clamped-value',
          `${humidity.quantity} ${text} in column "${humidity.header}" is just past saturation; set to ${round(humidityCheck.value)} ${humidityQuantity === 'relative-humidity' ? '%' : '°C'}.`,
          {
            line,
            column: humidity.header,
            value: text,
          },
        );
        w = humidityCheck.value;
      }
    }
    const i = rows.count++;
    rows.timeMs[i] = utcMs;
    localTimes[i] = localMs;
    rows.dryBulbC[i] = d;
    rows.humidity[i] = w;
    if (rows.pressurePa && pres && pressure) rows.pressurePa[i] = readValue(pres, pressure.column, line, PRESSURE_MIN_PA, PRESSURE_MAX_PA);
    rows.line[i] = line;
  }

  if (time.layout === 'ymdh') {
    const convention = hour24 || !hourZero ? 'ending-1-24' : 'beginning-0-23';
    if (time.confidence < 1 || convention === time.hourConvention) {
      time.hourConvention = convention;
      time.description = describeYmdh(headers[time.hour], convention);
    }
    if (hourZero && hour24)
      log.warning('non-hourly-step', 'Hours run both 0 and 24: check whether the hour column is hour ending (1–24) or hour beginning (0–23).', {
        column: headers[time.hour],
      });
  } else if (time.layout === 'date-time' && hour24) {
    time.description += hourZero ? ' (times 00:00 and 24:00 both occur)' : ', 24:00 read as midnight at the end of the day';
  }

  ctx.hourEnding = (time.layout === 'ymdh' && time.hourConvention === 'ending-1-24') || (time.layout === 'date-time' && hour24 && !hourZero);
  moveHourEndingToStart(rows.timeMs, localTimes, rows.count, rows.line[0], ctx);
  checkRejectShares(dry, hum, pres, rows, ctx);
  if (pres && ctx.mapping.pressure === null) rows.pressurePa = null;
  const typical = detectTypicalYear(localTimes, rows.count);
  if (typical) {
    // same offset as read, so a zone's daylight saving is not re-applied in the new year
    for (let i = 0; i < rows.count; i++) rows.timeMs[i] = intoYear(localTimes[i], typical.year) - (localTimes[i] - rows.timeMs[i]);
    // local times already stand at their hour's start (moveHourEndingToStart above)
    ctx.typicalYear = { year: typical.year, sourceYearByMonth: sourceYearByMonth(localTimes, rows.count, false) };
    const from = typical.sourceYears[0];
    const to = typical.sourceYears[typical.sourceYears.length - 1];
    log.warning(
      'typical-year-restamped',
      `The file looks like a typical year: ${rows.count} hours taken from ${typical.sourceYears.length} different years (${from}–${to}), each calendar hour once. Every row is placed in ${typical.year} at its month, day and hour, so the series is one continuous year.`,
    );
  }
  if (log.hasErrors()) return null;
  return toHourlySeries(rows, humidityQuantity, ctx, !anyOffset && !zone);
}

/** isBlankRow || isCommentRow (table-layout.ts) of a row read in place; strings are made only for an unusual row. */
function isBlankOrComment(row: RowCells): boolean {
  if (row.count === 0) return true;
  const start = row.starts[0];
  const first = start < row.ends[0] ? row.text.charCodeAt(start) : -1;
  // several cells, the first starting with neither white space nor '#': data
  if (row.count > 1 && first !== -1 && first !== 32 && first !== 9 && first !== 35) return false;
  const cells = rowCellTexts(row);
  return isBlankRow(cells) || isCommentRow(cells);
}

function impossibleHumidityMessage(humidity: QuantityAssignment, cell: string, dryBulbC: number): string {
  const where = `${humidity.quantity} ${cell.trim()} ${humidity.unit} in column "${humidity.header}"`;
  if ((humidity.quantity === 'dew-point' || humidity.quantity === 'wet-bulb') && dryBulbC === dryBulbC) {
    return `${where} is above the dry-bulb of ${round(dryBulbC)} °C (or outside the possible range); treated as missing.`;
  }
  return `${where} is outside the possible range; treated as missing.`;
}

function checkRejectShares(dry: ValueReader, hum: ValueReader, pres: ValueReader | null, rows: RowColumns, ctx: Context): void {
  const { log, counts } = ctx;
  if (counts.rows > 0 && counts.rowsRejected / counts.rows > REJECT_SHARE) {
    log.error(
      'too-many-rejected',
      `${counts.rowsRejected} of ${counts.rows} rows (${percent(counts.rowsRejected / counts.rows)}) have a time that cannot be read: check the time columns and date order.`,
    );
  }
  if (rows.count === 0) {
    if (counts.rowsRejected === 0) log.error('too-little-data', 'No data row could be read.');
    return;
  }
  for (const r of [dry, hum]) {
    if (r.bad / rows.count > REJECT_SHARE) {
      log.error(
        'too-many-rejected',
        `${r.bad} of ${rows.count} cells (${percent(r.bad / rows.count)}) in column "${r.assignment.header}" are unreadable or impossible as ${r.assignment.quantity} in ${r.assignment.unit}: check the column and its unit.`,
        { column: r.assignment.header },
      );
    }
  }
  if (pres && pres.bad / rows.count > REJECT_SHARE) {
    log.warning(
      'pressure-ignored',
      `${percent(pres.bad / rows.count)} of the pressure cells in column "${pres.assignment.header}" are unreadable or impossible in ${pres.assignment.unit}; the column is ignored and pressure will come from the site elevation.`,
      { column: pres.assignment.header },
    );
    ctx.mapping.pressure = null;
  }
}

/** Sequence checks (order, duplicates, steps), hourly averaging and gap repair. */
