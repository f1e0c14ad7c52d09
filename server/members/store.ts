import { and, asc, count, eq, ne } from 'drizzle-orm';
import { recordAudit } from '../auth/audit';
import type { Db } from '../db/client';
import { memberships, projects, users, type projectRoles, type unitSystems } from '../db/schema';
import { HttpError } from '../http-error';

type ProjectRole = (typeof projectRoles)[number];

/** Who makes a change and when; the audit line carries both. */
interface By {
  actorId: number;
  now: Date;
}

const membership = (db: Db, projectId: number, userId: number) =>
  db
    .select({ role: memberships.role, name: users.name, email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.projectId, projectId), eq(memberships.userId, userId)))
    .get();

/** The membership to change; 404 when the person is not a member. */
function membershipOr404(db: Db, projectId: number, userId: number) {
  const current = membership(db, projectId, userId);
  if (!current) throw new HttpError(404, 'not_found', `Person ${userId} is not a member of this project.`);
  return current;
}

/** A project always keeps one owner, so someone can still manage it: 409 when this change would leave none. */
function keepAnOwner(db: Db, projectId: number, userId: number): void {
  const others = db
    .select({ n: count() })
    .from(memberships)
    .where(and(eq(memberships.projectId, projectId), eq(memberships.role, 'owner'), ne(memberships.userId, userId)))
    .get()!.n;
  if (others === 0) throw new HttpError(409, 'last_owner', 'A project keeps at least one owner; make someone else owner first.');
}

/** A project's name and its members with their roles, by name. */
export function projectMembers(db: Db, projectId: number) {
  const project = db.select({ id: projects.id, name: projects.name }).from(projects).where(eq(projects.id, projectId)).get();
  if (!project) throw new HttpError(404, 'not_found', `Project ${projectId} was not found.`);
  const members = db
    .select({ userId: users.id, name: users.name, email: users.email, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.projectId, projectId))
    .orderBy(asc(users.name))
    .all();
  return { project, members };
}

export function changeRole(db: Db, projectId: number, userId: number, role: ProjectRole, by: By): void {
  const current = membershipOr404(db, projectId, userId);
  if (current.role === 'owner' && role !== 'owner') keepAnOwner(db, projectId, userId);
  db.transaction((tx) => {
    tx.update(memberships)
      .set({ role })
      .where(and(eq(memberships.projectId, projectId), eq(memberships.userId, userId)))
      .run();
    recordAudit(tx, { actorId: by.actorId, projectId, action: 'member.role-changed', target: current.email, detail: { from: current.role, to: role } }, by.now);
  });
}

export function removeMember(db: Db, projectId: number, userId: number, by: By): void {
  const current = membershipOr404(db, projectId, userId);
  if (current.role === 'owner') keepAnOwner(db, projectId, userId);
  db.transaction((tx) => {
    tx.delete(memberships)
      .where(and(eq(memberships.projectId, projectId), eq(memberships.userId, userId)))
      .run();
    recordAudit(tx, { actorId: by.actorId, projectId, action: 'member.removed', target: current.email, detail: { role: current.role } }, by.now);
  });
}

/** Everyone who has signed in or been added, by name, for the organisation admin. */
export function listPeople(db: Db) {
  return db
    .select({ id: users.id, name: users.name, email: users.email, isAdmin: users.isAdmin, lastSignInAt: users.lastSignInAt })
    .from(users)
    .orderBy(asc(users.name))
    .all();
}

/** Grants or revokes organisation admin; the installation keeps at least one admin (409). */
export function setAdmin(db: Db, userId: number, isAdmin: boolean, by: By): void {
  const person = db.select({ email: users.email, isAdmin: users.isAdmin }).from(users).where(eq(users.id, userId)).get();
  if (!person) throw new HttpError(404, 'not_found', `Person ${userId} was not found.`);
  if (person.isAdmin && !isAdmin) {
    const others = db
      .select({ n: count() })
      .from(users)
      .where(and(eq(users.isAdmin, true), ne(users.id, userId)))
      .get()!.n;
    if (others === 0) throw new HttpError(409, 'last_admin', 'The installation keeps at least one admin.');
  }
  db.transaction((tx) => {
    tx.update(users).set({ isAdmin }).where(eq(users.id, userId)).run();
    recordAudit(tx, { actorId: by.actorId, action: isAdmin ? 'admin.granted' : 'admin.revoked', target: person.email }, by.now);
  });
}

/** A signed-in person as the app shows them: who they are, their settings and their projects with their roles. */
export function personWithProjects(db: Db, userId: number) {
  const row = db
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      isAdmin: users.isAdmin,
      unitSystem: users.unitSystem,
      runNotices: users.runNotices,
    })
    .from(users)
    .where(eq(users.id, userId))
    .get()!;
  const { unitSystem, runNotices, ...user } = row;
  const projectRows = db
    .select({ id: projects.id, name: projects.name, role: memberships.role })
    .from(memberships)
    .innerJoin(projects, eq(projects.id, memberships.projectId))
    .where(eq(memberships.userId, userId))
    .all();
  return { user, settings: { unitSystem, runNotices }, projects: projectRows };
}

/** Saves the settings the patch carries (nothing when it carries none). */
export function updateSettings(db: Db, userId: number, patch: { unitSystem?: (typeof unitSystems)[number]; runNotices?: boolean }): void {
  if (Object.keys(patch).length > 0) db.update(users).set(patch).where(eq(users.id, userId)).run();
}
