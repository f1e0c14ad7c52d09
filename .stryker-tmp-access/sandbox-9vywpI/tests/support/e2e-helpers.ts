// @ts-nocheck
import type { Page } from 'playwright-core';
import { expect } from 'vitest';

/**
 * Waits until every Plot figure on the page has drawn: its loading placeholder gone and at least `atLeast`
 * svg figures in place. `timeoutMs` is per wait; pages drawing many charts under load want longer.
 */
export async function chartsDrawn(page: Page, { atLeast = 1, timeoutMs = 15_000 }: { atLeast?: number; timeoutMs?: number } = {}) {
  await expect.poll(() => page.locator('[aria-label^="Loading chart"]').count(), { timeout: timeoutMs }).toBe(0);
  await expect.poll(() => page.locator('figure svg').count(), { timeout: timeoutMs }).toBeGreaterThanOrEqual(atLeast);
}

/** The browser's own line for a refused request (a 4xx answer is logged as a failed resource), for `ignoreConsole`. */
export const failedResourceLoad = (text: string) => text.startsWith('Failed to load resource');

/**
 * Collects what the page throws and the errors it logs to the console, from now on; a test ends with
 * `expectNoPageErrors`. `ignoreConsole` passes over console errors a file expects (it is asked at each error,
 * so it may read a variable a test sets).
 */
export function collectPageErrors(page: Page, { ignoreConsole }: { ignoreConsole?: (text: string) => boolean } = {}): string[] {
  const errors: string[] = [];
  page.on('pageerror', (error) => errors.push(`pageerror: ${error.message}`));
  page.on('console', (message) => {
    if (message.type() !== 'error' || ignoreConsole?.(message.text())) return;
    errors.push(`console: ${message.text()}`);
  });
  return errors;
}

/** Fails on any error collected since the last call, and empties the list for the next test. */
export function expectNoPageErrors(errors: string[]) {
  expect(errors.splice(0)).toEqual([]);
}

/**
 * Starts the browser in SI, whatever an earlier run left in its storage: once per tab session, so a switch to IP
 * made on the page holds across the page loads that follow.
 */
export async function startInSi(page: Page) {
  await page.addInitScript(() => {
    // about:blank, where signInAs parks the page, has no storage to reach (reading it throws).
    if (!location.protocol.startsWith('http')) return;
    if (!sessionStorage.getItem('unit-reset')) {
      localStorage.setItem('tramontane.unitSystem', 'SI');
      sessionStorage.setItem('unit-reset', '1');
    }
  });
}
