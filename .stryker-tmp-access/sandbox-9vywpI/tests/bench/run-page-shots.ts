/**
 * Screenshots of the run page for a person to look at (not part of `npm run bench`): the 1-year and 30-year runs of the
 * bench's stage, in SI and IP, full page after it settles. `npx tsx tests/bench/run-page-shots.ts <folder> <prefix>`.
 */
// @ts-nocheck

import path from 'node:path';
import { startRunPageStage } from './run-page-setup';

const [folder = 'test-results/screenshots', prefix = 'run-page'] = process.argv.slice(2);
const stage = await startRunPageStage((line) => console.log(line));
try {
  for (const system of ['SI', 'IP'] as const) {
    await fetch(`${stage.baseUrl}/api/me`, {
      method: 'PATCH',
      headers: { cookie: stage.owner.cookie, 'x-tramontane-request': '1', 'content-type': 'application/json' },
      body: JSON.stringify({ unitSystem: system.toLowerCase() }),
    });
    for (const [name, runId] of Object.entries(stage.runs)) {
      const context = await stage.newContext();
      const page = await context.newPage();
      await page.addInitScript((s) => localStorage.setItem('tramontane.unitSystem', s), system);
      await page.goto(`${stage.baseUrl}/projects/${stage.projectId}/runs/${runId}`);
      await page.waitForSelector('[data-testid="bin-table"]', { timeout: 120_000 });
      await page.waitForFunction(() => document.querySelectorAll('[aria-label^="Loading"]').length === 0, null, { timeout: 120_000 });
      await page.waitForTimeout(500);
      const file = path.join(folder, `${prefix}-${name}-${system}.png`);
      await page.screenshot({ path: file, fullPage: true });
      console.log(file);
      await context.close();
    }
  }
} finally {
  await stage.close();
}
