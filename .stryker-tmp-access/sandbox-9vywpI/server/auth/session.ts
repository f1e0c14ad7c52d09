// @ts-nocheck
import { createHash, randomBytes } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { and, eq, gt, lt, or, sql } from 'drizzle-orm';
import type { Db } from '../db/client';
import { sessions, users } from '../db/schema';

export const sessionCookieName = 'tramontane_session';

export interface SignedInUser {
  id: number;
  email: string;
  name: string;
  isAdmin: boolean;
}

declare module 'express-serve-static-core' {
  interface Request {
    user?: SignedInUser;
    /** Hash of the session token the request came with, when it names a live session. */
    sessionTokenHash?: string;
  }
}

/** How long a session lives: it ends after `idleMs` without a request, and after `absoluteMs` in any case. */
export interface SessionPolicy {
  idleMs: number;
  absoluteMs: number;
}

const hour = 3_600_000;
export const defaultSessionPolicy: SessionPolicy = { idleMs: 72 * hour, absoluteMs: 30 * 24 * hour };

/** The current time; tests hand in a clock they can move. */
export type Clock = () => Date;
export const systemClock: Clock = () => new Date();

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/** A random, URL-safe secret of `bytes` bytes. */
export function randomToken(bytes = 32): string {
  return randomBytes(bytes).toString('base64url');
}

export function readCookie(req: Request, name: string): string | undefined {
  const header = req.headers.cookie;
  if (!header) return undefined;
  for (const part of header.split(';')) {
    const eqAt = part.indexOf('=');
    if (eqAt < 0) continue;
    if (part.slice(0, eqAt).trim() === name) {
      try {
        return decodeURIComponent(part.slice(eqAt + 1).trim());
      } catch {
        return undefined;
      }
    }
  }
  return undefined;
}

/** Cookie options every auth cookie shares: not readable by scripts, not sent on cross-site sub-requests. */
export function cookieOptions(req: Request, maxAgeMs?: number) {
  return { httpOnly: true, sameSite: 'lax' as const, secure: req.secure, path: '/', ...(maxAgeMs ? { maxAge: maxAgeMs } : {}) };
}

/** Starts a session for a person and sets its cookie; only the token's hash is stored. */
export function startSession(db: Db, req: Request, res: Response, userId: number, policy: SessionPolicy, now: Date): void {
  const token = randomToken();
  db.insert(sessions)
    .values({
      tokenHash: hashToken(token),
      userId,
      createdAt: now,
      lastSeenAt: now,
      expiresAt: new Date(now.getTime() + policy.absoluteMs),
    })
    .run();
  res.cookie(sessionCookieName, token, cookieOptions(req, policy.absoluteMs));
}

export function endSession(db: Db, req: Request, res: Response): void {
  if (req.sessionTokenHash) db.delete(sessions).where(eq(sessions.tokenHash, req.sessionTokenHash)).run();
  res.clearCookie(sessionCookieName, cookieOptions(req));
}

/** Ends every session of a person, on every device. Returns how many ended. */
export function endAllSessions(db: Db, userId: number): number {
  return db.delete(sessions).where(eq(sessions.userId, userId)).run().changes;
}

/** Drops sessions past either limit; called now and then so the table does not grow without end. */
export function purgeExpiredSessions(db: Db, policy: SessionPolicy, now: Date): void {
  db.delete(sessions)
    .where(or(lt(sessions.expiresAt, now), lt(sessions.lastSeenAt, new Date(now.getTime() - policy.idleMs))))
    .run();
}

// Writing lastSeenAt on every request would turn each read into a write; a minute's resolution is plenty.
const touchEveryMs = 60_000;

/** Attaches the signed-in person, if the session cookie names a session within both its limits. */
export function loadSession(db: Db, options: { policy?: SessionPolicy; clock?: Clock } = {}): RequestHandler {
  const policy = options.policy ?? defaultSessionPolicy;
  const clock = options.clock ?? systemClock;
  // Every signed-in request runs this: prepared once (building and preparing it per request was most of its cost).
  const live = db
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      isAdmin: users.isAdmin,
      lastSeenAt: sessions.lastSeenAt,
    })
    .from(sessions)
    .innerJoin(users, eq(users.id, sessions.userId))
    .where(
      and(
        eq(sessions.tokenHash, sql.placeholder('tokenHash')),
        gt(sessions.expiresAt, sql.placeholder('nowMs')),
        gt(sessions.lastSeenAt, sql.placeholder('idleSinceMs')),
      ),
    )
    .prepare();
  return (req, _res, next) => {
    const token = readCookie(req, sessionCookieName);
    if (!token) return next();
    const now = clock();
    const tokenHash = hashToken(token);
    const row = live.get({ tokenHash, nowMs: now.getTime(), idleSinceMs: now.getTime() - policy.idleMs });
    if (!row) return next();
    const { lastSeenAt, ...user } = row;
    req.user = user;
    req.sessionTokenHash = tokenHash;
    if (now.getTime() - lastSeenAt.getTime() >= touchEveryMs) {
      db.update(sessions).set({ lastSeenAt: now }).where(eq(sessions.tokenHash, tokenHash)).run();
    }
    next();
  };
}
