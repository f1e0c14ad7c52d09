import { count } from 'drizzle-orm';
import type { Db } from '../db/client';
import { projects } from '../db/schema';
import { seedDemoPeople } from './people';

/**
 * Fills an empty database with the synthetic demo workspace. Every project, person and site in it
 * is invented. Does nothing when any project exists, so a user's data is never touched.
 */
export function seedDemo(db: Db): { seeded: boolean } {
  const existing = db.select({ n: count() }).from(projects).get();
  if (existing && existing.n > 0) return { seeded: false };
  db.transaction((tx) => {
    const project = tx
      .insert(projects)
      .values({
        name: 'Larchfield campus study (demo)',
        description: 'Synthetic demo project: four invented sites with synthetic weather, for trying Tramontane.',
      })
      .returning({ id: projects.id })
      .get();
    seedDemoPeople(tx, project.id);
  });
  return { seeded: true };
}
