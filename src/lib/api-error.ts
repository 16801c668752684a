import { errorBodySchema, fieldIssueSchema, type FieldIssue } from '../../shared/contracts/errors';
import { z } from 'zod';

/** Codes the client itself assigns when the server gave no error body. */
export const CLIENT_ERROR_CODES = {
  network: 'network_unreachable',
  unexpectedResponse: 'unexpected_response',
} as const;

/** A failed API call: the HTTP status, the server's error code and message, and any field issues. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: FieldIssue[];

  constructor(status: number, code: string, message: string, details: FieldIssue[] = []) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.details = details;
  }
}

const fieldIssueListSchema = z.array(fieldIssueSchema);

/**
 * Builds the ApiError for a non-2xx response from its status and raw body text.
 * A body that is not `{ error: { code, message, details? } }` (a proxy page, an empty
 * body) still yields an ApiError with a plain message.
 */
export function apiErrorFromResponse(status: number, bodyText: string): ApiError {
  let parsedBody: unknown;
  try {
    parsedBody = bodyText ? JSON.parse(bodyText) : null;
  } catch {
    parsedBody = null;
  }
  const body = errorBodySchema.safeParse(parsedBody);
  if (!body.success) {
    return new ApiError(
      status,
      CLIENT_ERROR_CODES.unexpectedResponse,
      `The server answered with status ${status} and no usable explanation. Try again in a moment.`,
    );
  }
  const details = fieldIssueListSchema.safeParse(body.data.error.details);
  return new ApiError(status, body.data.error.code, body.data.error.message, details.success ? details.data : []);
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}
