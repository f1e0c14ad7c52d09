/**
 * What a weather file's header says about its station, read in the browser from the file's first
 * 64 kB through the same importer as an upload (loaded on demand, so the site form stays small).
 */
// @ts-nocheck

import { decodeClimateBytes, importClimateText } from '../../../../shared/climate';
import { sitePrefillFromHeader, type SitePrefill } from '../../../../shared/climate/formats/site-check';

const HEAD_BYTES = 64 * 1024;

export async function readFileHeaderOf(file: Blob): Promise<SitePrefill | null> {
  const bytes = new Uint8Array(await file.slice(0, HEAD_BYTES).arrayBuffer());
  const header = importClimateText(decodeClimateBytes(bytes)).report.fileHeader;
  return header ? sitePrefillFromHeader(header) : null;
}
