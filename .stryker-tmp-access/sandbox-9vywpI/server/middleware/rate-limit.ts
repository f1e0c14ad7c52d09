// @ts-nocheck
import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { HttpError } from '../http-error';

export interface RateLimit {
  limit: number;
  windowMs: number;
}

/** At most `limit` requests per client address per window; past it a 429 in the one error shape, saying what to do. */
export function perAddressLimit({ limit, windowMs }: RateLimit, message: string): RequestHandler {
  return rateLimit({
    windowMs,
    limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new HttpError(429, 'too_many_requests', message)),
  });
}
