/**
 * The published weather formats the importer recognises without flags, each read by its own
 * reader into the same hourly series as any other file. The dispatcher in import-climate-text.ts
 * asks `readPublishedFormat` first; undefined means "not one of these", and the general
 * delimited-text path runs.
 */
// @ts-nocheck

import type { Context } from '../import-context';
import type { ClimateSeries, ImportOptions, RecognisedFormat } from '../types';
import { EPW_FORMAT, looksLikeEpw, readEpw } from './epw';
import { HEADER_BLOCK_CSV_FORMAT, looksLikeHeaderBlockCsv, readHeaderBlockCsv } from './header-block-csv';
import { looksLikeStationRecords, readStationRecords, STATION_RECORDS_FORMAT } from './station-records';

interface PublishedReader {
  format: RecognisedFormat;
  recognise: (text: string) => boolean;
  read: (text: string, options: ImportOptions, ctx: Context) => ClimateSeries | null;
}

export const PUBLISHED_READERS: PublishedReader[] = [
  { format: EPW_FORMAT, recognise: looksLikeEpw, read: (text, o, ctx) => readEpw(text, o.mapping ?? {}, ctx) },
  { format: HEADER_BLOCK_CSV_FORMAT, recognise: looksLikeHeaderBlockCsv, read: (text, o, ctx) => readHeaderBlockCsv(text, o.mapping ?? {}, ctx) },
  { format: STATION_RECORDS_FORMAT, recognise: looksLikeStationRecords, read: (text, o, ctx) => readStationRecords(text, o.mapping ?? {}, ctx) },
];

/** The series of a file in a published format (null when refused), or undefined when the text is none of them. */
export function readPublishedFormat(text: string, options: ImportOptions, ctx: Context): ClimateSeries | null | undefined {
  const reader = PUBLISHED_READERS.find((r) => r.recognise(text));
  if (!reader) return undefined;
  ctx.mapping.format = reader.format;
  ctx.log.info('format-recognised', `Recognised as ${reader.format.name}: ${reader.format.conventions.join('; ')}.`);
  const series = reader.read(text, options, ctx);
  if (options.timeZone !== undefined && options.timeZone !== ctx.timeZone && ctx.mapping.time) {
    ctx.log.info(
      'format-recognised',
      `${reader.format.name} times are read as the format states (${ctx.mapping.time.description}); the time zone asked for (${options.timeZone}) is not used for this file.`,
    );
  }
  return series;
}
