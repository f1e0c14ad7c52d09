/**
 * What a file's header says against the site it is uploaded for: a warning when the elevation
 * differs by more than 50 m or the UTC offset differs from the site zone's standard offset.
 */
// @ts-nocheck

import type { Context } from '../import-context';
import { fixedOffsetZone, isKnownTimeZone, standardOffsetMinutes } from '../../time-zone';
import type { FileHeader } from '../types';

/** Elevations further apart than this are a different place or a wrong site (the threshold; about 0.6 kPa of pressure). */
export const ELEVATION_MISMATCH_M = 50;

export interface HeaderMismatch {
  field: 'elevationM' | 'utcOffsetHours';
  message: string;
}

/** The disagreements between a file's header and a site (elevation m, IANA zone or fixed offset). */
export function headerMismatches(header: FileHeader, site: { elevationM: number; timeZone: string }): HeaderMismatch[] {
  const found: HeaderMismatch[] = [];
  if (header.elevationM !== null && Number.isFinite(site.elevationM) && Math.abs(header.elevationM - site.elevationM) > ELEVATION_MISMATCH_M) {
    const apart = Math.round(Math.abs(header.elevationM - site.elevationM));
    found.push({
      field: 'elevationM',
      message: `The file's header gives an elevation of ${header.elevationM} m; the site is at ${site.elevationM} m (${apart} m apart, more than ${ELEVATION_MISMATCH_M} m). Check that this is the site's weather: hours without station pressure take the site's elevation.`,
    });
  }
  if (header.utcOffsetHours !== null && isKnownTimeZone(site.timeZone)) {
    const fileMinutes = Math.round(header.utcOffsetHours * 60);
    const siteMinutes = standardOffsetMinutes(site.timeZone);
    if (fileMinutes !== siteMinutes) {
      found.push({
        field: 'utcOffsetHours',
        message: `The file's header gives local standard time ${fixedOffsetZone(fileMinutes)}; the site's time zone ${site.timeZone} has standard time ${fixedOffsetZone(siteMinutes)}. The file's times are read at its own offset; check the site's time zone.`,
      });
    }
  }
  return found;
}

/** Adds a warning for each disagreement between the header read and the site. */
export function checkHeaderAgainstSite(ctx: Context, site: { elevationM: number; timeZone: string } | undefined): void {
  if (!site || typeof site !== 'object' || typeof site.timeZone !== 'string' || typeof site.elevationM !== 'number' || !ctx.fileHeader) return;
  for (const m of headerMismatches(ctx.fileHeader, site)) ctx.log.warning('header-site-mismatch', m.message, { line: ctx.fileHeader.line, column: m.field });
}

/** Values a new site can start from, as far as the header gives them (the time zone as a fixed offset of its standard time). */
export interface SitePrefill {
  name?: string;
  latitude?: number;
  longitude?: number;
  elevationM?: number;
  timeZone?: string;
}

export function sitePrefillFromHeader(header: FileHeader): SitePrefill {
  const prefill: SitePrefill = {};
  const name = [header.name, header.region].filter((part): part is string => !!part && part !== '-').join(', ');
  if (name) prefill.name = name.slice(0, 120);
  if (header.latitude !== null) prefill.latitude = header.latitude;
  if (header.longitude !== null) prefill.longitude = header.longitude;
  if (header.elevationM !== null) prefill.elevationM = header.elevationM;
  if (header.utcOffsetHours !== null) prefill.timeZone = fixedOffsetZone(Math.round(header.utcOffsetHours * 60));
  return prefill;
}
