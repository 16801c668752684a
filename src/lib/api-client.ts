import type { z } from 'zod';
import { csrfSchema } from '../../shared/contracts/auth';
import { ApiError, apiErrorFromResponse, CLIENT_ERROR_CODES } from './api-error';

type StateChangingMethod = 'POST' | 'PATCH' | 'PUT' | 'DELETE';

const CSRF_HEADER = 'X-CSRF-Token';
const CSRF_PATH = '/api/auth/csrf';

let csrfToken: string | null = null;

/** Remembers the CSRF token the server handed out (in `Me.csrfToken` or from `/api/auth/csrf`). */
export function rememberCsrfToken(token: string | null): void {
  csrfToken = token;
}

async function send(method: 'GET' | StateChangingMethod, path: string, body: unknown, token: string | null) {
  const headers: Record<string, string> = { Accept: 'application/json' };
  // A FormData body sets its own multipart Content-Type with the boundary.
  const isForm = body instanceof FormData;
  if (body !== undefined && !isForm) headers['Content-Type'] = 'application/json';
  if (token) headers[CSRF_HEADER] = token;
  try {
    return await fetch(path, {
      method,
      headers,
      body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
      credentials: 'same-origin',
    });
  } catch {
    throw new ApiError(
      0,
      CLIENT_ERROR_CODES.network,
      'The Dilutrace server cannot be reached. Check the connection and try again.',
    );
  }
}

function parseJson(text: string): unknown {
  try {
    return text ? JSON.parse(text) : null;
  } catch {
    return undefined;
  }
}

async function readResult<S extends z.ZodType>(response: Response, schema: S | null): Promise<z.output<S> | undefined> {
  const bodyText = await response.text();
  if (!response.ok) throw apiErrorFromResponse(response.status, bodyText);
  if (schema === null) return undefined;
  const parsed = schema.safeParse(parseJson(bodyText));
  if (!parsed.success) {
    throw new ApiError(
      response.status,
      CLIENT_ERROR_CODES.unexpectedResponse,
      'The server sent an answer this page does not understand. Reload the page; if it persists, tell your administrator.',
    );
  }
  return parsed.data;
}

async function freshCsrfToken(): Promise<string> {
  const response = await send('GET', CSRF_PATH, undefined, null);
  const result = await readResult(response, csrfSchema);
  csrfToken = result?.csrfToken ?? null;
  if (!csrfToken)
    throw new ApiError(response.status, CLIENT_ERROR_CODES.unexpectedResponse, 'The server gave no CSRF token.');
  return csrfToken;
}

async function mutate<S extends z.ZodType>(method: StateChangingMethod, path: string, body: unknown, schema: S | null) {
  const token = csrfToken ?? (await freshCsrfToken());
  let response = await send(method, path, body, token);
  if (response.status === 403) {
    const error = apiErrorFromResponse(403, await response.clone().text());
    if (error.code === 'csrf_invalid') response = await send(method, path, body, await freshCsrfToken());
  }
  return readResult(response, schema);
}

/**
 * The one fetch wrapper: JSON in and out (or a multipart upload), same-origin cookies, the CSRF header on every
 * state-changing request (fetching a token first when none is known, and retrying once
 * with a fresh one after `403 csrf_invalid`), responses checked against the shared zod
 * schema, and an {@link ApiError} thrown on any non-2xx answer. No toasts, no redirects.
 */
export const api = {
  get: async <S extends z.ZodType>(path: string, schema: S): Promise<z.output<S>> =>
    (await readResult(await send('GET', path, undefined, null), schema)) as z.output<S>,
  post: async <S extends z.ZodType>(path: string, body: unknown, schema: S): Promise<z.output<S>> =>
    (await mutate('POST', path, body, schema)) as z.output<S>,
  patch: async <S extends z.ZodType>(path: string, body: unknown, schema: S): Promise<z.output<S>> =>
    (await mutate('PATCH', path, body, schema)) as z.output<S>,
  put: async <S extends z.ZodType>(path: string, body: unknown, schema: S): Promise<z.output<S>> =>
    (await mutate('PUT', path, body, schema)) as z.output<S>,
  /** A multipart upload (a file field and any others), with the same CSRF handling as the JSON writes. */
  postForm: async <S extends z.ZodType>(path: string, form: FormData, schema: S): Promise<z.output<S>> =>
    (await mutate('POST', path, form, schema)) as z.output<S>,
  /** A state-changing request whose success has no body (`204`) or a body the caller ignores. */
  postWithoutResult: async (path: string, body?: unknown): Promise<void> => {
    await mutate('POST', path, body ?? {}, null);
  },
  /** Deletes the resource at `path` (`204`, no body either way). */
  delete: async (path: string): Promise<void> => {
    await mutate('DELETE', path, undefined, null);
  },
};
