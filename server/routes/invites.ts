import { randomBytes } from 'node:crypto';
import type { Request } from 'express';
import { z } from 'zod';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { systemClock } from '../auth/session';
import { projectRoles } from '../db/schema';
import { HttpError } from '../http-error';
import { acceptInvite, listInvites, previewInvite, revokeInvite, sendInvite } from '../members/invites';

const day = 86_400_000;
const newInvite = z.object({ email: z.string().trim().toLowerCase().email().max(200), role: z.enum(projectRoles) }).strict();
const tokenBody = z.object({ token: z.string().min(20).max(4000) });
const inviteIdParam = z.object({ inviteId: z.coerce.number().int().positive() });

export function inviteRoutes(deps: AppDeps): RouteSpec[] {
  const { db } = deps;
  const clock = deps.clock ?? systemClock;
  const lifetimeMs = deps.inviteLifetimeMs ?? 7 * day;
  const secret = deps.secret ?? new Uint8Array(randomBytes(32));
  const baseUrl = (req: Request) => (deps.publicUrl ?? `${req.protocol}://${req.get('host')}`).replace(/\/$/, '');

  return [
    route('get', '/projects/:projectId/invites', access.owner, (req, res) => {
      res.json({ invites: listInvites(db, req.projectId!, clock()) });
    }),

    route('post', '/projects/:projectId/invites', access.owner, async (req, res) => {
      const { email, role } = newInvite.parse(req.body ?? {});
      if (!deps.mailer) throw new HttpError(503, 'mail_unavailable', 'Mail is not set up on this server, so invitations cannot be sent.');
      const invite = await sendInvite(db, {
        projectId: req.projectId!,
        email,
        role,
        inviter: req.user!,
        mailer: deps.mailer,
        secret,
        lifetimeMs,
        baseUrl: baseUrl(req),
        now: clock(),
        logError: deps.logError,
      });
      res.status(201).json({ invite });
    }),

    route('delete', '/projects/:projectId/invites/:inviteId', access.owner, (req, res) => {
      const { inviteId } = inviteIdParam.parse(req.params);
      revokeInvite(db, req.projectId!, inviteId, { actorId: req.user!.id, now: clock() });
      res.status(204).end();
    }),

    // Public: an invitation link opened signed out names the project and the inviter before offering sign-in. The
    // token is the secret; the answer holds nothing its holder could not read in the e-mail.
    route('post', '/invites/preview', access.public, async (req, res) => {
      const { token } = tokenBody.parse(req.body ?? {});
      res.json(await previewInvite(db, secret, token, req.user, clock()));
    }),

    route('post', '/invites/accept', access.signedIn, async (req, res) => {
      const { token } = tokenBody.parse(req.body ?? {});
      res.json(await acceptInvite(db, secret, token, req.user!, clock()));
    }),
  ];
}
