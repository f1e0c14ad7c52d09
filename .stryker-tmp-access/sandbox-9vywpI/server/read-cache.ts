// @ts-nocheck
import { brotliCompressSync, constants as zlibConstants, gzipSync } from 'node:zlib';
import type { Request, Response } from 'express';
import type { Db } from './db/client';

/** Answers smaller than this go out as they are: compressing them saves less than it costs (the compression middleware's own threshold). */
const compressFromBytes = 1024;

interface Entry {
  version: string;
  body: Buffer;
  etag: string;
  encoded: Map<'br' | 'gzip', Buffer>;
  /** Bytes counted for this entry while remembered. */
  counted: number;
}

export interface ReadCache {
  /**
   * Answers `req` with the JSON text `build` gives, remembered under `key` until the database next changes: a
   * later read of the same key before any write is answered from memory, compressed once (brotli or gzip, as the
   * request accepts), with an ETag so a browser that has it gets 304. `build` throws to answer with an error,
   * which is never remembered. Only for answers that depend on nothing but the database and `key`: the caller's
   * access to them is checked before (routes' access rules), and their content must not vary by person.
   */
  sendJson: (req: Request, res: Response, key: string, build: () => string) => void;
}

/**
 * Remembered JSON answers for the heaviest reads (a project's run list, a run), valid while the database is as
 * it was: the key is this connection's count of changed rows (SQLite total_changes(), which every insert, update
 * and delete through it raises, in or out of a transaction, rolled back or not) with the file's data_version
 * (which another connection's commit raises). Any write at all clears every entry's validity; nothing has to
 * say what it changed. Bounded by `maxBytes` of bodies, least recently used first out.
 */
export function createReadCache(db: Db, { maxBytes = 32 * 1024 * 1024 } = {}): ReadCache {
  const versionQuery = db.$client.prepare('SELECT total_changes(), data_version FROM pragma_data_version').raw();
  const version = () => (versionQuery.get() as [number, number]).join(':');
  const entries = new Map<string, Entry>();
  let bytes = 0;

  const forget = (key: string) => {
    const entry = entries.get(key);
    if (!entry) return;
    bytes -= entry.counted;
    entries.delete(key);
  };
  /** (Again) the most recently used, counted at its size now. */
  const remember = (key: string, entry: Entry) => {
    forget(key);
    entry.counted = entry.body.length + [...entry.encoded.values()].reduce((sum, b) => sum + b.length, 0);
    entries.set(key, entry);
    bytes += entry.counted;
    for (const oldest of entries.keys()) {
      if (bytes <= maxBytes || oldest === key) break;
      forget(oldest);
    }
  };

  return {
    sendJson(req, res, key, build) {
      const now = version();
      let entry = entries.get(key);
      if (!entry || entry.version !== now) {
        const body = Buffer.from(build(), 'utf8');
        const etagOf = req.app.get('etag fn') as ((body: Buffer, encoding?: string) => string) | undefined;
        entry = { version: now, body, etag: etagOf?.(body) ?? '', encoded: new Map(), counted: 0 };
      }
      res.setHeader('Content-Type', 'application/json; charset=utf-8');
      if (entry.etag) res.setHeader('ETag', entry.etag);
      res.vary('Accept-Encoding');
      remember(key, entry);
      if (req.fresh) {
        // The browser has this answer already (its If-None-Match is this ETag).
        res.status(304).end();
        return;
      }
      // Brotli where the request accepts it, as the compression middleware prefers, else gzip.
      const encoding = entry.body.length < compressFromBytes ? false : req.acceptsEncodings('br') || req.acceptsEncodings('gzip');
      if (encoding === 'br' || encoding === 'gzip') {
        let encoded = entry.encoded.get(encoding);
        if (!encoded) {
          // At the compression middleware's settings: brotli quality 4 (here told the size, which makes it faster), gzip level 6.
          const size = entry.body.length;
          encoded =
            encoding === 'br'
              ? brotliCompressSync(entry.body, { params: { [zlibConstants.BROTLI_PARAM_QUALITY]: 4, [zlibConstants.BROTLI_PARAM_SIZE_HINT]: size } })
              : gzipSync(entry.body);
          entry.encoded.set(encoding, encoded);
        }
        res.setHeader('Content-Encoding', encoding);
        remember(key, entry);
        res.send(encoded);
        return;
      }
      res.send(entry.body);
    },
  };
}
