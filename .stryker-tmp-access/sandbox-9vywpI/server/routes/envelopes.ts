// @ts-nocheck
import { and, eq } from 'drizzle-orm';
import { z } from 'zod';
import { withoutControlCharacters } from '../../shared/schemas/plain-text';
import { ENVELOPE_PRESETS, envelopeSchema } from '../../shared/scenario';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { recordRequestAudit } from '../auth/audit';
import { envelopes } from '../db/schema';
import { HttpError } from '../http-error';

const envelopeInput = z.object({
  name: z
    .string()
    .trim()
    .min(1, 'name must not be empty')
    .max(120)
    .refine(...withoutControlCharacters('name')),
  note: z
    .string()
    .max(2000)
    .refine(...withoutControlCharacters('note', { multiLine: true }))
    .default(''),
  limits: envelopeSchema,
});
const envelopeParams = z.object({ envelopeId: z.coerce.number().int().positive('envelopeId must be a positive whole number') });

function present(row: typeof envelopes.$inferSelect) {
  const { limitsJson, ...rest } = row;
  return { ...rest, limits: JSON.parse(limitsJson) };
}

export function envelopeRoutes({ db }: AppDeps): RouteSpec[] {
  return [
    route('get', '/envelope-presets', access.signedIn, (_req, res) => {
      res.json({ presets: ENVELOPE_PRESETS });
    }),
    route('get', '/projects/:projectId/envelopes', access.viewer, (req, res) => {
      res.json({ envelopes: db.select().from(envelopes).where(eq(envelopes.projectId, req.projectId!)).all().map(present) });
    }),
    route('post', '/projects/:projectId/envelopes', access.engineer, (req, res) => {
      const input = envelopeInput.parse(req.body);
      const row = db.transaction((tx) => {
        const created = tx
          .insert(envelopes)
          .values({ projectId: req.projectId!, name: input.name, note: input.note, limitsJson: JSON.stringify(input.limits) })
          .returning()
          .get();
        recordRequestAudit(tx, req, 'envelope.create', created.name, { envelopeId: created.id, limits: input.limits });
        return created;
      });
      res.status(201).json({ envelope: present(row) });
    }),
    route('delete', '/projects/:projectId/envelopes/:envelopeId', access.engineer, (req, res) => {
      const { envelopeId } = envelopeParams.parse(req.params);
      db.transaction((tx) => {
        const deleted = tx
          .delete(envelopes)
          .where(and(eq(envelopes.id, envelopeId), eq(envelopes.projectId, req.projectId!)))
          .returning({ name: envelopes.name })
          .get();
        if (!deleted) throw new HttpError(404, 'not_found', `Envelope ${envelopeId} was not found in this project.`);
        recordRequestAudit(tx, req, 'envelope.delete', deleted.name, { envelopeId });
      });
      res.status(204).end();
    }),
  ];
}
