import { and, desc, eq } from 'drizzle-orm';
import type { Request } from 'express';
import { z } from 'zod';
import { withoutControlCharacters } from '../../shared/schemas/plain-text';
import type { ReportData } from '../../shared/report';
import { recordRequestAudit, type Actor } from '../auth/audit';
import { hashToken, randomToken } from '../auth/session';
import type { Db } from '../db/client';
import { memberships, shareLinks, shareTargets, users } from '../db/schema';
import { HttpError } from '../http-error';
import { comparisonReport, runReport } from './load-report';

const day = 86_400_000;
/** The longest a link may stay open to anyone. */
export const maxPublicDays = 90;

export const createShareInput = z
  .object({
    target: z.enum(shareTargets, { error: "target must be 'run' or 'comparison'" }),
    /** One run for a run report; two or more for a comparison, the baseline first. */
    runIds: z.array(z.number().int().positive()).min(1, 'runIds must name at least one run').max(12, 'at most 12 runs'),
    title: z
      .string()
      .trim()
      .min(1, 'title must not be empty')
      .max(200, 'title must be at most 200 characters')
      .refine(...withoutControlCharacters('title')),
    /** ISO 8601 date-time; absent or null keeps the link for signed-in members of the project only. */
    publicUntil: z.iso.datetime({ offset: true, error: 'publicUntil must be an ISO 8601 date-time, e.g. 2026-03-31T23:59:59Z' }).nullish(),
  })
  .refine((s) => new Set(s.runIds).size === s.runIds.length, { message: 'runIds must not repeat a run', path: ['runIds'] })
  .refine((s) => (s.target === 'run' ? s.runIds.length === 1 : s.runIds.length >= 2), {
    message: 'a run report shares exactly one run; a comparison two or more',
    path: ['runIds'],
  });

/** A public end date must lie ahead of now and at most `maxPublicDays` away. */
export function checkPublicUntil(text: string | null | undefined, now: Date): Date | null {
  if (!text) return null;
  const until = new Date(text);
  if (until.getTime() <= now.getTime()) {
    throw new HttpError(400, 'invalid_request', `publicUntil ${text} is in the past; choose a date after today.`);
  }
  if (until.getTime() > now.getTime() + maxPublicDays * day) {
    throw new HttpError(
      400,
      'invalid_request',
      `publicUntil may be at most ${maxPublicDays} days ahead (until ${new Date(now.getTime() + maxPublicDays * day).toISOString().slice(0, 10)}).`,
    );
  }
  return until;
}

export type ShareState = 'members' | 'public' | 'public-ended' | 'revoked';

export function shareState(link: typeof shareLinks.$inferSelect, now: Date): ShareState {
  if (link.revokedAt) return 'revoked';
  if (!link.publicUntil) return 'members';
  return link.publicUntil.getTime() > now.getTime() ? 'public' : 'public-ended';
}

/** A link as its owner's list shows it; the token itself is never stored, so never listed. */
export function presentLink(link: typeof shareLinks.$inferSelect, createdByName: string | null, now: Date) {
  return {
    id: link.id,
    target: link.target,
    runIds: JSON.parse(link.runIdsJson) as number[],
    title: link.title,
    publicUntil: link.publicUntil?.toISOString() ?? null,
    createdAt: link.createdAt.toISOString(),
    createdByName,
    revokedAt: link.revokedAt?.toISOString() ?? null,
    state: shareState(link, now),
  };
}

export function listLinks(db: Db, projectId: number, now: Date) {
  return db
    .select({ link: shareLinks, name: users.name })
    .from(shareLinks)
    .leftJoin(users, eq(users.id, shareLinks.createdBy))
    .where(eq(shareLinks.projectId, projectId))
    .orderBy(desc(shareLinks.id))
    .all()
    .map(({ link, name }) => presentLink(link, name, now));
}

/** A new random token (32 bytes) and the row that keeps only its SHA-256. */
export function newShareToken(): { token: string; tokenHash: string } {
  const token = randomToken(32);
  return { token, tokenHash: hashToken(token) };
}

const tokenShape = /^[A-Za-z0-9_-]{43}$/;

/**
 * The link a token names, if the caller may open it: refused with 404 when unknown, 410 when revoked;
 * outside a public period only a signed-in member of the project (or an admin) gets through.
 */
export function resolveShareToken(db: Db, req: Request, token: string, now: Date): typeof shareLinks.$inferSelect {
  const link = tokenShape.test(token)
    ? db
        .select()
        .from(shareLinks)
        .where(eq(shareLinks.tokenHash, hashToken(token)))
        .get()
    : undefined;
  if (!link)
    throw new HttpError(404, 'not_found', 'This report link is not known. Check that it was copied whole, or ask the person who shared it for a new one.');
  const state = shareState(link, now);
  if (state === 'revoked') {
    throw new HttpError(410, 'link_revoked', 'This report link was revoked by the project owner and no longer opens the report. Ask them for a new link.');
  }
  if (state === 'public') return link;
  const ended = state === 'public-ended' ? `Its public period ended on ${link.publicUntil!.toISOString().slice(0, 10)}; now ` : '';
  const user = req.user;
  if (!user) {
    throw new HttpError(401, 'unauthenticated', `${ended}${ended ? 'only' : 'Only'} signed-in members of the project can open this report. Sign in to see it.`);
  }
  if (user.isAdmin) return link;
  const member = db
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.projectId, link.projectId), eq(memberships.userId, user.id)))
    .get();
  if (!member)
    throw new HttpError(403, 'forbidden', `${ended}${ended ? 'only' : 'Only'} members of the project can open this report; ask its owner to add you.`);
  return link;
}

/**
 * Creates a share link of finished runs of the project: the runs are checked now (through the report they make)
 * rather than when a reader opens it, and the public end date must lie ahead. The token is given this once; only its
 * SHA-256 is kept.
 */
export function createShareLink(
  db: Db,
  projectId: number,
  input: z.infer<typeof createShareInput>,
  by: Actor & { user: { id: number; name: string } },
  at: Date,
) {
  const publicUntil = checkPublicUntil(input.publicUntil, at);
  if (input.target === 'run') runReport(db, projectId, input.runIds[0], at);
  else comparisonReport(db, projectId, input.runIds, input.runIds[0], at);
  const { token, tokenHash } = newShareToken();
  const link = db.transaction((tx) => {
    const row = tx
      .insert(shareLinks)
      .values({
        projectId,
        tokenHash,
        target: input.target,
        runIdsJson: JSON.stringify(input.runIds),
        title: input.title,
        publicUntil,
        createdBy: by.user.id,
        createdAt: at,
      })
      .returning()
      .get();
    recordRequestAudit(tx, by, 'share.create', input.title, {
      linkId: row.id,
      target: input.target,
      runIds: input.runIds,
      publicUntil: publicUntil?.toISOString() ?? null,
    });
    return row;
  });
  return { link: presentLink(link, by.user.name, at), token };
}

/** Revokes one of the project's links (404 when it is not in the project); revoking a revoked link changes nothing. */
export function revokeShareLink(db: Db, projectId: number, linkId: number, by: Actor, at: Date) {
  const link = db
    .select()
    .from(shareLinks)
    .where(and(eq(shareLinks.id, linkId), eq(shareLinks.projectId, projectId)))
    .get();
  if (!link) throw new HttpError(404, 'not_found', `Share link ${linkId} was not found in this project.`);
  const revoked = db.transaction((tx) => {
    const row = link.revokedAt ? link : tx.update(shareLinks).set({ revokedAt: at }).where(eq(shareLinks.id, linkId)).returning().get();
    if (!link.revokedAt) recordRequestAudit(tx, by, 'share.revoke', link.title, { linkId, target: link.target, runIds: JSON.parse(link.runIdsJson) });
    return row;
  });
  return presentLink(revoked, null, at);
}

/** The report a share link shows, built afresh from the runs it names. */
export function linkedReport(db: Db, link: typeof shareLinks.$inferSelect, now: Date): ReportData {
  const runIds = JSON.parse(link.runIdsJson) as number[];
  return link.target === 'run' ? runReport(db, link.projectId, runIds[0], now) : comparisonReport(db, link.projectId, runIds, runIds[0], now);
}
