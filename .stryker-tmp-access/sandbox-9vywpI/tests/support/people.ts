// @ts-nocheck
import { randomBytes } from 'node:crypto';
import type { Db } from '../../server/db/client';
import { memberships, projects, sessions, users, type ProjectRole } from '../../server/db/schema';
import { hashToken, sessionCookieName } from '../../server/auth/session';

export interface TestPerson {
  id: number;
  email: string;
  /** Cookie header value that signs requests in as this person. */
  cookie: string;
}

/** A person with a live session, made directly in the database (the sign-in flow has its own tests). */
export function personWithSession(db: Db, email: string, options: { isAdmin?: boolean } = {}): TestPerson {
  const user = db
    .insert(users)
    .values({ email, name: email.split('@')[0], isAdmin: options.isAdmin ?? false })
    .returning()
    .get();
  return sessionFor(db, user);
}

/** A fresh session for someone already stored (a demo person, say), as if they had just signed in. */
export function sessionFor(db: Db, user: { id: number; email: string }): TestPerson {
  const token = randomBytes(24).toString('base64url');
  const now = Date.now();
  db.insert(sessions)
    .values({
      tokenHash: hashToken(token),
      userId: user.id,
      createdAt: new Date(now),
      lastSeenAt: new Date(now),
      expiresAt: new Date(now + 3_600_000),
    })
    .run();
  return { id: user.id, email: user.email, cookie: `${sessionCookieName}=${token}` };
}

export function projectWithMembers(db: Db, name: string, members: Array<[TestPerson, ProjectRole]>): number {
  const project = db.insert(projects).values({ name }).returning().get();
  for (const [person, role] of members) db.insert(memberships).values({ projectId: project.id, userId: person.id, role }).run();
  return project.id;
}

/** Headers a signed-in browser sends with a state-changing request. */
export function asPerson(person: TestPerson): Record<string, string> {
  return { cookie: person.cookie, 'x-tramontane-request': '1' };
}
