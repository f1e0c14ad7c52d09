/**
 * The mapping a person edits in the mapping step: the detected mapping with columns as indices,
 * each part replaceable, and its conversion to the override the upload API takes
 * (shared/schemas/climate-file.ts). Pure: tested without a browser.
 */
// @ts-nocheck

import type { DetectedMapping } from '../../../../shared/climate/types';
import { mappingOverrideSchema, type MappingOverride } from '../../../../shared/schemas/climate-file';

type Override = Required<MappingOverride>;
export type TimeDraft = Override['time'];
export type HumidityDraft = Override['humidity'];

export interface MappingDraft {
  delimiter: Override['delimiter'];
  decimalSeparator: Override['decimalSeparator'];
  time: TimeDraft | null;
  dryBulb: Override['dryBulb'] | null;
  humidity: HumidityDraft | null;
  pressure: Override['pressure'];
  /** The import option humidityOverIce: the file states RH or dew point below 0 °C over ice (not part of the column override). */
  humidityOverIce: boolean;
}

export function draftFromDetected(m: DetectedMapping): MappingDraft {
  let time: TimeDraft | null = null;
  if (m.time?.layout === 'iso') time = { layout: 'iso', column: m.time.column };
  else if (m.time?.layout === 'date-time') {
    time = { layout: 'date-time', dateColumn: m.time.dateColumn, timeColumn: m.time.timeColumn, dateOrder: m.time.dateOrder };
  } else if (m.time?.layout === 'ymdh') {
    const t = m.time;
    time = { layout: 'ymdh', year: t.year, month: t.month, day: t.day, hour: t.hour, minute: t.minute, hourConvention: t.hourConvention };
  }
  const h = m.humidity;
  const humidity: HumidityDraft | null =
    h && h.quantity !== 'dry-bulb' && h.quantity !== 'pressure' ? ({ column: h.column, quantity: h.quantity, unit: h.unit } as HumidityDraft) : null;
  return {
    delimiter: m.delimiter,
    decimalSeparator: m.decimalSeparator,
    time,
    dryBulb: m.dryBulb && m.dryBulb.quantity === 'dry-bulb' ? { column: m.dryBulb.column, unit: m.dryBulb.unit } : null,
    humidity,
    pressure: m.pressure && m.pressure.quantity === 'pressure' ? { column: m.pressure.column, unit: m.pressure.unit } : null,
    humidityOverIce: false,
  };
}

/** A time layout with every column set, starting from the draft's columns where it has them. */
export function timeDraftFor(layout: TimeDraft['layout'], fallbackColumn = 0): TimeDraft {
  if (layout === 'iso') return { layout, column: fallbackColumn };
  if (layout === 'date-time') return { layout, dateColumn: fallbackColumn, timeColumn: fallbackColumn + 1, dateOrder: 'YMD' };
  return {
    layout,
    year: fallbackColumn,
    month: fallbackColumn + 1,
    day: fallbackColumn + 2,
    hour: fallbackColumn + 3,
    minute: null,
    hourConvention: 'ending-1-24',
  };
}

/** First unit offered for each humidity measure. */
export const defaultHumidityUnit: Record<HumidityDraft['quantity'], HumidityDraft['unit']> = {
  'relative-humidity': '%',
  'dew-point': 'C',
  'wet-bulb': 'C',
  'humidity-ratio': 'g/kg',
};

/** The override for the API: every part the person has set (a part left null is detected again). */
export function overrideFromDraft(draft: MappingDraft): MappingOverride {
  const override: MappingOverride = {
    delimiter: draft.delimiter,
    decimalSeparator: draft.decimalSeparator,
    pressure: draft.pressure,
  };
  if (draft.time) override.time = draft.time;
  if (draft.dryBulb) override.dryBulb = draft.dryBulb;
  if (draft.humidity) override.humidity = draft.humidity;
  // The same schema the server parses with: a malformed draft fails here, naming the field.
  return mappingOverrideSchema.parse(override);
}
