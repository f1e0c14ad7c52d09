import { z } from 'zod';
import { withoutControlCharacters } from '../../shared/schemas/plain-text';
import { ENVELOPE_PRESETS, envelopeSchema } from '../../shared/scenario';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { createEnvelope, deleteEnvelope, listEnvelopes } from '../envelopes/store';

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

export function envelopeRoutes({ db }: AppDeps): RouteSpec[] {
  return [
    route('get', '/envelope-presets', access.signedIn, (_req, res) => {
      res.json({ presets: ENVELOPE_PRESETS });
    }),
    route('get', '/projects/:projectId/envelopes', access.viewer, (req, res) => {
      res.json({ envelopes: listEnvelopes(db, req.projectId!) });
    }),
    route('post', '/projects/:projectId/envelopes', access.engineer, (req, res) => {
      const input = envelopeInput.parse(req.body);
      res.status(201).json({ envelope: createEnvelope(db, req.projectId!, input, req) });
    }),
    route('delete', '/projects/:projectId/envelopes/:envelopeId', access.engineer, (req, res) => {
      const { envelopeId } = envelopeParams.parse(req.params);
      deleteEnvelope(db, req.projectId!, envelopeId, req);
      res.status(204).end();
    }),
  ];
}
