// @ts-nocheck
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { HttpError } from '../http-error';

export function mailboxRoutes(deps: AppDeps): RouteSpec[] {
  return [
    // Only the default set-up has a mailbox: the local fake SMTP server's catch of every message sent.
    route('get', '/mailbox', access.admin, async (_req, res) => {
      if (!deps.mailbox) throw new HttpError(404, 'no_mailbox', 'This server sends mail through a real SMTP server, so there is no local mailbox.');
      res.json({ messages: await deps.mailbox.list() });
    }),
  ];
}
