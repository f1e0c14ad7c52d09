import { cleanedSeriesCsv, decodeClimateSeries, seriesHoursJson, type EncodedClimateSeries } from '../shared/climate';

export interface FormatClimateSeriesInput {
  /** The stored column blobs, decoded here rather than on the server's main thread. */
  encoded: EncodedClimateSeries;
  /** `csv`: the cleaned hourly download; `hours-json`: the file page's hours. */
  format: 'csv' | 'hours-json';
}

const encoder = new TextEncoder();

/** Piscina task: a stored climate file's hourly CSV or hours JSON, as UTF-8 bytes. */
export function formatClimateSeries({ encoded, format }: FormatClimateSeriesInput): Uint8Array {
  const series = decodeClimateSeries(encoded);
  return encoder.encode(format === 'csv' ? cleanedSeriesCsv(series) : seriesHoursJson(series));
}
