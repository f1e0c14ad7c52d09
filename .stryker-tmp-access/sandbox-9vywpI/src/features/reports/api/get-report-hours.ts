// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { MODE_NAMES } from '../../../../shared/scenario/classify';
import type { HourlyJson } from '../../../../shared/report/hourly-json';
import { apiFetch } from '@/lib/api-client';

/** A run's hours as the report's charts read them: plain typed arrays, SI (humidity ratio in kg/kg). */
export interface ReportHours {
  timestampsMs: Float64Array;
  dryBulbC: Float64Array;
  humidityRatio: Float64Array;
  modes: Uint8Array;
  mechanicalFraction: Float64Array;
  humidified: Uint8Array | null;
}

const nan = (v: number | null) => (v === null ? Number.NaN : v);

/** The hourly JSON download (columns, one array each) as typed arrays. */
export function reportHoursOf(json: HourlyJson): ReportHours {
  const h = json.hours;
  const n = h.timestamp.length;
  const modeCode = new Map<string, number>(MODE_NAMES.map((name, code) => [name, code]));
  const humidified = h.humidified.some((v) => v !== null) ? Uint8Array.from(h.humidified, (v) => (v === 1 ? 1 : 0)) : null;
  return {
    timestampsMs: Float64Array.from(h.timestamp, (iso) => Date.parse(iso)),
    dryBulbC: Float64Array.from(h.dry_bulb_c, nan),
    humidityRatio: Float64Array.from(h.humidity_ratio_gkg, (g) => nan(g) / 1000),
    modes: Uint8Array.from({ length: n }, (_, i) => modeCode.get(h.mode[i]) ?? 3),
    mechanicalFraction: Float64Array.from(h.mechanical_fraction, (v) => (v === null ? 0 : v)),
    humidified,
  };
}

/**
 * The hours of the report's run from its downloads (`base` is the report's download address, for a member or a
 * share link alike). Until the run page's binary hourly columns reach the reports, this reads the hourly JSON.
 */
export const reportHoursQueryOptions = (base: string, runId: number) =>
  queryOptions({
    queryKey: ['report-hours', base, runId],
    queryFn: async () => reportHoursOf(await apiFetch<HourlyJson>(`${base.replace(/^\/api/, '')}/hourly.json?run=${runId}`)),
    staleTime: Infinity,
    retry: false,
  });

export const useReportHours = (base: string, runId: number) => useQuery(reportHoursQueryOptions(base, runId));
