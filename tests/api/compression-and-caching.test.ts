import http, { type IncomingHttpHeaders } from 'node:http';
import type { AddressInfo } from 'node:net';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import express, { type Express } from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runs } from '../../server/db/schema';
import { compressAnswers } from '../../server/middleware/compress';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { createTestApp, type TestApp } from '../support/test-app';

// A stand-in for the built client (dist/client): an index page, a hashed script and a hashed font as Vite names them.
let clientDist: string;
const script = `export const rows = [${Array.from({ length: 400 }, (_, i) => `{ id: ${i}, label: "row ${i}" }`).join(', ')}];\n`;
const indexHtml = `<!doctype html><html><head><script type="module" src="/assets/index-4f2a9c1e.js"></script></head><body>${'<div></div>'.repeat(200)}</body></html>`;
// woff2 is compressed already: random bytes stand in for one.
const font = Buffer.from(Array.from({ length: 4096 }, (_, i) => (i * 7919) % 251));

let t: TestApp;
let viewer: TestPerson;
let projectId: number;
beforeAll(() => {
  clientDist = mkdtempSync(path.join(tmpdir(), 'client-dist-'));
  mkdirSync(path.join(clientDist, 'assets'));
  writeFileSync(path.join(clientDist, 'index.html'), indexHtml);
  writeFileSync(path.join(clientDist, 'assets', 'index-4f2a9c1e.js'), script);
  writeFileSync(path.join(clientDist, 'assets', 'plex-sans-latin-400-7d3e0b12.woff2'), font);
  writeFileSync(path.join(clientDist, 'favicon.svg'), '<svg xmlns="http://www.w3.org/2000/svg"/>');
  // Its stand-in runs are not real scenarios (it measures bytes on the wire), so answers are not checked against their schemas here.
  t = createTestApp({ clientDist, answerCheck: undefined });
  viewer = personWithSession(t.db, 'wren.falstow@example.test');
  projectId = projectWithMembers(t.db, 'Wire study', [[viewer, 'viewer']]);
});
afterAll(async () => {
  await t.close();
  rmSync(clientDist, { recursive: true, force: true });
});

/** Serves `app` on a free loopback port for one call. */
async function listening<T>(app: Express, use: (port: number) => Promise<T>): Promise<T> {
  const server = app.listen(0, '127.0.0.1');
  await new Promise<void>((resolve) => server.once('listening', () => resolve()));
  try {
    return await use((server.address() as AddressInfo).port);
  } finally {
    server.close();
  }
}

/**
 * A GET with the answer's bytes as they came over the wire (supertest decodes gzip before a test sees it).
 * `person` signs it in; `encodings` is its Accept-Encoding.
 */
async function raw(pathname: string, encodings: string, person?: TestPerson, app: Express = t.app) {
  return listening(
    app,
    (port) =>
      new Promise<{ status: number; headers: IncomingHttpHeaders; body: Buffer }>((resolve, reject) => {
        const headers: Record<string, string> = { 'accept-encoding': encodings, ...(person ? { cookie: person.cookie } : {}) };
        http
          .get({ host: '127.0.0.1', port, path: pathname, headers }, (res) => {
            const chunks: Buffer[] = [];
            res.on('data', (chunk: Buffer) => chunks.push(chunk));
            res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }));
          })
          .on('error', reject);
      }),
  );
}
const decoded = (encoding: string | undefined, body: Buffer) =>
  (encoding === 'br' ? brotliDecompressSync(body) : encoding === 'gzip' ? gunzipSync(body) : body).toString('utf8');

describe('compressed answers', () => {
  it('compress API answers of 1 kB and more with brotli or gzip, as the request accepts, and say so in Vary', async () => {
    const presets = `/api/envelope-presets`;
    const plain = await request(t.app).get(presets).set(asPerson(viewer)).set('accept-encoding', 'identity').expect(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.text.length).toBeGreaterThan(1024);
    for (const encoding of ['gzip', 'br']) {
      const res = await raw(presets, encoding, viewer);
      expect(res.status).toBe(200);
      expect(res.headers['content-encoding']).toBe(encoding);
      expect(res.headers.vary).toMatch(/Accept-Encoding/i);
      expect(decoded(encoding, res.body)).toBe(plain.text);
      expect(res.body.length).toBeLessThan(plain.text.length / 2);
    }
  });

  it('compress remembered answers (the run list) the same way, also when they come from memory', async () => {
    const listPath = `/api/projects/${projectId}/runs`;
    // An empty list is under the 1 kB threshold: sent as it is, but still varying by Accept-Encoding.
    const empty = await raw(listPath, 'gzip', viewer);
    expect(empty.status).toBe(200);
    expect(empty.headers['content-encoding']).toBeUndefined();
    expect(empty.headers.vary).toMatch(/Accept-Encoding/i);
    // Queued runs (stored directly; their inputs are synthetic stand-ins) make the list longer than 1 kB.
    for (let i = 0; i < 6; i++) {
      t.db
        .insert(runs)
        .values({
          projectId,
          scenarioJson: JSON.stringify({ name: `Stand-in scenario ${i}`, note: 'x'.repeat(200) }),
          climateJson: '{"name":"stand-in"}',
          engineVersion: 'scenario-engine 2.0.0',
        })
        .run();
    }
    const plain = await request(t.app).get(listPath).set(asPerson(viewer)).set('accept-encoding', 'identity').expect(200);
    expect(plain.text.length).toBeGreaterThan(1024);
    for (const encoding of ['gzip', 'br', 'gzip', 'br']) {
      const res = await raw(listPath, encoding, viewer);
      expect(res.status).toBe(200);
      expect(res.headers['content-encoding']).toBe(encoding);
      expect(res.headers.vary).toMatch(/Accept-Encoding/i);
      expect(decoded(encoding, res.body)).toBe(plain.text);
    }
  });

  it('leave small answers, and types compressed already, as they are', async () => {
    const health = await request(t.app).get('/api/health').set('accept-encoding', 'gzip, br');
    expect(health.headers['content-encoding']).toBeUndefined();
    const fontRes = await raw('/assets/plex-sans-latin-400-7d3e0b12.woff2', 'gzip, br');
    expect(fontRes.status).toBe(200);
    expect(fontRes.headers['content-encoding']).toBeUndefined();
    expect(Buffer.compare(fontRes.body, font)).toBe(0);
  });

  it('compress the client: its scripts and its page', async () => {
    const js = await raw('/assets/index-4f2a9c1e.js', 'gzip, deflate, br');
    expect(js.status).toBe(200);
    expect(js.headers['content-encoding']).toBe('br');
    expect(decoded('br', js.body)).toBe(script);
    const page = await raw('/projects/1', 'gzip');
    expect(page.status).toBe(200);
    expect(page.headers['content-encoding']).toBe('gzip');
    expect(decoded('gzip', page.body)).toBe(indexHtml);
  });
});

describe('compression for routes with binary or streamed answers', () => {
  // Float32 columns of a smooth hourly series: binary, and compressible.
  const columns = Buffer.from(new Float32Array(Array.from({ length: 2000 }, (_, h) => Math.round(10 * Math.sin(h / 24)) / 2)).buffer);
  const app = express();
  app.use(compressAnswers());
  app.get('/columns', (_req, res) => res.type('application/octet-stream').send(columns));
  app.get('/archive', (_req, res) => res.type('application/zip').send(columns));
  app.get('/columns-as-they-are', (_req, res) => res.set('cache-control', 'no-transform').type('application/octet-stream').send(columns));
  app.get('/stream', (_req, res) => {
    res.type('text/csv');
    for (let i = 0; i < 500; i++) res.write(`${i},${(i * 0.37).toFixed(2)}\n`);
    res.end();
  });

  it('compress binary columns, leave archives as they are, and leave alone a route that says no-transform', async () => {
    const binary = await raw('/columns', 'gzip, br', undefined, app);
    expect(binary.headers['content-encoding']).toBe('br');
    expect(Buffer.compare(brotliDecompressSync(binary.body), columns)).toBe(0);
    expect(binary.body.length).toBeLessThan(columns.length / 4);
    for (const pathname of ['/archive', '/columns-as-they-are']) {
      const plain = await raw(pathname, 'gzip, br', undefined, app);
      expect(plain.headers['content-encoding']).toBeUndefined();
      expect(Buffer.compare(plain.body, columns)).toBe(0);
    }
  });

  it('compress a streamed answer as it goes, whole at the end', async () => {
    const res = await raw('/stream', 'gzip', undefined, app);
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.headers['transfer-encoding']).toBe('chunked');
    const lines = decoded('gzip', res.body).trimEnd().split('\n');
    expect(lines).toHaveLength(500);
    expect(lines[499]).toBe('499,184.63');
  });
});

describe('cache headers for the client', () => {
  it('keep hashed assets for a year without asking again', async () => {
    for (const asset of ['/assets/index-4f2a9c1e.js', '/assets/plex-sans-latin-400-7d3e0b12.woff2']) {
      const res = await request(t.app).get(asset).expect(200);
      expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    }
  });

  it('revalidate the page on every load, wherever the client routes it from', async () => {
    for (const page of ['/', '/index.html', '/projects/1/runs/2']) {
      const res = await request(t.app).get(page).expect(200);
      expect(res.headers['content-type']).toMatch(/text\/html/);
      expect(res.headers['cache-control']).toBe('no-cache');
    }
    const first = await request(t.app).get('/').expect(200);
    await request(t.app).get('/').set('if-none-match', first.headers.etag).expect(304);
  });

  it('answer 404 for an asset that is not there (an old page asking for a file a newer build replaced), not the page', async () => {
    const res = await request(t.app).get('/assets/index-00000000.js').expect(404);
    expect(res.headers['cache-control'] ?? '').not.toMatch(/immutable/);
    expect(res.body.error.code).toBe('not_found');
  });

  it('keep other files at the root for an hour', async () => {
    const res = await request(t.app).get('/favicon.svg').expect(200);
    expect(res.headers['cache-control']).toBe('public, max-age=3600');
  });
});
