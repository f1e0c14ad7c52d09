import { and, eq } from 'drizzle-orm';
import type { SiteInput } from '../../shared/schemas/climate-file';
import { recordRequestAudit, type Actor } from '../auth/audit';
import type { Db, DbOrTx } from '../db/client';
import { sites } from '../db/schema';
import { HttpError } from '../http-error';

export type SiteRow = typeof sites.$inferSelect;

/** The site with this id in this project; 404 when there is none. */
export function findSite(db: DbOrTx, projectId: number, siteId: number): SiteRow {
  const site = db
    .select()
    .from(sites)
    .where(and(eq(sites.id, siteId), eq(sites.projectId, projectId)))
    .get();
  if (!site) throw new HttpError(404, 'not_found', `Site ${siteId} was not found in this project.`);
  return site;
}

/** The site a stored row (a climate file, a run's file) points at; the foreign key guarantees it exists. */
export function siteById(db: DbOrTx, siteId: number): SiteRow {
  return db.select().from(sites).where(eq(sites.id, siteId)).get()!;
}

export function listSites(db: Db, projectId: number): SiteRow[] {
  return db.select().from(sites).where(eq(sites.projectId, projectId)).all();
}

/** Writes take `by`, the request that asks for them, for the audit line they write in the same transaction. */
export function createSite(db: Db, projectId: number, input: SiteInput, by: Actor): SiteRow {
  return db.transaction((tx) => {
    const row = tx
      .insert(sites)
      .values({ ...input, projectId })
      .returning()
      .get();
    recordRequestAudit(tx, by, 'site.create', row.name, { siteId: row.id });
    return row;
  });
}

/** Changes the fields the patch carries on a site found with `findSite`. */
export function updateSite(db: Db, site: SiteRow, patch: Partial<SiteInput>, by: Actor): SiteRow {
  return db.transaction((tx) => {
    const row = tx.update(sites).set(patch).where(eq(sites.id, site.id)).returning().get();
    recordRequestAudit(tx, by, 'site.update', row.name, { siteId: site.id, changed: Object.keys(patch) });
    return row;
  });
}

export function deleteSite(db: Db, projectId: number, siteId: number, by: Actor): void {
  const site = findSite(db, projectId, siteId);
  db.transaction((tx) => {
    tx.delete(sites).where(eq(sites.id, siteId)).run();
    recordRequestAudit(tx, by, 'site.delete', site.name, { siteId });
  });
}
