import { and, asc, eq } from 'drizzle-orm';
import { recordRequestAudit, type Actor } from '../auth/audit';
import type { Db } from '../db/client';
import { memberships, projects } from '../db/schema';

export interface ProjectInput {
  name: string;
  description: string;
}

/** Members see their projects with their role; an organisation admin sees every project, as owner where not a member. */
export function projectsOf(db: Db, user: { id: number; isAdmin: boolean }) {
  return db
    .select({ id: projects.id, name: projects.name, description: projects.description, role: memberships.role })
    .from(projects)
    .leftJoin(memberships, and(eq(memberships.projectId, projects.id), eq(memberships.userId, user.id)))
    .orderBy(asc(projects.name))
    .all()
    .filter((row) => row.role !== null || user.isAdmin)
    .map((row) => ({ ...row, role: row.role ?? ('owner' as const) }));
}

/** A new project with its creator as its owner. */
export function createProject(db: Db, input: ProjectInput, by: { user: { id: number } }) {
  return db.transaction((tx) => {
    const row = tx.insert(projects).values(input).returning().get();
    tx.insert(memberships).values({ projectId: row.id, userId: by.user.id, role: 'owner' }).run();
    recordRequestAudit(tx, { user: by.user, projectId: row.id }, 'project.create', row.name, { projectId: row.id });
    return row;
  });
}

/** Writes take `by`, the request that asks for them, for the audit line they write in the same transaction. */
export function updateProject(db: Db, projectId: number, patch: Partial<ProjectInput>, by: Actor) {
  return db.transaction((tx) => {
    const row = tx.update(projects).set(patch).where(eq(projects.id, projectId)).returning().get();
    recordRequestAudit(tx, by, 'project.update', row.name, { changed: Object.keys(patch) });
    return row;
  });
}

/** Deletes a project and all it holds. */
export function deleteProject(db: Db, projectId: number, by: Actor): void {
  db.transaction((tx) => {
    const row = tx.delete(projects).where(eq(projects.id, projectId)).returning({ name: projects.name }).get();
    // The line outlives the project: it names it, and carries no project id that would dangle.
    recordRequestAudit(tx, { user: by.user }, 'project.delete', row?.name ?? `project ${projectId}`, { projectId });
  });
}
