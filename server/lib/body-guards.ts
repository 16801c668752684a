import type { RequestHandler } from 'express';
import { AppError } from './errors';

const WRITE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/**
 * A body on a write request must be JSON, except the multipart certificate upload. Anything else
 * is refused with 415 before it reaches a route.
 */
export const requireJsonBody: RequestHandler = (req, _res, next) => {
  if (!WRITE_METHODS.has(req.method)) return next();
  const length = Number(req.get('content-length') ?? 0);
  const chunked = req.get('transfer-encoding') !== undefined;
  if (length === 0 && !chunked) return next();
  if (req.is('application/json') || (req.is('multipart/form-data') && req.path.endsWith('/certificates')))
    return next();
  throw new AppError(
    'unsupported_media_type',
    'unsupported_media_type',
    'Send the request body as JSON (Content-Type: application/json).',
  );
};

/** Deepest nesting of arrays and objects in a parsed body, measured without recursion. */
export function nestingDepth(value: unknown): number {
  let deepest = 0;
  const stack: [unknown, number][] = [[value, 1]];
  while (stack.length > 0) {
    const [node, depth] = stack.pop() as [unknown, number];
    if (node === null || typeof node !== 'object') continue;
    deepest = Math.max(deepest, depth);
    for (const child of Object.values(node as Record<string, unknown>)) stack.push([child, depth + 1]);
  }
  return deepest;
}

/** Plans nest about eight levels deep; anything beyond this is not a Dilutrace document. */
export const MAX_BODY_DEPTH = 32;

export const limitBodyDepth: RequestHandler = (req, _res, next) => {
  if (req.body !== undefined && nestingDepth(req.body) > MAX_BODY_DEPTH) {
    throw new AppError('validation', 'too_deep', `The request body is nested more than ${MAX_BODY_DEPTH} levels deep.`);
  }
  next();
};
