// @ts-nocheck
import { and, count, eq, sql } from 'drizzle-orm';
import type { Db } from '../db/client';
import { users } from '../db/schema';
import { recordAudit } from './audit';
import type { VerifiedIdentity } from './oidc';

/**
 * Finds or creates the person behind a verified identity, in one transaction:
 * - the same issuer and subject as before: that person, with name and e-mail refreshed;
 * - otherwise a person added ahead of time (demo people) with the same e-mail and no identity yet,
 *   linked only when the provider says the e-mail is verified;
 * - otherwise a new person.
 * Who becomes an organisation admin: with `adminEmails` given, the people whose provider-verified e-mail is on
 * that list (TRAMONTANE_ADMIN_EMAILS); without it, the first person to sign in while nobody is admin.
 */
export function personForIdentity(
  db: Db,
  identity: VerifiedIdentity,
  now: Date,
  adminEmails: readonly string[] = [],
): { id: number; isAdmin: boolean; created: boolean; madeAdmin: boolean } {
  return db.transaction((tx) => {
    let created = false;
    let person = tx
      .select({ id: users.id })
      .from(users)
      .where(and(eq(users.oidcIssuer, identity.issuer), eq(users.oidcSubject, identity.subject)))
      .get();
    if (!person) {
      const sameEmail = tx
        .select({ id: users.id, oidcSubject: users.oidcSubject })
        .from(users)
        .where(eq(sql`lower(${users.email})`, identity.email))
        .get();
      if (sameEmail && sameEmail.oidcSubject === null && identity.emailVerified) {
        tx.update(users).set({ oidcIssuer: identity.issuer, oidcSubject: identity.subject }).where(eq(users.id, sameEmail.id)).run();
        person = { id: sameEmail.id };
      } else if (sameEmail) {
        // Someone else already holds this address: keep them apart rather than merge two identities.
        throw new EmailTaken(identity.email);
      } else {
        person = tx
          .insert(users)
          .values({ email: identity.email, name: identity.name, oidcIssuer: identity.issuer, oidcSubject: identity.subject })
          .returning({ id: users.id })
          .get();
        created = true;
      }
    }
    const listed = identity.emailVerified && adminEmails.includes(identity.email.toLowerCase());
    const firstPerson = adminEmails.length === 0 && tx.select({ n: count() }).from(users).where(eq(users.isAdmin, true)).get()!.n === 0;
    const wasAdmin = tx.select({ isAdmin: users.isAdmin }).from(users).where(eq(users.id, person.id)).get()!.isAdmin;
    const madeAdmin = !wasAdmin && (listed || firstPerson);
    // Follow a changed address at the provider, unless someone else here already holds it.
    const holder = tx
      .select({ id: users.id })
      .from(users)
      .where(eq(sql`lower(${users.email})`, identity.email))
      .get();
    const email = !holder || holder.id === person.id ? { email: identity.email } : {};
    tx.update(users)
      .set({ name: identity.name, ...email, lastSignInAt: now, ...(madeAdmin ? { isAdmin: true } : {}) })
      .where(eq(users.id, person.id))
      .run();
    const isAdmin = tx.select({ isAdmin: users.isAdmin }).from(users).where(eq(users.id, person.id)).get()!.isAdmin;
    recordAudit(tx, { actorId: person.id, action: 'auth.sign-in', target: identity.email, detail: { issuer: identity.issuer, created, madeAdmin } }, now);
    return { id: person.id, isAdmin, created, madeAdmin };
  });
}

export class EmailTaken extends Error {
  constructor(readonly email: string) {
    super(`The e-mail ${email} already belongs to another sign-in identity.`);
  }
}
