// @ts-nocheck
import { randomBytes } from 'node:crypto';
import type { Request } from 'express';
import { and, desc, eq, isNull, sql } from 'drizzle-orm';
import { z } from 'zod';
import type { AppDeps } from '../app';
import { access, roleAtLeast, route, type RouteSpec } from '../auth/access';
import { recordAudit } from '../auth/audit';
import { readInviteToken, signInviteToken } from '../auth/invite-token';
import { systemClock } from '../auth/session';
import { invites, memberships, projectRoles, projects, users } from '../db/schema';
import { HttpError } from '../http-error';
import { inviteMail } from '../mail/messages';

const day = 86_400_000;
const newInvite = z.object({ email: z.string().trim().toLowerCase().email().max(200), role: z.enum(projectRoles) }).strict();
const tokenBody = z.object({ token: z.string().min(20).max(4000) });
const inviteIdParam = z.object({ inviteId: z.coerce.number().int().positive() });

type InviteRow = typeof invites.$inferSelect;

function inviteStatus(row: InviteRow, now: Date): 'pending' | 'accepted' | 'revoked' | 'expired' {
  if (row.acceptedAt) return 'accepted';
  if (row.revokedAt) return 'revoked';
  if (row.expiresAt <= now) return 'expired';
  return 'pending';
}

export function inviteRoutes(deps: AppDeps): RouteSpec[] {
  const { db } = deps;
  const clock = deps.clock ?? systemClock;
  const lifetimeMs = deps.inviteLifetimeMs ?? 7 * day;
  const secret = deps.secret ?? new Uint8Array(randomBytes(32));
  const baseUrl = (req: Request) => (deps.publicUrl ?? `${req.protocol}://${req.get('host')}`).replace(/\/$/, '');

  /** The invite behind a token, or the reason it cannot be used. */
  const openInvite = async (token: string, now: Date) => {
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
  };

  return [
    route('get', '/projects/:projectId/invites', access.owner, (req, res) => {
      const now = clock();
      const rows = db
        .select({ invite: invites, invitedByName: users.name })
        .from(invites)
        .leftJoin(users, eq(users.id, invites.invitedBy))
        .where(eq(invites.projectId, req.projectId!))
        .orderBy(desc(invites.id))
        .all();
      res.json({
        invites: rows.map(({ invite, invitedByName }) => ({
          id: invite.id,
          email: invite.email,
          role: invite.role,
          invitedBy: invitedByName,
          createdAt: invite.createdAt.toISOString(),
          expiresAt: invite.expiresAt.toISOString(),
          status: inviteStatus(invite, now),
        })),
      });
    }),

    route('post', '/projects/:projectId/invites', access.owner, async (req, res) => {
      const projectId = req.projectId!;
      const { email, role } = newInvite.parse(req.body ?? {});
      if (!deps.mailer) throw new HttpError(503, 'mail_unavailable', 'Mail is not set up on this server, so invitations cannot be sent.');
      const already = db
        .select({ role: memberships.role })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(and(eq(memberships.projectId, projectId), eq(sql`lower(${users.email})`, email)))
        .get();
      if (already) throw new HttpError(409, 'already_member', `${email} is already a member of this project (${already.role}).`);
      const project = db.select({ name: projects.name }).from(projects).where(eq(projects.id, projectId)).get()!;
      const now = clock();
      const expiresAt = new Date(now.getTime() + lifetimeMs);
      const row = db
        .insert(invites)
        .values({ projectId, email, role, tokenIdHash: '', invitedBy: req.user!.id, createdAt: now, expiresAt })
        .returning({ id: invites.id })
        .get();
      const { token, tokenIdHash } = await signInviteToken(secret, row.id, expiresAt);
      db.update(invites).set({ tokenIdHash }).where(eq(invites.id, row.id)).run();
      const link = `${baseUrl(req)}/invites/accept?token=${encodeURIComponent(token)}`;
      try {
        await deps.mailer.send(inviteMail({ to: email, projectName: project.name, role, inviterName: req.user!.name, link, expiresAt }));
      } catch (error) {
        db.delete(invites).where(eq(invites.id, row.id)).run();
        deps.logError?.(error);
        throw new HttpError(502, 'mail_failed', `The invitation e-mail to ${email} could not be sent; nothing was saved. Try again later.`);
      }
      recordAudit(db, { actorId: req.user!.id, projectId, action: 'invite.sent', target: email, detail: { role, inviteId: row.id } }, now);
      res.status(201).json({ invite: { id: row.id, email, role, expiresAt: expiresAt.toISOString(), status: 'pending' } });
    }),

    route('delete', '/projects/:projectId/invites/:inviteId', access.owner, (req, res) => {
      const { inviteId } = inviteIdParam.parse(req.params);
      const row = db
        .select()
        .from(invites)
        .where(and(eq(invites.id, inviteId), eq(invites.projectId, req.projectId!)))
        .get();
      if (!row) throw new HttpError(404, 'not_found', `Invitation ${inviteId} was not found in this project.`);
      const now = clock();
      if (inviteStatus(row, now) !== 'pending') throw new HttpError(409, 'invite_not_pending', `Invitation ${inviteId} is already ${inviteStatus(row, now)}.`);
      db.transaction((tx) => {
        tx.update(invites).set({ revokedAt: now }).where(eq(invites.id, inviteId)).run();
        recordAudit(tx, { actorId: req.user!.id, projectId: req.projectId!, action: 'invite.revoked', target: row.email, detail: { inviteId } }, now);
      });
      res.status(204).end();
    }),

    // Public: an invitation link opened signed out names the project and the inviter before offering sign-in. The
    // token is the secret; the answer holds nothing its holder could not read in the e-mail.
    route('post', '/invites/preview', access.public, async (req, res) => {
      const { token } = tokenBody.parse(req.body ?? {});
      const row = await openInvite(token, clock());
      const project = db.select({ name: projects.name }).from(projects).where(eq(projects.id, row.projectId)).get();
      const inviter = row.invitedBy ? db.select({ name: users.name }).from(users).where(eq(users.id, row.invitedBy)).get() : undefined;
      res.json({
        projectId: row.projectId,
        projectName: project?.name ?? '',
        role: row.role,
        email: row.email,
        invitedBy: inviter?.name ?? null,
        expiresAt: row.expiresAt.toISOString(),
        signedIn: Boolean(req.user),
        forYou: req.user ? row.email === req.user.email.toLowerCase() : false,
      });
    }),

    route('post', '/invites/accept', access.signedIn, async (req, res) => {
      const { token } = tokenBody.parse(req.body ?? {});
      const now = clock();
      const row = await openInvite(token, now);
      const user = req.user!;
      if (row.email !== user.email.toLowerCase()) {
        throw new HttpError(403, 'invite_for_someone_else', `This invitation was sent to ${row.email}; you are signed in as ${user.email}.`);
      }
      const role = db.transaction((tx) => {
        // The conditional update is the single-use guard: of two racing accepts only one changes a row.
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
        // Accepting never lowers a role someone already holds.
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
      res.json({ projectId: row.projectId, role });
    }),
  ];
}
