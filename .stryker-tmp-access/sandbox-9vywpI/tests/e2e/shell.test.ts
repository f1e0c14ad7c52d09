// @ts-nocheck
import { existsSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';

let h: BrowserHarness;
beforeAll(async () => {
  h = await startBrowserHarness();
});
afterAll(() => h?.close());

describe('opening Tramontane in a browser', () => {
  it('shows the shell, the server lamp turns to up, and the fonts are the shipped ones', async () => {
    await h.page.goto(h.baseUrl);
    await expect.poll(() => h.page.getByTestId('health').getAttribute('data-state')).toBe('up');
    expect(await h.page.getByTestId('health').innerText()).toContain('Server up');
    expect(await h.page.getByRole('heading', { name: 'Projects' }).isVisible()).toBe(true);
    expect(await h.page.getByText('You are not signed in').isVisible()).toBe(true);
    const fontsLoaded = await h.page.evaluate(async () => {
      await document.fonts.ready;
      return ['IBM Plex Sans', 'JetBrains Mono'].map((f) => document.fonts.check(`12px "${f}"`));
    });
    expect(fontsLoaded).toEqual([true, true]);
    expect(existsSync(await h.screenshot('shell'))).toBe(true);
  });

  it('shows the not-found page for an unknown address', async () => {
    await h.page.goto(`${h.baseUrl}/no/such/page`);
    expect(await h.page.getByRole('heading', { name: 'This page does not exist' }).isVisible()).toBe(true);
    await h.screenshot('not-found');
  });
});
