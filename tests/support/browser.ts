import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { createServer, type Server } from 'node:http';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { inject } from 'vitest';
import { appRoot } from '../../server/paths';
import { startSignInStack, type SignInStack } from './sign-in';

export const screenshotFolder = path.join(appRoot, 'test-results', 'screenshots');

export interface BrowserHarness {
  baseUrl: string;
  page: Page;
  context: BrowserContext;
  /** The app with the fake sign-in provider and fake SMTP server beside it. */
  testApp: SignInStack;
  screenshot: (name: string) => Promise<string>;
  close: () => Promise<void>;
}

/** The built app on a free loopback port, and Debian's Chromium with a fresh profile pointed at it. */
export async function startBrowserHarness(): Promise<BrowserHarness> {
  // The port comes first: the fake sign-in provider must know the app's callback address.
  const server: Server = await new Promise((resolve) => {
    const s = createServer().listen(0, '127.0.0.1', () => resolve(s));
  });
  const baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const testApp: SignInStack = await startSignInStack({ publicUrl: baseUrl, overrides: { clientDist: inject('clientDist') } });
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
  return {
    baseUrl,
    page,
    context,
    testApp,
    screenshot: async (name) => {
      const file = path.join(screenshotFolder, `${name}.png`);
      await page.screenshot({ path: file, fullPage: true });
      return file;
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
