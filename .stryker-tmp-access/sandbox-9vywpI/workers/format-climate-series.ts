// @ts-nocheck
import { cleanedSeriesCsv, decodeClimateSeries, seriesHoursJson, yearWindow, type EncodedClimateSeries } from '../shared/climate';

export interface FormatClimateSeriesInput {
  /** The stored column blobs, decoded here rather than on the server's main thread. */
  encoded: EncodedClimateSeries;
  /** `csv`: the cleaned hourly download; `hours-json`: the file page's hours (all, or one year). */
  format: 'csv' | 'hours-json';
  /** For `hours-json`: one calendar year on a clock `offsetMinutes` from UTC. */
  year?: { year: number; offsetMinutes: number };
}

const encoder = new TextEncoder();

/** Piscina task: a stored climate file's hourly CSV or hours JSON, as UTF-8 bytes. */
export function formatClimateSeries({ encoded, format, year }: FormatClimateSeriesInput): Uint8Array {
  const series = decodeClimateSeries(encoded);
  if (format === 'csv') return encoder.encode(cleanedSeriesCsv(series));
  const window = year ? yearWindow(series.timestampsMs, year.year, year.offsetMinutes) : { from: 0, to: series.timestampsMs.length };
  return encoder.encode(seriesHoursJson(series, window));
}
