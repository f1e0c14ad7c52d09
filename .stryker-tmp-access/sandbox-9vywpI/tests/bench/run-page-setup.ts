/**
 * What the run-page bench (and a look at the run page by hand) starts from: the production client build
 * served by a test app on a free loopback port, an owner signed in by cookie, a site with a 1-year and a
 * 30-year synthetic climate file, the sample direct-air scenario run on both, and Debian's Chromium.
 */
// @ts-nocheck

import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { createServer, type Server } from 'node:http';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { chromium, type Browser, type BrowserContext } from 'playwright-core';
import { build } from 'vite';
import { appRoot } from '../../server/paths';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { createTestApp, type TestApp } from '../support/test-app';
import { syntheticSeries, type SyntheticClimate } from '../unit/scenario/synthetic-climate';

const HOURS_PER_YEAR = 8760;
// Temperate synthetic climate (invented), as the scenario bench uses.
const TEMPERATE: SyntheticClimate = { name: 'temperate (synthetic)', elevationM: 100, meanC: 12, seasonalK: 11, dailyK: 5, rhMean: 68, rhSpread: 30 };
const directAirSample = JSON.parse(readFileSync(path.join(appRoot, 'sample-weather/scenarios/direct-air-a1.json'), 'utf8'));

/** A canonical CSV of `years` synthetic years, rounded as a weather file is (0.1 K, 1 % RH). */
function syntheticCsv(years: number): string {
  const series = syntheticSeries(TEMPERATE, { hours: years * HOURS_PER_YEAR, seed: 5 });
  const lines = ['# synthetic benchmark data', 'timestamp,dry_bulb_c,relative_humidity_pct'];
  for (let i = 0; i < series.dryBulbC.length; i++) {
    lines.push(`${new Date(series.timestampsMs[i]).toISOString().slice(0, 16)}Z,${series.dryBulbC[i].toFixed(1)},${series.humidity.values[i].toFixed(0)}`);
  }
  return `${lines.join('\n')}\n`;
}

export interface RunPageStage {
  baseUrl: string;
  owner: TestPerson;
  projectId: number;
  runs: { oneYear: number; thirtyYears: number };
  browser: Browser;
  /** A fresh browser context (empty cache) signed in as the owner. */
  newContext: () => Promise<BrowserContext>;
  close: () => Promise<void>;
}

/** Builds the client, starts the app, makes the data and waits for both runs to finish. */
export async function startRunPageStage(log: (line: string) => void = () => {}): Promise<RunPageStage> {
  const clientDist = mkdtempSync(path.join(tmpdir(), 'tramontane-bench-dist-'));
  const previous = process.env.NODE_ENV;
  process.env.NODE_ENV = 'production';
  try {
    log('run-page: building the client');
    await build({ root: appRoot, mode: 'production', logLevel: 'warn', build: { outDir: clientDist, emptyOutDir: true } });
  } finally {
    process.env.NODE_ENV = previous;
  }
  const t: TestApp = createTestApp({ clientDist });
  const server: Server = await new Promise((resolve) => {
    const s = createServer(t.app).listen(0, '127.0.0.1', () => resolve(s));
  });
  const baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const owner = personWithSession(t.db, 'bench-owner@example.test');
  const projectId = projectWithMembers(t.db, 'Run page bench (synthetic)', [[owner, 'owner']]);
  const api = async <T>(method: string, apiPath: string, body?: string, contentType = 'application/json'): Promise<T> => {
    const res = await fetch(`${baseUrl}/api${apiPath}`, {
      method,
      headers: { cookie: owner.cookie, 'x-tramontane-request': '1', 'content-type': contentType },
      body,
    });
    if (!res.ok) throw new Error(`${method} ${apiPath} answered ${res.status}: ${await res.text()}`);
    return (await res.json()) as T;
  };

  log('run-page: importing 1 and 30 synthetic years and running the sample scenario on both');
  const { site } = await api<{ site: { id: number } }>(
    'POST',
    `/projects/${projectId}/sites`,
    JSON.stringify({ name: 'Harrowmere (synthetic)', elevationM: 100, timeZone: 'UTC' }),
  );
  const upload = async (years: number) =>
    (
      await api<{ climateFile: { id: number } }>(
        'POST',
        `/projects/${projectId}/sites/${site.id}/climate-files?fileName=synthetic-${years}y.csv`,
        syntheticCsv(years),
        'text/csv',
      )
    ).climateFile.id;
  const oneYearFile = await upload(1);
  const thirtyYearFile = await upload(30);
  const { scenario } = await api<{ scenario: { id: number } }>('POST', `/projects/${projectId}/scenarios`, JSON.stringify({ scenario: directAirSample }));
  const created = await api<{ runs: Array<{ id: number; climateFileId: number }> }>(
    'POST',
    `/projects/${projectId}/runs`,
    JSON.stringify({ scenarioIds: [scenario.id], climateFileIds: [oneYearFile, thirtyYearFile] }),
  );
  await t.runQueue.idle();
  const runOf = (fileId: number) => created.runs.find((r) => r.climateFileId === fileId)!.id;
  for (const id of created.runs.map((r) => r.id)) {
    const { run } = await api<{ run: { status: string } }>('GET', `/projects/${projectId}/runs/${id}`);
    if (run.status !== 'done') throw new Error(`bench run ${id} ended ${run.status}`);
  }

  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  const [cookieName, cookieValue] = owner.cookie.split('=');
  return {
    baseUrl,
    owner,
    projectId,
    runs: { oneYear: runOf(oneYearFile), thirtyYears: runOf(thirtyYearFile) },
    browser,
    newContext: async () => {
      const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
      await context.addCookies([{ name: cookieName, value: cookieValue, url: baseUrl }]);
      return context;
    },
    close: async () => {
      await browser.close();
      server.closeAllConnections();
      await new Promise((resolve) => server.close(resolve));
      await t.close();
      rmSync(clientDist, { recursive: true, force: true });
    },
  };
}
