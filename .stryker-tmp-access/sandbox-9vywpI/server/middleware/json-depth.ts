// @ts-nocheck
import { HttpError } from '../http-error';

/** Deepest nesting of arrays and objects a request body may have; Tramontane's deepest body (a scenario) has 4. */
export const MAX_JSON_DEPTH = 32;

/**
 * Refuses a JSON body nested deeper than maxDepth before it is parsed, in one pass over the raw bytes
 * (brackets inside strings do not count). A body nested thousands deep is cheap to send and costly to
 * parse, print or walk; it gets a 400 naming the limit, never a 500.
 */
export function refuseDeepJson(raw: Buffer, maxDepth = MAX_JSON_DEPTH): void {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < raw.length; i++) {
    const byte = raw[i];
    if (inString) {
      if (byte === 0x5c)
        i++; // backslash: skip the escaped byte
      else if (byte === 0x22) inString = false;
    } else if (byte === 0x22) {
      inString = true;
    } else if (byte === 0x5b || byte === 0x7b) {
      if (++depth > maxDepth) {
        throw new HttpError(400, 'too_deep', `The request body is nested more than ${maxDepth} levels deep; no Tramontane request needs that.`);
      }
    } else if (byte === 0x5d || byte === 0x7d) {
      depth--;
    }
  }
}
