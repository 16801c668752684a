import type { ErrorRequestHandler, RequestHandler } from 'express';
import { PlanError } from '../../shared/uncertainty';
import { AppError } from './errors';

const STATUS: Record<AppError['kind'], number> = {
  validation: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  too_large: 413,
  unsupported_media_type: 415,
  rate_limited: 429,
  unavailable: 503,
};

/** Seconds a client is asked to wait (Retry-After) before trying a 503 again. */
export const RETRY_AFTER_SECONDS = 5;

/**
 * The database stayed busy past its wait: SQLite still locked after busy_timeout, or PostgreSQL's
 * lock_timeout (55P03), a deadlock (40P01) or a serialization failure (40001). Retrying later helps.
 */
export function isDatabaseBusy(error: unknown): boolean {
  const code = (error as { code?: unknown } | null)?.code;
  return typeof code === 'string' && (/^SQLITE_(BUSY|LOCKED)/.test(code) || ['55P03', '40P01', '40001'].includes(code));
}

export const apiNotFound: RequestHandler = (req, res) => {
  const what = req.originalUrl.startsWith('/api/') ? 'API route' : 'page or file';
  res.status(404).json({ error: { code: 'not_found', message: `No ${what} ${req.method} ${req.path}.` } });
};

interface HttpishError {
  status?: number;
  statusCode?: number;
  type?: string;
  expose?: boolean;
}

/** Maps error classes to statuses and the one JSON error shape; never sends a stack. */
export function errorHandler(log: (message: string, error: unknown) => void): ErrorRequestHandler {
  return (error, _req, res, next) => {
    // A download that failed half-way (a streamed CSV) cannot change its status any more: Express's
    // own handler closes the connection, so the client sees a cut-off file, never a silent one.
    if (res.headersSent) {
      next(error);
      return;
    }
    if (isDatabaseBusy(error)) {
      res.set('Retry-After', String(RETRY_AFTER_SECONDS));
      res
        .status(503)
        .json({ error: { code: 'database_busy', message: 'The database is busy. Try again in a few seconds.' } });
      return;
    }
    if (error instanceof AppError) {
      if (error.kind === 'unavailable') res.set('Retry-After', String(RETRY_AFTER_SECONDS));
      res
        .status(STATUS[error.kind])
        .json({ error: { code: error.code, message: error.message, details: error.details } });
      return;
    }
    if (error instanceof PlanError) {
      res.status(400).json({
        error: {
          code: 'plan_invalid',
          message: error.message,
          details: [{ path: error.path.join('.'), message: error.message }],
        },
      });
      return;
    }
    const http = error as HttpishError;
    const status = http.status ?? http.statusCode;
    if (http.type === 'entity.parse.failed') {
      res.status(400).json({ error: { code: 'malformed_json', message: 'The request body is not valid JSON.' } });
      return;
    }
    if (http.type === 'entity.too.large') {
      res.status(413).json({ error: { code: 'too_large', message: 'The request body is too large.' } });
      return;
    }
    if (status && status >= 400 && status < 500 && http.expose) {
      res.status(status).json({ error: { code: 'bad_request', message: (error as Error).message } });
      return;
    }
    log('Unexpected error', error);
    res
      .status(500)
      .json({ error: { code: 'internal', message: 'Something went wrong on the server. The error has been logged.' } });
  };
}
