import { createHash } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { and, eq, gt } from 'drizzle-orm';
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
  }
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

function readCookie(req: Request, name: string): string | undefined {
  const header = req.headers.cookie;
  if (!header) return undefined;
  for (const part of header.split(';')) {
    const eqAt = part.indexOf('=');
    if (eqAt < 0) continue;
    if (part.slice(0, eqAt).trim() === name) return decodeURIComponent(part.slice(eqAt + 1).trim());
  }
  return undefined;
}

/** Attaches the signed-in person, if the session cookie names a live session. */
export function loadSession(db: Db): RequestHandler {
  return (req, _res, next) => {
    const token = readCookie(req, sessionCookieName);
    if (!token) return next();
    const row = db
      .select({ id: users.id, email: users.email, name: users.name, isAdmin: users.isAdmin })
      .from(sessions)
      .innerJoin(users, eq(users.id, sessions.userId))
      .where(and(eq(sessions.tokenHash, hashToken(token)), gt(sessions.expiresAt, new Date())))
      .get();
    if (row) req.user = row;
    next();
  };
}
