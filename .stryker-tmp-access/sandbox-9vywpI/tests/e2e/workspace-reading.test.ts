// @ts-nocheck
import { and, eq, isNotNull } from 'drizzle-orm';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { climateFiles, projects, runs, scenarios, sites, sweeps, users } from '../../server/db/schema';
import { seedDemo } from '../../server/demo/seed';
import { demoPeople } from '../../server/demo/people';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';
import { collectPageErrors, expectNoPageErrors, failedResourceLoad, startInSi } from '../support/e2e-helpers';
import { sessionFor, type TestPerson } from '../support/people';

/*
 * The demo workspace as people read it: on a phone (390 px), with the keyboard alone, and through a screen reader's
 * eyes (axe-core on every page, failing on serious violations). Everything here is synthetic demo data.
 */

let h: BrowserHarness;
let admin: TestPerson;
let pageErrors: string[] = [];
/** Every page of the workspace, by a short name; their addresses in the demo data are found once it is seeded. */
const pageNames = [
  'home',
  'project',
  'site',
  'climate-file',
  'upload',
  'scenario',
  'run',
  'excursions',
  'report',
  'compare',
  'sweep',
  'new-sweep',
  'envelopes',
  'members',
  'calculator',
  'settings',
  'audit',
  'people',
] as const;
let pathOf: Record<(typeof pageNames)[number], string>;

beforeAll(async () => {
  h = await startBrowserHarness();
  seedDemo(h.testApp.db);
  h.testApp.runQueue.resume();
  await h.testApp.runQueue.idle();
  const db = h.testApp.db;
  const adminPerson = demoPeople.find((p) => p.isAdmin)!;
  admin = sessionFor(db, db.select({ id: users.id, email: users.email }).from(users).where(eq(users.email, adminPerson.email)).get()!);
  const project = db.select({ id: projects.id }).from(projects).get()!;
  const p = `/projects/${project.id}`;
  const site = db.select({ id: sites.id }).from(sites).where(eq(sites.projectId, project.id)).get()!;
  const file = db.select({ id: climateFiles.id }).from(climateFiles).where(eq(climateFiles.projectId, project.id)).get()!;
  const scenario = db.select({ id: scenarios.id }).from(scenarios).where(eq(scenarios.projectId, project.id)).get()!;
  const run = db
    .select({ id: runs.id })
    .from(runs)
    .where(and(eq(runs.projectId, project.id), eq(runs.status, 'done')))
    .get()!;
  const sweep = db.select({ id: sweeps.id }).from(sweeps).where(eq(sweeps.projectId, project.id)).get()!;
  const doneRuns = db
    .select({ id: runs.id })
    .from(runs)
    .where(and(eq(runs.projectId, project.id), isNotNull(runs.resultsJson)))
    .all();
  pathOf = {
    home: '/',
    project: p,
    site: `${p}/sites/${site.id}`,
    'climate-file': `${p}/climate-files/${file.id}`,
    upload: `${p}/climate-files/new`,
    scenario: `${p}/scenarios/${scenario.id}`,
    run: `${p}/runs/${run.id}`,
    excursions: `${p}/runs/${run.id}/excursions`,
    report: `${p}/runs/${run.id}/report`,
    compare: `${p}/compare?runs=${doneRuns
      .slice(0, 2)
      .map((r) => r.id)
      .join(',')}`,
    sweep: `${p}/sweeps/${sweep.id}`,
    'new-sweep': `${p}/sweeps/new`,
    envelopes: `${p}/envelopes`,
    members: `${p}/members`,
    calculator: '/calculator',
    settings: '/settings',
    audit: '/audit',
    people: '/admin/people',
  };
  pageErrors = collectPageErrors(h.page, { ignoreConsole: failedResourceLoad });
  await startInSi(h.page);
  await h.signInAs(admin);
});
afterEach(() => expectNoPageErrors(pageErrors));
afterAll(() => h?.close());

/** Opens a page and waits until nothing on it is still loading. */
async function open(path: string) {
  await h.page.goto(`${h.baseUrl}${path}`);
  await h.page.locator('main :is(h1, h2)').first().waitFor({ timeout: 30_000 });
  await expect.poll(() => h.page.locator('[aria-busy="true"], [aria-label^="Loading"]').count(), { timeout: 30_000 }).toBe(0);
}

/** The accessibility check and a screenshot of the page; a failed check is kept in `problems`, so one run lists every page's. */
async function checked(name: string, problems: string[]) {
  await h.audit(name).catch((error: Error) => problems.push(error.message));
  await h.page.evaluate(() => window.scrollTo(0, 0));
  await h.screenshot(name);
}

/** How far the page is wider than the window, in CSS pixels (0 when nothing runs off the right edge). */
const overflowPx = () => h.page.evaluate(() => document.scrollingElement!.scrollWidth - window.innerWidth);

describe('on a phone, 390 px wide', () => {
  beforeAll(() => h.page.setViewportSize({ width: 390, height: 844 }));

  it.each(pageNames)(
    'the %s page fits the width and passes the accessibility check',
    async (name) => {
      await open(pathOf[name]);
      const problems: string[] = [];
      await checked(`phone-${name}`, problems);
      expect({ overflowPx: await overflowPx(), problems }).toEqual({ overflowPx: 0, problems: [] });
    },
    180_000,
  );

  it('folds the header into a menu that opens on the page, with the account inside the window, and closes with Escape', async () => {
    await open(pathOf.project);
    const menu = h.page.getByRole('button', { name: /^Menu/ });
    expect(await menu.getAttribute('aria-expanded')).toBe('false');
    expect(await h.page.getByRole('button', { name: 'Sign out' }).isVisible()).toBe(false);
    await menu.click();
    expect(await menu.getAttribute('aria-expanded')).toBe('true');
    const signOut = await h.page.getByRole('button', { name: 'Sign out' }).boundingBox();
    expect(signOut!.x + signOut!.width).toBeLessThanOrEqual(390);
    await h.shot('phone-menu-open');
    await h.page.keyboard.press('Escape');
    expect(await menu.getAttribute('aria-expanded')).toBe('false');
    expect(await menu.evaluate((button) => button === document.activeElement)).toBe(true);
  }, 120_000);
});

describe('at a desk, 1440 px wide', () => {
  beforeAll(() => h.page.setViewportSize({ width: 1440, height: 900 }));

  it.each(pageNames)(
    'the %s page passes the accessibility check',
    async (name) => {
      await open(pathOf[name]);
      const problems: string[] = [];
      await checked(`desk-${name}`, problems);
      expect(problems).toEqual([]);
    },
    180_000,
  );
});

describe('with the keyboard alone', () => {
  beforeAll(() => h.page.setViewportSize({ width: 1440, height: 900 }));

  it('skips the header with the first Tab, and reaches "Add site" with the page’s own controls only', async () => {
    await open(pathOf.project);
    await h.page.keyboard.press('Tab');
    expect(await h.page.evaluate(() => document.activeElement?.textContent)).toBe('Skip to content');
    await h.page.keyboard.press('Enter');
    expect(await h.page.evaluate(() => document.activeElement?.id)).toBe('main');
    let tabs = 0;
    while (tabs < 10 && (await h.page.evaluate(() => document.activeElement?.textContent?.trim())) !== 'Add site') {
      await h.page.keyboard.press('Tab');
      tabs++;
    }
    expect(await h.page.evaluate(() => document.activeElement?.textContent?.trim())).toBe('Add site');
    // Only the page's own controls above the sites panel come between (the crumb and the project's actions), none of
    // the header's; before the skip link it took 10 Tabs.
    expect(tabs).toBeLessThanOrEqual(6);
  }, 120_000);

  it('puts the caret in a form it opens, and after Save returns to the button and says what was saved', async () => {
    await open(pathOf.project);
    await h.page.getByRole('button', { name: 'Add site' }).focus();
    await h.page.keyboard.press('Enter');
    await expect.poll(() => h.page.evaluate(() => document.activeElement?.getAttribute('name'))).toBe('name');
    await h.page.keyboard.type('Quillon Ridge (synthetic)');
    await h.page.keyboard.press('Enter');
    await expect.poll(() => h.page.getByRole('status').filter({ hasText: 'added' }).innerText()).toBe('Site “Quillon Ridge (synthetic)” added.');
    await expect.poll(() => h.page.evaluate(() => document.activeElement?.textContent?.trim())).toBe('Add site');
    await h.shot('keyboard-site-added');
  }, 120_000);

  it('closes the Download menu with Escape, leaving the focus on its button', async () => {
    await open(pathOf.run);
    const summary = h.page.getByTestId('download-menu').first().locator('summary');
    await summary.focus();
    await h.page.keyboard.press('Enter');
    expect(await h.page.getByTestId('download-menu').first().getAttribute('open')).toBe('');
    await h.page.keyboard.press('Tab');
    await h.page.keyboard.press('Escape');
    expect(await h.page.getByTestId('download-menu').first().getAttribute('open')).toBeNull();
    expect(await summary.evaluate((element) => element === document.activeElement)).toBe(true);
  }, 120_000);
});
