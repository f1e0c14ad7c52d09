// @ts-nocheck
import compression from 'compression';
import type { RequestHandler } from 'express';

/**
 * Brotli or gzip, as the request accepts, for every answer of 1 kB or more whose type is compressible: JSON, CSV,
 * HTML, scripts, styles, SVG and `application/octet-stream` (typed columns of hourly values compress well); images,
 * fonts and archives go as they are. A route opts out with `Cache-Control: no-transform`. Streamed answers are
 * compressed as they go: a route streaming events must call `res.flush()` after each one.
 */
export function compressAnswers(): RequestHandler {
  return compression();
}
