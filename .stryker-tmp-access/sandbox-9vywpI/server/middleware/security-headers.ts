// @ts-nocheck
import type { RequestHandler } from 'express';
import helmet from 'helmet';

/**
 * The browser-side guards on every response: a Content-Security-Policy that the built client passes with no
 * inline script (scripts, fonts and data from this origin only; inline style attributes, which the charts
 * set, allowed), no framing by any site, nosniff, `Referrer-Policy: same-origin`, and HSTS on requests that
 * arrived over https (behind the local proxy that sets X-Forwarded-Proto). In development the Vite dev
 * server injects inline scripts for hot reload, so the policy is left off there.
 */
export function securityHeaders({ development }: { development: boolean }): RequestHandler {
  const guards = helmet({
    contentSecurityPolicy: development
      ? false
      : {
          useDefaults: false,
          directives: {
            defaultSrc: ["'self'"],
            baseUri: ["'self'"],
            scriptSrc: ["'self'"],
            scriptSrcAttr: ["'none'"],
            styleSrc: ["'self'", "'unsafe-inline'"],
            imgSrc: ["'self'", 'data:', 'blob:'],
            fontSrc: ["'self'", 'data:'],
            connectSrc: ["'self'"],
            objectSrc: ["'none'"],
            frameAncestors: ["'none'"],
            formAction: ["'self'"],
          },
        },
    referrerPolicy: { policy: 'same-origin' },
    strictTransportSecurity: false,
    crossOriginEmbedderPolicy: false,
  });
  return (req, res, next) => {
    if (req.secure) res.setHeader('Strict-Transport-Security', 'max-age=15552000; includeSubDomains');
    guards(req, res, next);
  };
}
