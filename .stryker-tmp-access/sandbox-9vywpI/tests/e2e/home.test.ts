// @ts-nocheck
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';
import { collectPageErrors, expectNoPageErrors } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers } from '../support/people';

let h: BrowserHarness;
let pageErrors: string[] = [];

beforeAll(async () => {
  h = await startBrowserHarness();
  const analyst = personWithSession(h.testApp.db, 'lena.okafor@example.test');
  projectWithMembers(h.testApp.db, 'Existing river site review', [[analyst, 'viewer']]);
  await h.signInAs(analyst);
  // This journey has only ever counted what the page throws, not what it logs.
  pageErrors = collectPageErrors(h.page, { ignoreConsole: () => true });
});
afterAll(() => h?.close());

describe('an analyst on the projects page', () => {
  it('sees their projects with their role, starts a new one and lands on its overview as owner', async () => {
    const page = h.page;
    await page.goto(h.baseUrl);
    await page.getByRole('link', { name: 'Existing river site review' }).waitFor();
    expect(await page.getByRole('cell', { name: 'Viewer' }).isVisible()).toBe(true);

    await page.getByRole('button', { name: 'Start project' }).click();
    expect(await page.getByText('Give the project a name.').isVisible()).toBe(true);
    await h.screenshot('home-new-project-invalid');

    await page.getByLabel('Project name').fill('Fjordside expansion');
    await page.getByLabel(/Description/).fill('Two new halls beside the existing campus (synthetic demo).');
    await page.getByRole('button', { name: 'Start project' }).click();
    await page.waitForURL(/\/projects\/\d+$/);
    await page.getByRole('heading', { name: 'Fjordside expansion' }).waitFor();

    await page.goto(h.baseUrl);
    await page.getByRole('link', { name: 'Fjordside expansion' }).waitFor();
    expect(await page.getByRole('cell', { name: 'Owner' }).isVisible()).toBe(true);
    await h.screenshot('home-projects');
    expectNoPageErrors(pageErrors);
  });
});
