// @ts-nocheck
import { count } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { climateFiles, projects, runs, scenarios, sites, sweeps } from '../../server/db/schema';
import { seedDemo } from '../../server/demo/seed';
import { createTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

const n = (table: typeof projects | typeof sites | typeof climateFiles | typeof scenarios | typeof runs | typeof sweeps) =>
  t.db.select({ n: count() }).from(table).get()!.n;

// Runs every demo run (34 runs over three-year files) on the pool: a busy machine needs the time.
describe('the demo workspace on a fresh installation', { timeout: 240_000 }, () => {
  it('loads four synthetic sites with three years each, a projection, three scenarios with a queued run of each on each site and a sweep, and a hybrid hall on the warm site with its sweep', async () => {
    expect(seedDemo(t.db)).toEqual({ seeded: true });
    expect(n(projects)).toBe(1);
    expect(n(sites)).toBe(4);
    const files = t.db.select().from(climateFiles).all();
    // Four uploads and one synthetic future-climate projection of the first.
    expect(files).toHaveLength(5);
    const projection = files.filter((f) => f.parentId !== null);
    expect(projection).toHaveLength(1);
    expect(projection[0].parentId).toBe(files[0].id);
    expect(JSON.parse(projection[0].derivationJson!).method).toBeTruthy();
    for (const f of files) {
      // Three calendar years of hours (2021–2023: 26,280 hours), give or take the time-zone shift at the ends.
      expect(f.hours).toBeGreaterThan(26_200);
      expect(f.hours).toBeLessThan(26_400);
    }
    expect(n(scenarios)).toBe(4);
    // One run of each single-system scenario on each site, the 13 points (18–30 °C) of the demo sweep, the hybrid
    // hall's run on Teluk Hijau and its 2 × 4 grid (liquid share 0.6, 0.9 × facility water 27, 33, 39, 45 °C).
    expect(n(runs)).toBe(12 + 13 + 1 + 8);
    expect(n(sweeps)).toBe(2);
    expect(t.runQueue.resume()).toBe(12 + 13 + 1 + 8);
    await t.runQueue.idle();
    const statuses = t.db.select({ status: runs.status, error: runs.error }).from(runs).all();
    expect(statuses.filter((r) => r.status !== 'done')).toEqual([]);
  });

  it('leaves a database that already has a project alone', () => {
    expect(seedDemo(t.db)).toEqual({ seeded: false });
    expect(n(projects)).toBe(1);
  });
});
