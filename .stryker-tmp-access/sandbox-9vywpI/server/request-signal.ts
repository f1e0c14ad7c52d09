// @ts-nocheck
import type { Response } from 'express';

/**
 * A signal that aborts when the client goes away before the response is sent, so pool work done for it (an
 * import, a preview) stops and frees its thread instead of finishing for nobody.
 */
export function closedRequestSignal(res: Response): AbortSignal {
  const controller = new AbortController();
  res.once('close', () => {
    if (!res.writableFinished) controller.abort(new Error('The client closed the request.'));
  });
  return controller.signal;
}
