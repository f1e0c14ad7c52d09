// @ts-nocheck
import type { RequestHandler } from 'express';
import { HttpError } from '../http-error';
import { readCookie, sessionCookieName } from './session';

/** The header the client's one API client sends; a cross-site form or image cannot add it, and a cross-site script needs CORS, which we never grant. */
export const requestMarkerHeader = 'x-tramontane-request';

const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses state-changing requests that may come from another site: a foreign Origin or
 * `Sec-Fetch-Site: cross-site` always, and any cookie-carrying request without our marker header.
 * Requests without a session cookie carry no ambient authority, so tools and scripts may call
 * public state-changing routes without the header.
 */
export const refuseCrossSite: RequestHandler = (req, _res, next) => {
  if (safeMethods.has(req.method)) return next();
  const origin = req.headers.origin;
  if (origin && origin !== 'null') {
    let originHost: string | undefined;
    try {
      originHost = new URL(origin).host;
    } catch {
      originHost = undefined;
    }
    if (originHost !== req.headers.host) {
      throw new HttpError(403, 'cross_site_refused', `A request from ${origin} may not change anything here.`);
    }
  } else if (origin === 'null') {
    throw new HttpError(403, 'cross_site_refused', 'A request from an opaque origin may not change anything here.');
  }
  if (req.headers['sec-fetch-site'] === 'cross-site') {
    throw new HttpError(403, 'cross_site_refused', 'A cross-site request may not change anything here.');
  }
  if (readCookie(req, sessionCookieName) !== undefined && req.headers[requestMarkerHeader] !== '1') {
    throw new HttpError(403, 'cross_site_refused', `A signed-in request that changes something must carry the ${requestMarkerHeader} header.`);
  }
  next();
};
