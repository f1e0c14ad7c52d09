import { and, eq } from 'drizzle-orm';
import type { z } from 'zod';
import type { envelopeSchema } from '../../shared/scenario';
import { recordRequestAudit, type Actor } from '../auth/audit';
import type { Db } from '../db/client';
import { envelopes } from '../db/schema';
import { HttpError } from '../http-error';

/** A project's own envelope as the API gives it: its limits parsed. */
function present(row: typeof envelopes.$inferSelect) {
  const { limitsJson, ...rest } = row;
  return { ...rest, limits: JSON.parse(limitsJson) };
}

export function listEnvelopes(db: Db, projectId: number) {
  return db.select().from(envelopes).where(eq(envelopes.projectId, projectId)).all().map(present);
}

/** Writes take `by`, the request that asks for them, for the audit line they write in the same transaction. */
export function createEnvelope(db: Db, projectId: number, input: { name: string; note: string; limits: z.infer<typeof envelopeSchema> }, by: Actor) {
  const row = db.transaction((tx) => {
    const created = tx
      .insert(envelopes)
      .values({ projectId, name: input.name, note: input.note, limitsJson: JSON.stringify(input.limits) })
      .returning()
      .get();
    recordRequestAudit(tx, by, 'envelope.create', created.name, { envelopeId: created.id, limits: input.limits });
    return created;
  });
  return present(row);
}

/** Deletes one of the project's envelopes; 404 when it is not in the project. */
export function deleteEnvelope(db: Db, projectId: number, envelopeId: number, by: Actor): void {
  db.transaction((tx) => {
    const deleted = tx
      .delete(envelopes)
      .where(and(eq(envelopes.id, envelopeId), eq(envelopes.projectId, projectId)))
      .returning({ name: envelopes.name })
      .get();
    if (!deleted) throw new HttpError(404, 'not_found', `Envelope ${envelopeId} was not found in this project.`);
    recordRequestAudit(tx, by, 'envelope.delete', deleted.name, { envelopeId });
  });
}
