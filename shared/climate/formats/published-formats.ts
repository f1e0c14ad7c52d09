/**
 * The published weather formats the importer recognises without flags, each read by its own
 * reader into the same hourly series as any other file. The dispatcher in import-climate-text.ts
 * asks `readPublishedFormat` first; undefined means "not one of these", and the general
 * delimited-text path runs.
 */
import type { Context } from '../import-context';
import type { ClimateSeries, ImportOptions, RecognisedFormat } from '../types';
import { EPW_FORMAT, looksLikeEpw, readEpw } from './epw';

interface PublishedReader {
  format: RecognisedFormat;
  recognise: (text: string) => boolean;
  read: (text: string, options: ImportOptions, ctx: Context) => ClimateSeries | null;
}

export const PUBLISHED_READERS: PublishedReader[] = [
  { format: EPW_FORMAT, recognise: looksLikeEpw, read: (text, o, ctx) => readEpw(text, o.mapping ?? {}, o.timeZone, ctx) },
];

/** The series of a file in a published format (null when refused), or undefined when the text is none of them. */
export function readPublishedFormat(text: string, options: ImportOptions, ctx: Context): ClimateSeries | null | undefined {
  const reader = PUBLISHED_READERS.find((r) => r.recognise(text));
  if (!reader) return undefined;
  ctx.mapping.format = reader.format;
  ctx.log.info('format-recognised', `Recognised as ${reader.format.name}: ${reader.format.conventions.join('; ')}.`);
  return reader.read(text, options, ctx);
}
