import { and, desc, eq, gte, inArray, lt, lte, type SQL } from 'drizzle-orm';
import type { Db } from '../db/client';
import { auditEvents, projects, users } from '../db/schema';

export interface AuditEntry {
  /** Who did it; null for the system or a signed-out caller. */
  actorId: number | null;
  /** The project it happened in; null for organisation-wide events such as a sign-in. */
  projectId?: number | null;
  /** Dotted verb: `auth.sign-in`, `member.role-changed`, `invite.sent`, `climate.upload`, `run.start`, `project.delete`. */
  action: string;
  /** What it was done to, in words a reader understands. */
  target?: string;
  /** Extra facts; kept as JSON. */
  detail?: Record<string, unknown>;
}

type DbOrTx = Pick<Db, 'select' | 'insert'>;

/**
 * Writes one line of the audit trail. Call it in the same transaction as the change it records, so a
 * change and its record stand or fall together. Names are copied in, so the line survives deletions.
 */
export function recordAudit(db: DbOrTx, entry: AuditEntry, now: Date = new Date()): void {
  const actor = entry.actorId == null ? undefined : db.select({ name: users.name }).from(users).where(eq(users.id, entry.actorId)).get();
  const project = entry.projectId == null ? undefined : db.select({ name: projects.name }).from(projects).where(eq(projects.id, entry.projectId)).get();
  db.insert(auditEvents)
    .values({
      at: now,
      actorId: entry.actorId,
      actorName: actor?.name ?? null,
      projectId: entry.projectId ?? null,
      projectName: project?.name ?? null,
      action: entry.action,
      target: entry.target ?? '',
      detailJson: JSON.stringify(entry.detail ?? {}),
    })
    .run();
}

/** Who made a change, as a project route's request carries it: the signed-in person and the project of the address. */
export interface Actor {
  user?: { id: number };
  projectId?: number;
}

/** The audit line for a change made by the caller of a project route: who, and in which project, come from the request. */
export function recordRequestAudit(db: DbOrTx, req: Actor, action: string, target: string, detail?: Record<string, unknown>): void {
  recordAudit(db, { actorId: req.user?.id ?? null, projectId: req.projectId ?? null, action, target, detail });
}

export interface AuditFilter {
  /** Limit to these projects (an owner's projects); undefined means every event (an admin). */
  projectIds?: number[];
  projectId?: number;
  actorId?: number;
  /** Exact action, or a prefix ending in a dot (`invite.`). */
  action?: string;
  from?: Date;
  to?: Date;
  /** Page backwards: events with an id below this one. */
  beforeId?: number;
  limit: number;
}

export function listAudit(db: Db, filter: AuditFilter) {
  const where: SQL[] = [];
  if (filter.projectIds) where.push(inArray(auditEvents.projectId, filter.projectIds));
  if (filter.projectId !== undefined) where.push(eq(auditEvents.projectId, filter.projectId));
  if (filter.actorId !== undefined) where.push(eq(auditEvents.actorId, filter.actorId));
  if (filter.action) {
    if (filter.action.endsWith('.')) {
      where.push(and(gte(auditEvents.action, filter.action), lt(auditEvents.action, `${filter.action.slice(0, -1)}/`))!);
    } else {
      where.push(eq(auditEvents.action, filter.action));
    }
  }
  if (filter.from) where.push(gte(auditEvents.at, filter.from));
  if (filter.to) where.push(lte(auditEvents.at, filter.to));
  if (filter.beforeId !== undefined) where.push(lt(auditEvents.id, filter.beforeId));
  const rows = db
    .select()
    .from(auditEvents)
    .where(and(...where))
    .orderBy(desc(auditEvents.id))
    .limit(filter.limit)
    .all();
  return rows.map(({ detailJson, ...row }) => ({ ...row, at: row.at.toISOString(), detail: JSON.parse(detailJson) as Record<string, unknown> }));
}
