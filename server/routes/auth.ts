import type { Request, Response } from 'express';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { recordAudit } from '../auth/audit';
import { EmailTaken, personForIdentity } from '../auth/people';
import { safeReturnTo } from '../auth/return-to';
import { attemptLifetimeMs, dropSession, saveSignInAttempt, takeSignInAttempt } from '../auth/sign-in-attempts';
import { perAddressLimit } from '../middleware/rate-limit';
import { cookieOptions, defaultSessionPolicy, endAllSessions, endSession, purgeExpiredSessions, readCookie, startSession, systemClock } from '../auth/session';
import { HttpError } from '../http-error';

const stateCookieName = 'tramontane_sign_in';
/** The state cookie only travels to the sign-in routes. */
const stateCookiePath = '/api/auth';

export function authRoutes(deps: AppDeps): RouteSpec[] {
  const { db } = deps;
  const clock = deps.clock ?? systemClock;
  const policy = deps.sessionPolicy ?? defaultSessionPolicy;
  const limits = deps.signInRateLimit ?? { limit: 30, windowMs: 5 * 60_000 };
  const limiter = () => perAddressLimit(limits, 'Too many sign-in attempts from this address; wait a few minutes and try again.');

  const oidc = () => {
    if (!deps.oidc) throw new HttpError(503, 'sign_in_unavailable', 'Sign-in is not set up on this server (no OIDC provider configured).');
    return deps.oidc;
  };

  /** A failed sign-in goes back to the sign-in page with a reason the page can explain. */
  const fail = (req: Request, res: Response, problem: string) => {
    res.clearCookie(stateCookieName, { ...cookieOptions(req), path: stateCookiePath });
    res.redirect(303, `/sign-in?problem=${encodeURIComponent(problem)}`);
  };

  return [
    route('get', '/auth/sign-in', access.public, limiter(), async (req, res) => {
      const returnTo = safeReturnTo(req.query.returnTo);
      if (!returnTo) throw new HttpError(400, 'invalid_request', 'returnTo must be a path on this site, such as /projects/1.');
      const now = clock();
      const client = oidc();
      let start;
      try {
        start = await client.startSignIn();
      } catch (problem) {
        (deps.logError ?? console.error)(problem);
        throw new HttpError(503, 'provider_unavailable', 'The sign-in provider cannot be reached or is misconfigured; the server log says which.');
      }
      saveSignInAttempt(db, start, returnTo, now);
      // The state rides in a cookie too, so a callback only completes in the browser that started it.
      res.cookie(stateCookieName, start.state, { ...cookieOptions(req, attemptLifetimeMs), path: stateCookiePath });
      res.redirect(302, start.url.toString());
    }),

    route('get', '/auth/callback', access.public, limiter(), async (req, res) => {
      const { code, state, error } = req.query;
      if (typeof error === 'string') return fail(req, res, error === 'access_denied' ? 'provider_refused' : 'provider_error');
      if (typeof code !== 'string' || !code || typeof state !== 'string' || !state) return fail(req, res, 'incomplete_callback');
      const cookieState = readCookie(req, stateCookieName);
      if (!cookieState) return fail(req, res, 'no_sign_in_started');
      if (cookieState !== state) return fail(req, res, 'state_mismatch');
      const now = clock();
      const attempt = takeSignInAttempt(db, state);
      if (!attempt || !attempt.codeVerifier) return fail(req, res, 'missing_verifier');
      if (attempt.expiresAt < now) return fail(req, res, 'sign_in_expired');
      let identity;
      try {
        identity = await oidc().finishSignIn(code, attempt.codeVerifier, attempt.nonce);
      } catch {
        // The provider refused the code (reused, expired, wrong verifier) or the ID token failed a check.
        return fail(req, res, 'code_rejected');
      }
      let person;
      try {
        person = personForIdentity(db, identity, now, deps.adminEmails);
      } catch (problem) {
        if (problem instanceof EmailTaken) return fail(req, res, 'email_taken');
        throw problem;
      }
      purgeExpiredSessions(db, policy, now);
      if (req.sessionTokenHash) dropSession(db, req.sessionTokenHash);
      startSession(db, req, res, person.id, policy, now);
      res.clearCookie(stateCookieName, { ...cookieOptions(req), path: stateCookiePath });
      res.redirect(303, attempt.returnTo);
    }),

    route('get', '/auth/session', access.public, (req, res) => {
      if (!req.user) {
        res.json({ signedIn: false, signInAvailable: Boolean(deps.oidc) });
        return;
      }
      res.json({ signedIn: true, signInAvailable: Boolean(deps.oidc), user: req.user, mailbox: Boolean(deps.mailbox) });
    }),

    route('post', '/auth/sign-out', access.public, (req, res) => {
      if (req.user) recordAudit(db, { actorId: req.user.id, action: 'auth.sign-out', target: req.user.email }, clock());
      endSession(db, req, res);
      res.status(204).end();
    }),

    route('post', '/auth/sign-out-everywhere', access.signedIn, (req, res) => {
      const ended = endAllSessions(db, req.user!.id);
      recordAudit(db, { actorId: req.user!.id, action: 'auth.sign-out-everywhere', target: req.user!.email, detail: { sessions: ended } }, clock());
      endSession(db, req, res);
      res.json({ ended });
    }),
  ];
}
