// @ts-nocheck
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { createServer, type Server } from 'node:http';
import { tmpdir } from 'node:os';
import path from 'node:path';
import AxeBuilder from '@axe-core/playwright';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { inject } from 'vitest';
import type { AppDeps } from '../../server/app';
import { appRoot } from '../../server/paths';
import { asPerson, type TestPerson } from './people';
import { startSignInStack, type SignInStack } from './sign-in';

export const screenshotFolder = path.join(appRoot, 'test-results', 'screenshots');

export interface BrowserHarness {
  baseUrl: string;
  page: Page;
  context: BrowserContext;
  /** The app with the fake sign-in provider and fake SMTP server beside it. */
  testApp: SignInStack;
  /** A full-page screenshot of the page as it is scrolled now; returns the file. */
  screenshot: (name: string) => Promise<string>;
  /**
   * A full-page screenshot from the top, so sticky side columns sit where a reader sees them;
   * `settleMs` waits after the scroll for anything drawn on scroll. (Accessibility: tests/e2e/workspace-reading.test.ts
   * runs `audit` on every page of the workspace at phone and desk widths.)
   */
  shot: (name: string, settleMs?: number) => Promise<string>;
  /**
   * Runs axe-core over the page as it stands (WCAG 2.1 A and AA rules) and throws, naming each rule, its impact and the
   * first elements, when any violation is serious or critical.
   */
  audit: (where: string) => Promise<void>;
  /**
   * Signs the browser in as `person` with their session cookie, or signs it out (`null`). Leaves the page first:
   * requests still due from it (a debounced preview, a poll) must not go out as the next person.
   */
  signInAs: (person: TestPerson | null) => Promise<void>;
  /** A request to the app's API (`path` after `/api`) as `person`; the parsed JSON answer, or an error naming the refusal. */
  api: <T = unknown>(person: TestPerson, method: string, path: string, body?: BodyInit, contentType?: string) => Promise<T>;
  /**
   * Switches SI/IP as the settings toggle does: remembered for the person `signInAs` signed in (on the server) and in
   * this browser, then the page reloads.
   */
  useUnits: (system: 'SI' | 'IP') => Promise<void>;
  close: () => Promise<void>;
}

/** The built app on a free loopback port, and Debian's Chromium with a fresh profile pointed at it. */
export async function startBrowserHarness(overrides: Partial<AppDeps> = {}): Promise<BrowserHarness> {
  // The port comes first: the fake sign-in provider must know the app's callback address.
  const server: Server = await new Promise((resolve) => {
    const s = createServer().listen(0, '127.0.0.1', () => resolve(s));
  });
  const baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const testApp: SignInStack = await startSignInStack({ publicUrl: baseUrl, overrides: { ...overrides, clientDist: inject('clientDist') } });
  server.on('request', testApp.app);
  const profile = mkdtempSync(path.join(tmpdir(), 'tramontane-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    viewport: { width: 1440, height: 900 },
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
  const page = context.pages()[0] ?? (await context.newPage());
  mkdirSync(screenshotFolder, { recursive: true });
  let signedIn: TestPerson | null = null;

  const screenshot = async (name: string) => {
    const file = path.join(screenshotFolder, `${name}.png`);
    await page.screenshot({ path: file, fullPage: true });
    return file;
  };
  const api = async <T = unknown>(person: TestPerson, method: string, apiPath: string, body?: BodyInit, contentType = 'application/json') => {
    const res = await fetch(`${baseUrl}/api${apiPath}`, { method, headers: { ...asPerson(person), 'content-type': contentType }, body });
    if (!res.ok) throw new Error(`${method} ${apiPath} answered ${res.status}: ${await res.text()}`);
    return (await res.json()) as T;
  };

  const audit = async (where: string) => {
    const result = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
    const serious = result.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
    if (serious.length === 0) return;
    const lines = serious.map(
      (v) =>
        `${v.id} (${v.impact}): ${v.help} — ${v.nodes
          .slice(0, 3)
          .map((n) => n.target.join(' '))
          .join('; ')}${v.nodes.length > 3 ? ` and ${v.nodes.length - 3} more` : ''}`,
    );
    throw new Error(`Accessibility check of ${where} (${page.url()}) found ${serious.length} serious violation(s):\n${lines.join('\n')}`);
  };

  return {
    baseUrl,
    page,
    context,
    testApp,
    screenshot,
    audit,
    shot: async (name, settleMs = 0) => {
      await page.evaluate(() => window.scrollTo(0, 0));
      if (settleMs > 0) await page.waitForTimeout(settleMs);
      return screenshot(name);
    },
    signInAs: async (person) => {
      signedIn = person;
      await page.goto('about:blank');
      await context.clearCookies();
      if (!person) return;
      const [name, value] = person.cookie.split('=');
      await context.addCookies([{ name, value, url: baseUrl }]);
    },
    api,
    useUnits: async (system) => {
      // Signed out, the choice lives in the browser only.
      if (signedIn) await api(signedIn, 'PATCH', '/me', JSON.stringify({ unitSystem: system.toLowerCase() }));
      await page.evaluate((s) => localStorage.setItem('tramontane.unitSystem', s), system);
      await page.reload();
    },
    close: async () => {
      await context.close();
      server.closeAllConnections();
      await new Promise((resolve) => server.close(resolve));
      await testApp.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}
