/**
 * The first hours of an upload as the importer read them, in SI and in the person's units, for the
 * mapping step. Pure: tested without a browser.
 */
// @ts-nocheck

import type { HumidityKind } from '../../../../shared/climate/types';
import { wallClockReader, wallClockText } from '../../../../shared/time-zone';
import { formatQuantity, unitOf, type QuantityKind } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';

export interface PreviewHourInput {
  timestampMs: number;
  dryBulbC: number | null;
  humidity: number | null;
  pressurePa: number | null;
  flag: number;
}

export interface PreviewColumn {
  key: 'dryBulb' | 'humidity' | 'pressure';
  label: string;
  /** Unit of the SI column and of the person's column. */
  siUnit: string;
  shownUnit: string;
}

export interface PreviewRow {
  /** ISO 8601 UTC, minutes precision. */
  timeUtc: string;
  /** The same instant on the site's clock (civil time, daylight saving included), as a file in local time writes it. */
  timeLocal: string;
  flag: 'measured' | 'filled' | 'missing';
  /** Per column: SI text and the person's text, without units ('–' when missing). */
  values: Record<PreviewColumn['key'], { si: string; shown: string }>;
}

const humidityLabel: Record<HumidityKind, string> = {
  'relative-humidity-pct': 'Relative humidity',
  'dew-point-c': 'Dew point',
  'wet-bulb-c': 'Wet-bulb',
  'humidity-ratio-kgkg': 'Humidity ratio',
};

/** Quantity kind of each humidity measure; RH is shown in % in both systems. */
function humidityQuantity(kind: HumidityKind): QuantityKind | 'percent' {
  if (kind === 'relative-humidity-pct') return 'percent';
  return kind === 'humidity-ratio-kgkg' ? 'humidityRatio' : 'temperature';
}

function show(kind: QuantityKind | 'percent', system: UnitSystem, si: number | null): string {
  if (kind === 'percent') return si === null || !Number.isFinite(si) ? '–' : si.toFixed(1);
  return formatQuantity(kind, system, si, false);
}

export function previewColumns(kind: HumidityKind, hasPressure: boolean, system: UnitSystem): PreviewColumn[] {
  const h = humidityQuantity(kind);
  const columns: PreviewColumn[] = [
    { key: 'dryBulb', label: 'Dry-bulb', siUnit: unitOf('temperature', 'SI'), shownUnit: unitOf('temperature', system) },
    {
      key: 'humidity',
      label: humidityLabel[kind],
      siUnit: h === 'percent' ? '%' : unitOf(h, 'SI'),
      shownUnit: h === 'percent' ? '%' : unitOf(h, system),
    },
  ];
  if (hasPressure) columns.push({ key: 'pressure', label: 'Pressure', siUnit: unitOf('pressure', 'SI'), shownUnit: unitOf('pressure', system) });
  return columns;
}

const flags = ['measured', 'filled', 'missing'] as const;

/** Each previewed hour in SI and in the person's unit system. */
export function previewRows(hours: PreviewHourInput[], kind: HumidityKind, system: UnitSystem, timeZone = 'UTC'): PreviewRow[] {
  const h = humidityQuantity(kind);
  // The shared reader takes IANA names and fixed offsets (UTC-07:00) alike; Intl alone refuses the latter.
  const local = wallClockReader(timeZone);
  return hours.map((hour) => ({
    timeUtc: new Date(hour.timestampMs).toISOString().slice(0, 16).replace('T', ' '),
    timeLocal: wallClockText(local(hour.timestampMs)),
    flag: flags[hour.flag] ?? 'missing',
    values: {
      dryBulb: { si: show('temperature', 'SI', hour.dryBulbC), shown: show('temperature', system, hour.dryBulbC) },
      humidity: { si: show(h, 'SI', hour.humidity), shown: show(h, system, hour.humidity) },
      pressure: { si: show('pressure', 'SI', hour.pressurePa), shown: show('pressure', system, hour.pressurePa) },
    },
  }));
}
