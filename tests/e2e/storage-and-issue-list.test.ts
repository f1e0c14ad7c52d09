import { writeFileSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';
import { collectPageErrors, expectNoPageErrors, failedResourceLoad, startInSi } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { directAirSample, storedRunHourBytes, threeDaysCsv } from '../support/study-setup';

let h: BrowserHarness;
let projectId: number;
let engineer: TestPerson;
let pageErrors: string[] = [];

beforeAll(async () => {
  // A 50 kB limit, so the three-day file and a few runs show on the meter.
  h = await startBrowserHarness({ storageLimitBytes: 50_000 });
  engineer = personWithSession(h.testApp.db, 'ada.quennell@example.test');
  projectId = projectWithMembers(h.testApp.db, 'Harbour annex study', [[engineer, 'engineer']]);
  await h.signInAs(engineer);
  pageErrors = collectPageErrors(h.page, { ignoreConsole: failedResourceLoad });
  await startInSi(h.page);
});
afterEach(() => expectNoPageErrors(pageErrors));
afterAll(() => h?.close());

describe('storage against the limit, and a long issue list', () => {
  it('shows on the project page what the project stores against its limit', { timeout: 120_000 }, async () => {
    const site = await h.api<{ site: { id: number } }>(
      engineer,
      'POST',
      `/projects/${projectId}/sites`,
      JSON.stringify({ name: 'Quay 4', elevationM: 8 }),
      'application/json',
    );
    const file = await h.api<{ climateFile: { id: number } }>(
      engineer,
      'POST',
      `/projects/${projectId}/sites/${site.site.id}/climate-files?fileName=three-days.csv`,
      threeDaysCsv,
      'text/csv',
    );
    const scenario = await h.api<{ scenario: { id: number } }>(
      engineer,
      'POST',
      `/projects/${projectId}/scenarios`,
      JSON.stringify({ scenario: directAirSample }),
      'application/json',
    );
    await h.api(
      engineer,
      'POST',
      `/projects/${projectId}/runs`,
      JSON.stringify({ scenarioIds: [scenario.scenario.id, scenario.scenario.id], climateFileIds: [file.climateFile.id] }),
      'application/json',
    );
    await h.testApp.runQueue.idle();

    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}`);
    const meter = page.getByTestId('storage-meter');
    await meter.waitFor();
    // 2,608 + 72 × 33 + 80 = 5,064 bytes of climate file; each run's three columns, at most 72 × 10 + 48 = 768 bytes
    // plain, are stored deflated: the blobs' lengths as SQLite reads them, and the meter says the same.
    const runHourBytes = storedRunHourBytes(h.testApp.db, projectId);
    expect(runHourBytes).toBeGreaterThan(0);
    expect(runHourBytes).toBeLessThan(2 * 768);
    const kB = (bytes: number) => (bytes / 1000).toFixed(1).replace('.', '\\.');
    const percent = Math.round(((5_064 + runHourBytes) / 50_000) * 100);
    expect(await meter.innerText()).toMatch(
      new RegExp(`^Storage\\s+${kB(5_064 + runHourBytes)} kB of 50 kB \\(${percent} %\\)\\s+climate files 5\\.1 kB · run hours ${kB(runHourBytes)} kB$`),
    );
    await h.shot('project-storage-meter');
  });

  it('says the report lists the first 200 of the issues and links the full list', { timeout: 120_000 }, async () => {
    const start = Date.UTC(2020, 0, 1);
    const rows = Array.from(
      { length: 1_000 },
      (_, i) => `${new Date(start + i * 3_600_000).toISOString().slice(0, 16)}Z,${i % 3 === 0 ? `warm${i}` : '12.5'},55`,
    );
    const folder = mkdtempSync(path.join(tmpdir(), 'tramontane-broken-'));
    const broken = path.join(folder, 'broken-thermometer.csv');
    writeFileSync(broken, ['timestamp,dry_bulb_c,relative_humidity_pct', ...rows].join('\n'));

    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/climate-files/new`);
    await page.getByRole('button', { name: /Continue with Quay 4/ }).click();
    await page.getByLabel('File', { exact: true }).setInputFiles(broken);
    await page.getByRole('button', { name: 'Read the file' }).click();
    await page.getByTestId('mapping-editor').waitFor();
    await page.getByRole('button', { name: 'Continue to the report' }).click();
    const count = page.getByTestId('issue-count');
    await count.waitFor();
    // 334 unreadable dry-bulb cells (every third of 1,000 rows) and the error that refuses the file.
    expect(await count.innerText()).toBe('Listed: the first 200 of 335 issues, and the errors after them. Download all 335 as CSV');
    const link = page.getByRole('link', { name: 'Download all 335 as CSV' });
    expect(await link.getAttribute('href')).toMatch(new RegExp(`^/api/projects/${projectId}/climate-issue-lists/\\d+$`));
    await count.scrollIntoViewIfNeeded();
    await h.screenshot('climate-upload-report-first-200');
  });
});
