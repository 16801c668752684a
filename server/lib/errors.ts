import type { FieldIssue } from '../../shared/contracts/errors';

/** An error the client may see: a stable code and a message a chemist reads. Services throw these. */
export class AppError extends Error {
  constructor(
    readonly kind:
      | 'validation'
      | 'unauthenticated'
      | 'forbidden'
      | 'not_found'
      | 'conflict'
      | 'rate_limited'
      | 'too_large'
      | 'unsupported_media_type'
      | 'unavailable',
    readonly code: string,
    message: string,
    readonly details?: FieldIssue[] | Record<string, unknown>,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const validationError = (message: string, details?: FieldIssue[]) =>
  new AppError('validation', 'validation_failed', message, details);
export const unauthenticated = (message = 'Sign in to continue.') =>
  new AppError('unauthenticated', 'unauthenticated', message);
export const forbidden = (message = 'Your role in this lab does not permit this.') =>
  new AppError('forbidden', 'forbidden', message);
export const notFound = (what: string) => new AppError('not_found', 'not_found', `${what} was not found.`);
export const conflict = (code: string, message: string) => new AppError('conflict', code, message);
