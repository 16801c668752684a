import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { AppError } from '../lib/errors';

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
    activeLabId?: number;
  }
}

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** The session's synchroniser token, created on first use. */
export function csrfToken(req: Request): string {
  if (!req.session.csrfToken) req.session.csrfToken = randomBytes(24).toString('base64url');
  return req.session.csrfToken;
}

/** Refuses a state-changing request whose X-CSRF-Token header does not match the session's token. */
export const requireCsrfToken: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method)) return next();
  const expected = req.session?.csrfToken;
  const given = req.get('x-csrf-token');
  if (!expected || !given || given.length !== expected.length || !timingSafeEqual(Buffer.from(given), Buffer.from(expected))) {
    throw new AppError('forbidden', 'csrf_invalid', 'This form has expired. Reload the page and try again.');
  }
  next();
};
