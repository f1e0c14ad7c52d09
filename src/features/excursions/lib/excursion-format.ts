import { utcOffsetLabel } from '../../../../shared/time-zone';

/** Whole hours with thousands separators. */
export const hoursText = (h: number) => Math.round(h).toLocaleString('en');

/** Share of a whole, as "12.3 %"; an en dash without a whole. */
export const percentText = (part: number, whole: number) =>
  whole > 0 ? `${((100 * part) / whole).toLocaleString('en', { minimumFractionDigits: 1, maximumFractionDigits: 1 })} %` : '–';

/** "2019-07-01 14:00 (UTC+01:00)" or "… (UTC)": an hour on the site's standard-time clock. */
export function siteTime(ms: number, utcOffsetMinutes: number): string {
  const text = new Date(ms + utcOffsetMinutes * 60_000).toISOString().slice(0, 16).replace('T', ' ');
  return `${text} (${utcOffsetLabel(utcOffsetMinutes)})`;
}
