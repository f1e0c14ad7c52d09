// @ts-nocheck
import { gzipSync } from 'node:zlib';
import type { HourColumnName } from '../shared/report/hour-columns';
import { runHourColumns, type RunHourInput } from '../shared/report/run-hour-columns';

export interface HourColumnsInput extends RunHourInput {
  columns: HourColumnName[];
  /** Width of the dry-bulb bins to put in the header, K; none when absent. */
  binWidthK?: number;
  /** Where the bins' grid is anchored, °C (a bin edge); 0 when absent. */
  binOriginC?: number;
  /** Compress here, off the server's main thread, when the caller accepts gzip. */
  gzip: boolean;
}

/**
 * Piscina task: a finished run's hour columns as one binary message (shared/report/hour-columns.ts), gzipped when
 * asked. The outdoor states are computed here from the climate series, as the run computed them.
 */
export function hourColumns({ columns, gzip, binWidthK, binOriginC, ...input }: HourColumnsInput): Uint8Array {
  const message = runHourColumns(input, columns, { binWidthK, binOriginC });
  // Level 4: the float columns shrink little further at higher levels and cost more time.
  return gzip ? gzipSync(message, { level: 4 }) : message;
}
