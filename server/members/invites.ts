import { and, desc, eq, isNull, sql } from 'drizzle-orm';
import { roleAtLeast } from '../auth/access';
import { recordAudit } from '../auth/audit';
import { readInviteToken, signInviteToken } from '../auth/invite-token';
import type { Db } from '../db/client';
import { invites, memberships, projects, users, type projectRoles } from '../db/schema';
import { HttpError } from '../http-error';
import type { Mailer } from '../mail/mailer';
import { inviteMail } from '../mail/messages';

type ProjectRole = (typeof projectRoles)[number];
type InviteRow = typeof invites.$inferSelect;

function inviteStatus(row: InviteRow, now: Date): 'pending' | 'accepted' | 'revoked' | 'expired' {
  if (row.acceptedAt) return 'accepted';
  if (row.revokedAt) return 'revoked';
  if (row.expiresAt <= now) return 'expired';
  return 'pending';
}

/** The invite behind a token signed with `secret`, or the reason it cannot be used (400 or 410). */
async function openInvite(db: Db, secret: Uint8Array, token: string, now: Date): Promise<InviteRow> {
  const check = await readInviteToken(secret, token, now);
  if (!check.ok) {
    if (check.reason === 'expired') throw new HttpError(410, 'invite_expired', 'This invitation has expired; ask the project owner for a new one.');
    throw new HttpError(400, 'invite_invalid', 'This invitation link is not valid; check that it was copied whole.');
  }
  const row = db.select().from(invites).where(eq(invites.id, check.inviteId)).get();
  if (!row || row.tokenIdHash !== check.tokenIdHash)
    throw new HttpError(400, 'invite_invalid', 'This invitation link is not valid; check that it was copied whole.');
  const status = inviteStatus(row, now);
  if (status === 'accepted') throw new HttpError(410, 'invite_used', 'This invitation has already been used.');
  if (status === 'revoked') throw new HttpError(410, 'invite_revoked', 'This invitation was withdrawn by the project owner.');
  if (status === 'expired') throw new HttpError(410, 'invite_expired', 'This invitation has expired; ask the project owner for a new one.');
  return row;
}

/** A project's invitations, newest first, each with who sent it and its status now. */
export function listInvites(db: Db, projectId: number, now: Date) {
  const rows = db
    .select({ invite: invites, invitedByName: users.name })
    .from(invites)
    .leftJoin(users, eq(users.id, invites.invitedBy))
    .where(eq(invites.projectId, projectId))
    .orderBy(desc(invites.id))
    .all();
  return rows.map(({ invite, invitedByName }) => ({
    id: invite.id,
    email: invite.email,
    role: invite.role,
    invitedBy: invitedByName,
    createdAt: invite.createdAt.toISOString(),
    expiresAt: invite.expiresAt.toISOString(),
    status: inviteStatus(invite, now),
  }));
}

/**
 * Invites someone by e-mail: 409 when they are already a member; the invitation is stored, its signed link mailed,
 * and removed again when the mail cannot be sent (502), so nothing is half-saved.
 */
export async function sendInvite(
  db: Db,
  input: {
    projectId: number;
    email: string;
    role: ProjectRole;
    inviter: { id: number; name: string };
    mailer: Mailer;
    secret: Uint8Array;
    lifetimeMs: number;
    /** The address the app is opened at, without a trailing slash. */
    baseUrl: string;
    now: Date;
    logError?: (error: unknown) => void;
  },
) {
  const { projectId, email, role, now } = input;
  const already = db
    .select({ role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.projectId, projectId), eq(sql`lower(${users.email})`, email)))
    .get();
  if (already) throw new HttpError(409, 'already_member', `${email} is already a member of this project (${already.role}).`);
  const project = db.select({ name: projects.name }).from(projects).where(eq(projects.id, projectId)).get()!;
  const expiresAt = new Date(now.getTime() + input.lifetimeMs);
  const row = db
    .insert(invites)
    .values({ projectId, email, role, tokenIdHash: '', invitedBy: input.inviter.id, createdAt: now, expiresAt })
    .returning({ id: invites.id })
    .get();
  const { token, tokenIdHash } = await signInviteToken(input.secret, row.id, expiresAt);
  db.update(invites).set({ tokenIdHash }).where(eq(invites.id, row.id)).run();
  const link = `${input.baseUrl}/invites/accept?token=${encodeURIComponent(token)}`;
  try {
    await input.mailer.send(inviteMail({ to: email, projectName: project.name, role, inviterName: input.inviter.name, link, expiresAt }));
  } catch (error) {
    db.delete(invites).where(eq(invites.id, row.id)).run();
    input.logError?.(error);
    throw new HttpError(502, 'mail_failed', `The invitation e-mail to ${email} could not be sent; nothing was saved. Try again later.`);
  }
  recordAudit(db, { actorId: input.inviter.id, projectId, action: 'invite.sent', target: email, detail: { role, inviteId: row.id } }, now);
  return { id: row.id, email, role, expiresAt: expiresAt.toISOString(), status: 'pending' as const };
}

/** Withdraws a pending invitation (404 when not in this project, 409 when no longer pending). */
export function revokeInvite(db: Db, projectId: number, inviteId: number, by: { actorId: number; now: Date }): void {
  const row = db
    .select()
    .from(invites)
    .where(and(eq(invites.id, inviteId), eq(invites.projectId, projectId)))
    .get();
  if (!row) throw new HttpError(404, 'not_found', `Invitation ${inviteId} was not found in this project.`);
  const { now } = by;
  if (inviteStatus(row, now) !== 'pending') throw new HttpError(409, 'invite_not_pending', `Invitation ${inviteId} is already ${inviteStatus(row, now)}.`);
  db.transaction((tx) => {
    tx.update(invites).set({ revokedAt: now }).where(eq(invites.id, inviteId)).run();
    recordAudit(tx, { actorId: by.actorId, projectId, action: 'invite.revoked', target: row.email, detail: { inviteId } }, now);
  });
}

/** What an invitation link shows before sign-in: the project, the role, who invited, and whether it is for `reader`. */
export async function previewInvite(db: Db, secret: Uint8Array, token: string, reader: { email: string } | undefined, now: Date) {
  const row = await openInvite(db, secret, token, now);
  const project = db.select({ name: projects.name }).from(projects).where(eq(projects.id, row.projectId)).get();
  const inviter = row.invitedBy ? db.select({ name: users.name }).from(users).where(eq(users.id, row.invitedBy)).get() : undefined;
  return {
    projectId: row.projectId,
    projectName: project?.name ?? '',
    role: row.role,
    email: row.email,
    invitedBy: inviter?.name ?? null,
    expiresAt: row.expiresAt.toISOString(),
    signedIn: Boolean(reader),
    forYou: reader ? row.email === reader.email.toLowerCase() : false,
  };
}

/**
 * Accepts an invitation for the signed-in person it was sent to (403 for someone else), once: of two racing accepts
 * only one changes a row (410 for the other). Accepting never lowers a role someone already holds.
 */
export async function acceptInvite(db: Db, secret: Uint8Array, token: string, user: { id: number; email: string }, now: Date) {
  const row = await openInvite(db, secret, token, now);
  if (row.email !== user.email.toLowerCase()) {
    throw new HttpError(403, 'invite_for_someone_else', `This invitation was sent to ${row.email}; you are signed in as ${user.email}.`);
  }
  const role = db.transaction((tx) => {
    const taken = tx
      .update(invites)
      .set({ acceptedAt: now, acceptedBy: user.id })
      .where(and(eq(invites.id, row.id), isNull(invites.acceptedAt), isNull(invites.revokedAt)))
      .run().changes;
    if (taken !== 1) throw new HttpError(410, 'invite_used', 'This invitation has already been used.');
    const existing = tx
      .select({ role: memberships.role })
      .from(memberships)
      .where(and(eq(memberships.projectId, row.projectId), eq(memberships.userId, user.id)))
      .get();
    const finalRole = existing && roleAtLeast(existing.role, row.role) ? existing.role : row.role;
    tx.insert(memberships)
      .values({ projectId: row.projectId, userId: user.id, role: finalRole })
      .onConflictDoUpdate({ target: [memberships.projectId, memberships.userId], set: { role: finalRole } })
      .run();
    recordAudit(
      tx,
      { actorId: user.id, projectId: row.projectId, action: 'invite.accepted', target: user.email, detail: { role: finalRole, inviteId: row.id } },
      now,
    );
    return finalRole;
  });
  return { projectId: row.projectId, role };
}
