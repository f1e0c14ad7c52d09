// @ts-nocheck
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { z } from 'zod';
import { HttpError, type ApiErrorBody } from '../http-error';
import { TaskTimeLimitError } from '../../workers/pool';

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new HttpError(404, 'not_found', `No API route for ${req.method} ${req.originalUrl}.`));
};

/**
 * The single error middleware: known errors keep their status and message, zod errors become 400
 * with the offending fields, anything else is logged here and answered as 500 without a stack.
 */
export function errorHandler(log: (error: unknown) => void): ErrorRequestHandler {
  return (error, _req, res, _next) => {
    // Pool work stopped because its client went away (closedRequestSignal): nobody is left to answer, and nothing failed.
    if (error?.name === 'AbortError' && res.destroyed) return;
    const body = (code: string, message: string, details?: unknown): ApiErrorBody => ({
      error: details === undefined ? { code, message } : { code, message, details },
    });
    if (error instanceof HttpError) {
      res.status(error.status).json(body(error.code, error.message, error.details));
      return;
    }
    if (error instanceof z.ZodError) {
      const fields = error.issues.map((issue) => ({ path: issue.path.join('.'), message: issue.message }));
      const summary = fields.map((f) => (f.path ? `${f.path}: ${f.message}` : f.message)).join('; ');
      res.status(400).json(body('invalid_request', summary, fields));
      return;
    }
    if (error instanceof TaskTimeLimitError) {
      log(error);
      res
        .status(503)
        .json(body('too_slow', `This took longer than the server allows (${Math.round(error.timeLimitMs / 1000)} s) and was stopped; nothing was stored.`));
      return;
    }
    if (error?.code === 'SQLITE_FULL') {
      // A transaction that hits a full disk is rolled back whole, so nothing half-stored is left to clean up.
      log(error);
      res.status(507).json(body('disk_full', "The server's disk is full; nothing was stored. Tell the administrator."));
      return;
    }
    const status = typeof error?.status === 'number' && error.status >= 400 && error.status < 500 ? error.status : 500;
    if (error?.type === 'entity.too.large') {
      const limitMb = Math.round(Number(error.limit) / (1024 * 1024));
      res.status(413).json(body('too_large', `The upload is larger than the limit of ${limitMb} MB. Split the file by period or remove unused columns.`));
      return;
    }
    if (status < 500) {
      // body-parser and friends: a malformed or oversized request body.
      res.status(status).json(body(error.type ?? 'bad_request', String(error.message ?? 'Bad request.')));
      return;
    }
    log(error);
    res.status(500).json(body('internal', 'Something went wrong on the server. It has been logged.'));
  };
}
