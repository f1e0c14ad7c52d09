// @ts-nocheck
import type { Db } from '../db/client';
import { memberships, users, type ProjectRole } from '../db/schema';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

export interface DemoPerson {
  /** Their subject at the local fake provider. */
  subject: string;
  name: string;
  email: string;
  isAdmin: boolean;
  role: ProjectRole;
  note: string;
}

/** Invented people for the demo workspace; the README names them so a newcomer can sign in as each role. */
export const demoPeople: DemoPerson[] = [
  {
    subject: 'demo-admin',
    name: 'Maren Vollert',
    email: 'maren.vollert@tramontane.example',
    isAdmin: true,
    role: 'owner',
    note: 'organisation admin; owner of the demo project',
  },
  {
    subject: 'demo-engineer',
    name: 'Tobias Ferrand',
    email: 'tobias.ferrand@tramontane.example',
    isAdmin: false,
    role: 'engineer',
    note: 'design engineer in the demo project',
  },
  {
    subject: 'demo-viewer',
    name: 'Priya Castellane',
    email: 'priya.castellane@calloway-halls.example',
    isAdmin: false,
    role: 'viewer',
    note: 'client reviewer at Calloway Halls (read-only)',
  },
];

/** The demo people as the fake provider's picker shows them. */
export const demoPickerPeople = demoPeople.map(({ subject, name, email, note }) => ({ subject, name, email, note }));

/**
 * Adds the demo people and makes them members of the demo project. They have no sign-in identity
 * until they first sign in through the fake provider, which links them by their (verified) e-mail.
 */
export function seedDemoPeople(tx: Tx, projectId: number): void {
  for (const person of demoPeople) {
    const row = tx
      .insert(users)
      .values({ name: person.name, email: person.email, isAdmin: person.isAdmin })
      .onConflictDoNothing()
      .returning({ id: users.id })
      .get();
    if (row) tx.insert(memberships).values({ projectId, userId: row.id, role: person.role }).onConflictDoNothing().run();
  }
}
