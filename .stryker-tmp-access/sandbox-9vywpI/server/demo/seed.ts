// @ts-nocheck
import { count, eq } from 'drizzle-orm';
import type { Db } from '../db/client';
import { projects, users } from '../db/schema';
import { demoPeople, seedDemoPeople } from './people';
import { seedDemoClimate } from './climate';
import { seedDemoProjection } from './projections';
import { seedDemoSweep } from './sweeps';
import { seedDemoHybrid } from './hybrid';

/** The demo project's name: how start-up finds the project the seed made (server/demo/rerun.ts). */
export const DEMO_PROJECT_NAME = 'Larchfield campus study (demo)';

/**
 * Fills an empty database with the synthetic demo workspace. Every project, person and site in it
 * is invented. Does nothing when any project exists, so a user's data is never touched.
 */
export function seedDemo(db: Db): { seeded: boolean } {
  const existing = db.select({ n: count() }).from(projects).get();
  if (existing && existing.n > 0) return { seeded: false };
  const { projectId, engineerId } = db.transaction((tx) => {
    const project = tx
      .insert(projects)
      .values({
        name: DEMO_PROJECT_NAME,
        description: 'Synthetic demo project: four invented sites with synthetic weather, for trying Tramontane.',
      })
      .returning({ id: projects.id })
      .get();
    seedDemoPeople(tx, project.id);
    const engineerEmail = demoPeople.find((p) => p.role === 'engineer')?.email ?? '';
    const engineer = tx.select({ id: users.id }).from(users).where(eq(users.email, engineerEmail)).get();
    seedDemoClimate(tx, project.id, engineer?.id ?? null);
    seedDemoSweep(tx, project.id, engineer?.id ?? null);
    seedDemoHybrid(tx, project.id, engineer?.id ?? null);
    return { projectId: project.id, engineerId: engineer?.id ?? null };
  });
  // Made from the stored series, so after the workspace above is in place.
  seedDemoProjection(db, projectId, engineerId);
  return { seeded: true };
}
