import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { AppError } from '../lib/errors';

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
    activeLabId?: number;
  }
}

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
const VISITOR_COOKIE = 'dilutrace.csrf';
const NONCE = /^[A-Za-z0-9_-]{32}$/;

/** The signed-in session's synchroniser token, created on first use. */
export function csrfToken(req: Request): string {
  if (!req.session.csrfToken) req.session.csrfToken = randomBytes(24).toString('base64url');
  return req.session.csrfToken;
}

function visitorNonce(req: Request): string | undefined {
  for (const part of (req.headers.cookie ?? '').split(';')) {
    const [name, value] = part.trim().split('=');
    if (name === VISITOR_COOKIE && value && NONCE.test(value)) return value;
  }
  return undefined;
}

const same = (given: string, expected: string) => {
  const a = Buffer.from(given);
  const b = Buffer.from(expected);
  // Compare byte lengths: a header with non-ASCII characters can match in characters but not in bytes.
  return a.length === b.length && timingSafeEqual(a, b);
};

/**
 * CSRF tokens in the `X-CSRF-Token` header. A signed-in session has its own token (above). A
 * signed-out visitor gets no session row: a random nonce in an HttpOnly cookie, and as token its
 * HMAC under the session secret (a signed double-submit cookie), so only a token made by this
 * server for this cookie passes. After sign-in only the session's token is accepted.
 */
export function csrfProtection(config: { secret: string; secureCookie: boolean }) {
  const sign = (nonce: string) => createHmac('sha256', config.secret).update(`csrf ${nonce}`).digest('base64url');

  /** The token for this request: the session's when signed in, else the visitor's (setting its cookie if missing). */
  function tokenFor(req: Request, res: Response): string {
    if (req.user) return csrfToken(req);
    let nonce = visitorNonce(req);
    if (!nonce) {
      nonce = randomBytes(24).toString('base64url');
      res.cookie(VISITOR_COOKIE, nonce, { httpOnly: true, sameSite: 'lax', secure: config.secureCookie, path: '/api' });
    }
    return sign(nonce);
  }

  /** Refuses a state-changing request whose X-CSRF-Token header is not the expected token. */
  const requireToken: RequestHandler = (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const nonce = visitorNonce(req);
    const expected = req.session?.csrfToken ?? (req.user || !nonce ? undefined : sign(nonce));
    const given = req.get('x-csrf-token');
    if (!expected || !given || !same(given, expected)) {
      throw new AppError('forbidden', 'csrf_invalid', 'This form has expired. Reload the page and try again.');
    }
    next();
  };

  return { tokenFor, requireToken };
}
export type CsrfProtection = ReturnType<typeof csrfProtection>;
