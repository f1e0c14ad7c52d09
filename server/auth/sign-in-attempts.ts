import { eq, lt } from 'drizzle-orm';
import type { Db } from '../db/client';
import { sessions, signInAttempts } from '../db/schema';
import { hashToken } from './session';

/** How long a started sign-in may take before its callback is refused. */
export const attemptLifetimeMs = 10 * 60_000;

/** Keeps a started sign-in (its state only as a hash) for the callback, and drops the attempts that expired. */
export function saveSignInAttempt(db: Db, start: { state: string; codeVerifier: string; nonce: string }, returnTo: string, now: Date): void {
  db.delete(signInAttempts).where(lt(signInAttempts.expiresAt, now)).run();
  db.insert(signInAttempts)
    .values({
      stateHash: hashToken(start.state),
      codeVerifier: start.codeVerifier,
      nonce: start.nonce,
      returnTo,
      createdAt: now,
      expiresAt: new Date(now.getTime() + attemptLifetimeMs),
    })
    .run();
}

/** The attempt a callback's state names, taken out of the table: that makes the state, and so the callback, single-use. */
export function takeSignInAttempt(db: Db, state: string) {
  return db
    .delete(signInAttempts)
    .where(eq(signInAttempts.stateHash, hashToken(state)))
    .returning()
    .get();
}

/** Ends the session a browser already had when it signs in again: a sign-in always gets a fresh token. */
export function dropSession(db: Db, tokenHash: string): void {
  db.delete(sessions).where(eq(sessions.tokenHash, tokenHash)).run();
}
