// @ts-nocheck
import { standardOffsetMinutes, standardTimeIso, utcOffsetLabel } from '../time-zone';
import { formatUtc } from './time-cells';

/**
 * The span an import summary names: on the site's standard time when the file is imported for a site (as every
 * other view gives periods), e.g. "2021-01-01 00:00 to 2023-12-31 23:00 site standard time (UTC−07:00)"; in UTC
 * ("…Z") when there is no site, as for the command line.
 */
export function importPeriodWords(firstMs: number, lastMs: number, siteTimeZone: string | undefined): string {
  if (siteTimeZone === undefined) return `${formatUtc(firstMs)} to ${formatUtc(lastMs)}`;
  const offset = standardOffsetMinutes(siteTimeZone);
  const local = (ms: number) => standardTimeIso(ms, offset).replace('T', ' ');
  return `${local(firstMs)} to ${local(lastMs)} site standard time (${utcOffsetLabel(offset)})`;
}
