/** The mapping as returned to the caller, and what the report says about it. */
// @ts-nocheck

import type { ParsedRows } from './delimited-text';
import type { Context } from './import-context';
import type { Recognition } from './recognise-columns';
import type { Layout } from './table-layout';

export function buildMapping(parsed: ParsedRows, layout: Layout, recognition: Recognition, ctx: Context): void {
  const m = ctx.mapping;
  m.headerLine = layout.hasHeader ? parsed.lineOf(layout.headerIndex) : null;
  m.headers = layout.headers;
  m.time = recognition.time;
  m.dryBulb = recognition.dryBulb;
  m.humidity = recognition.humidity;
  m.pressure = recognition.pressure;
  m.confidence = Math.min(m.time?.confidence ?? 0, m.dryBulb?.confidence ?? 0, m.humidity?.confidence ?? 0);
}

export function reportMapping(recognition: Recognition, layout: Layout, ctx: Context): void {
  const { log } = ctx;
  if (!recognition.time) {
    log.error(
      'missing-time',
      'No time columns were recognised: expected one date-time column, a date and a time column, or year, month, day and hour columns.',
    );
  }
  if (!recognition.dryBulb) log.error('missing-dry-bulb', 'No dry-bulb temperature column was recognised.');
  if (!recognition.humidity) {
    log.error('missing-humidity', 'No humidity column was recognised (relative humidity, dew point, wet-bulb or humidity ratio).');
  }
  for (const a of recognition.assumedUnits) {
    log.warning('unit-assumed', `Column "${a.header}" has no unit in its header: ${a.reason.split('; ').pop()}.`, {
      column: a.header,
      value: a.unit,
    });
  }
  for (const a of recognition.otherHumidity) {
    if (recognition.humidity && a.column !== recognition.humidity.column) {
      log.info('other-humidity-ignored', `Column "${a.header}" (${a.quantity}) is not used: one humidity measure is kept, "${recognition.humidity.header}".`, {
        column: a.header,
      });
    }
  }
  const used = new Set<number>();
  const t = recognition.time;
  if (t?.layout === 'iso') used.add(t.column);
  if (t?.layout === 'date-time') [t.dateColumn, t.timeColumn].forEach((c) => used.add(c));
  if (t?.layout === 'ymdh') [t.year, t.month, t.day, t.hour, t.minute ?? -1].forEach((c) => used.add(c));
  for (const a of [recognition.dryBulb, recognition.humidity, recognition.pressure, ...recognition.otherHumidity]) if (a) used.add(a.column);
  if (layout.hasHeader) {
    layout.headers.forEach((h, i) => {
      if (!used.has(i) && h !== '') log.info('unrecognised-column', `Column "${h}" is not used.`, { column: h });
    });
  }
}
