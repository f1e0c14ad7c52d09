// @ts-nocheck
import path from 'node:path';
import express, { type Router } from 'express';
import { HttpError } from '../http-error';

const yearS = 365 * 24 * 3600;

/**
 * The built client (dist/client) with cache headers that suit how Vite names its files:
 * - assets/: every name carries a hash of the file's content, so a browser keeps it for a year and never asks
 *   again (`immutable`); a name that is not there answers 404 (an old page asking for a file a newer build
 *   replaced) rather than the page;
 * - the page (index.html, also answered for every path the client routes): `no-cache`, so each load asks, a
 *   304 by its ETag when unchanged, and a new build reaches people at their next load;
 * - other files at the root (the favicon): an hour.
 */
export function clientFiles(clientDist: string): Router {
  const indexHtml = path.join(clientDist, 'index.html');
  const files = express.Router();
  files.use('/assets', express.static(path.join(clientDist, 'assets'), { index: false, maxAge: yearS * 1000, immutable: true }), (req, _res, next) => {
    next(new HttpError(404, 'not_found', `No file ${req.originalUrl}; the page may be older than the server, reload it.`));
  });
  files.use(
    express.static(clientDist, {
      index: false,
      maxAge: '1h',
      setHeaders: (res, file) => {
        if (file === indexHtml) res.setHeader('Cache-Control', 'no-cache');
      },
    }),
  );
  files.get('/{*splat}', (_req, res) => res.sendFile(indexHtml, { cacheControl: false, headers: { 'Cache-Control': 'no-cache' } }));
  return files;
}
