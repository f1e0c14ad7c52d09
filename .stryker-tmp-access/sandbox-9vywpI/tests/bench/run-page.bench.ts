/**
 * The run page in Chromium (issue 14): a 30-year run's page settles (network idle and no long task for
 * 800 ms) in at most 3× the project overview page's time in the same browser, pulling at most 2.5 MB over
 * the wire; the 1-year figures beside it. Each page is opened in a fresh browser context (empty cache),
 * interleaved and repeated; medians are reported.
 *
 * Bytes over the wire are Chromium's own count (headers and bodies as received). `…GzipBytes` is what the
 * same responses would weigh with every response compressed: bodies that came uncompressed are gzipped
 * here (level 6) and counted at that size, as a server compressing every response would send them.
 */
// @ts-nocheck

import { gzipSync } from 'node:zlib';
import type { BrowserContext } from 'playwright-core';
import { startRunPageStage, type RunPageStage } from './run-page-setup';
import type { BenchContext, BenchSuite } from './suite';

const QUIET_MS = 800;
const ROUNDS = 3;

interface PageFigures {
  settleMs: number;
  /** Navigation to the first summary tile (the hours-per-mode table) painted; null for pages without one. */
  tilesMs: number | null;
  wireBytes: number;
  gzipBytes: number;
  longestTaskMs: number;
}

/** Declared in the page by the init script below. */
declare global {
  interface Window {
    __benchLongTasks?: Array<{ start: number; end: number }>;
    /** performance.now() of the first frame after the summary tile appeared. */
    __benchTilesAt?: number;
  }
}

async function measure(stage: RunPageStage, context: BrowserContext, url: string, tileSelector: string | null): Promise<PageFigures> {
  const page = await context.newPage();
  await page.addInitScript((selector) => {
    window.__benchLongTasks = [];
    new PerformanceObserver((list) => {
      for (const e of list.getEntries()) window.__benchLongTasks!.push({ start: e.startTime, end: e.startTime + e.duration });
    }).observe({ type: 'longtask', buffered: true });
    if (!selector) return;
    const watch = new MutationObserver(() => {
      if (!document.querySelector(selector)) return;
      watch.disconnect();
      requestAnimationFrame(() => (window.__benchTilesAt = performance.now()));
    });
    document.addEventListener('DOMContentLoaded', () => watch.observe(document.body, { childList: true, subtree: true }));
  }, tileSelector);
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.setCacheDisabled', { cacheDisabled: true });
  const inFlight = new Set<string>();
  const responses = new Map<string, { url: string; method: string; encoded: boolean }>();
  let wireBytes = 0;
  let lastNetworkAt = performance.now();
  cdp.on('Network.requestWillBeSent', (e) => {
    inFlight.add(e.requestId);
    responses.set(e.requestId, { url: e.request.url, method: e.request.method, encoded: false });
    lastNetworkAt = performance.now();
  });
  cdp.on('Network.responseReceived', (e) => {
    const r = responses.get(e.requestId);
    const encoding = Object.entries(e.response.headers).find(([k]) => k.toLowerCase() === 'content-encoding')?.[1];
    if (r) r.encoded = !!encoding && encoding !== 'identity';
  });
  cdp.on('Network.loadingFinished', (e) => {
    inFlight.delete(e.requestId);
    wireBytes += e.encodedDataLength;
    lastNetworkAt = performance.now();
  });
  cdp.on('Network.loadingFailed', (e) => {
    inFlight.delete(e.requestId);
    lastNetworkAt = performance.now();
  });

  // Times are on the page's clock (0 at navigation); the network's, seen here, are moved onto it.
  await page.goto(url, { waitUntil: 'commit' });
  let settleMs: number;
  let longestTaskMs: number;
  let tilesMs: number | null;
  const waitStarted = performance.now();
  for (;;) {
    const seen = await page.evaluate(() => {
      const tasks = window.__benchLongTasks ?? [];
      return {
        now: performance.now(),
        lastEnd: tasks.length ? Math.max(...tasks.map((t) => t.end)) : 0,
        longest: tasks.length ? Math.max(...tasks.map((t) => t.end - t.start)) : 0,
        tilesAt: window.__benchTilesAt ?? null,
      };
    });
    const here = performance.now();
    const onPage = (t: number) => t - (here - seen.now);
    longestTaskMs = seen.longest;
    tilesMs = seen.tilesAt;
    // Settled: nothing in flight and neither a response nor a long task for QUIET_MS.
    const lastActivity = Math.max(onPage(lastNetworkAt), seen.lastEnd);
    if (inFlight.size === 0 && seen.now - lastActivity >= QUIET_MS && (tileSelector === null || tilesMs !== null)) {
      settleMs = lastActivity;
      break;
    }
    if (here - waitStarted > 180_000) throw new Error(`${url} did not settle in 3 minutes`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  await page.close();

  // What the same responses weigh with every response compressed.
  let gzipBytes = 0;
  for (const r of responses.values()) {
    if (r.method !== 'GET' || !r.url.startsWith(stage.baseUrl)) continue;
    const res = await fetch(r.url, { headers: { cookie: stage.owner.cookie, 'accept-encoding': r.encoded ? 'gzip' : 'identity' } });
    const body = Buffer.from(await res.arrayBuffer());
    // fetch undoes a gzip it asked for: compress again for the size it had on the wire.
    gzipBytes += gzipSync(body, { level: 6 }).length;
  }
  return { settleMs, tilesMs, wireBytes, gzipBytes, longestTaskMs };
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

async function run({ log }: BenchContext): Promise<Record<string, number | string>> {
  const stage = await startRunPageStage(log);
  try {
    const pages = {
      overview: { url: `${stage.baseUrl}/projects/${stage.projectId}`, tiles: null },
      oneYear: { url: `${stage.baseUrl}/projects/${stage.projectId}/runs/${stage.runs.oneYear}`, tiles: '[data-testid="mode-hours"]' },
      thirtyYears: { url: `${stage.baseUrl}/projects/${stage.projectId}/runs/${stage.runs.thirtyYears}`, tiles: '[data-testid="mode-hours"]' },
    } as const;
    const figures: Record<keyof typeof pages, PageFigures[]> = { overview: [], oneYear: [], thirtyYears: [] };
    // One page each, once, to warm the server's and the browser's code; then interleaved rounds.
    for (let round = -1; round < ROUNDS; round++) {
      for (const key of Object.keys(pages) as Array<keyof typeof pages>) {
        const context = await stage.newContext();
        const result = await measure(stage, context, pages[key].url, pages[key].tiles);
        await context.close();
        if (round >= 0) figures[key].push(result);
        log(`run-page: ${key} round ${round + 1}: settled ${Math.round(result.settleMs)} ms, ${(result.wireBytes / 1e6).toFixed(2)} MB`);
      }
    }
    const m = (key: keyof typeof pages, field: keyof PageFigures) => median(figures[key].map((f) => f[field] ?? Number.NaN));
    const overviewMs = m('overview', 'settleMs');
    const thirty = m('thirtyYears', 'settleMs');
    const thirtyBytes = m('thirtyYears', 'wireBytes');
    const thirtyGzip = m('thirtyYears', 'gzipBytes');
    const mb = (bytes: number) => Math.round(bytes / 1e4) / 100;
    const ratio = (ms: number) => Math.round((ms / overviewMs) * 100) / 100;
    return {
      'run-page.overviewSettleMs': Math.round(overviewMs),
      'run-page.thirtyYearsSettleMs': Math.round(thirty),
      'run-page.thirtyYearsOverOverview': ratio(thirty),
      'run-page.thirtyYearsWithin3x': thirty <= 3 * overviewMs ? 'yes' : 'NO',
      'run-page.thirtyYearsWireMb': mb(thirtyBytes),
      'run-page.thirtyYearsAllGzipMb': mb(thirtyGzip),
      'run-page.thirtyYearsUnder2_5Mb': thirtyBytes <= 2.5e6 ? 'yes' : 'NO',
      'run-page.thirtyYearsAllGzipUnder2_5Mb': thirtyGzip <= 2.5e6 ? 'yes' : 'NO',
      'run-page.thirtyYearsTilesMs': Math.round(m('thirtyYears', 'tilesMs')),
      'run-page.thirtyYearsLongestTaskMs': Math.round(m('thirtyYears', 'longestTaskMs')),
      'run-page.oneYearSettleMs': Math.round(m('oneYear', 'settleMs')),
      'run-page.oneYearOverOverview': ratio(m('oneYear', 'settleMs')),
      'run-page.oneYearWireMb': mb(m('oneYear', 'wireBytes')),
      'run-page.oneYearAllGzipMb': mb(m('oneYear', 'gzipBytes')),
      'run-page.oneYearTilesMs': Math.round(m('oneYear', 'tilesMs')),
      'run-page.oneYearLongestTaskMs': Math.round(m('oneYear', 'longestTaskMs')),
      'run-page.overviewWireMb': mb(m('overview', 'wireBytes')),
    };
  } finally {
    await stage.close();
  }
}

export const suite: BenchSuite = { name: 'run-page', run };
