import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { api, rememberCsrfToken } from './api-client';
import { ApiError } from './api-error';

type Call = { method: string; url: string; csrf: string | null; body: string | null };

/** A stand-in server: answers each request from `answer` and records what the client sent. */
function stubFetch(answer: (call: Call, index: number) => Response) {
  const calls: Call[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init: RequestInit) => {
      const headers = new Headers(init.headers);
      const call = {
        method: init.method ?? 'GET',
        url,
        csrf: headers.get('X-CSRF-Token'),
        body: (init.body as string) ?? null,
      };
      calls.push(call);
      expect(init.credentials).toBe('same-origin');
      return answer(call, calls.length - 1);
    }),
  );
  return calls;
}

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
const okSchema = z.object({ ok: z.boolean() });

describe('api client', () => {
  beforeEach(() => rememberCsrfToken(null));
  afterEach(() => vi.unstubAllGlobals());

  it('sends no CSRF header on reads and checks the answer against the schema', async () => {
    const calls = stubFetch(() => json(200, { ok: true }));
    await expect(api.get('/api/thing', okSchema)).resolves.toEqual({ ok: true });
    expect(calls).toEqual([{ method: 'GET', url: '/api/thing', csrf: null, body: null }]);
  });

  it('fetches a CSRF token before the first state-changing request and reuses it', async () => {
    const calls = stubFetch((call) =>
      call.url === '/api/auth/csrf' ? json(200, { csrfToken: 'first' }) : json(200, { ok: true }),
    );
    await api.post('/api/a', { x: 1 }, okSchema);
    await api.patch('/api/b', { y: 2 }, okSchema);
    expect(calls.map((call) => [call.method, call.url, call.csrf])).toEqual([
      ['GET', '/api/auth/csrf', null],
      ['POST', '/api/a', 'first'],
      ['PATCH', '/api/b', 'first'],
    ]);
    expect(calls[1].body).toBe('{"x":1}');
  });

  it('retries once with a fresh token after 403 csrf_invalid', async () => {
    rememberCsrfToken('stale');
    const calls = stubFetch((call, index) => {
      if (call.url === '/api/auth/csrf') return json(200, { csrfToken: 'fresh' });
      if (index === 0) return json(403, { error: { code: 'csrf_invalid', message: 'Reload the page.' } });
      return new Response(null, { status: 204 });
    });
    await api.postWithoutResult('/api/auth/logout');
    expect(calls.map((call) => call.csrf)).toEqual(['stale', null, 'fresh']);
  });

  it('sends a multipart upload as FormData with the CSRF header and no JSON content type', async () => {
    rememberCsrfToken('token');
    const sent: RequestInit[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_url: string, init: RequestInit) => {
        sent.push(init);
        return json(201, { ok: true });
      }),
    );
    const form = new FormData();
    form.append('file', new Blob(['%PDF-1.4'], { type: 'application/pdf' }), 'certificate.pdf');
    await expect(api.postForm('/api/labs/1/upload', form, okSchema)).resolves.toEqual({ ok: true });
    const headers = new Headers(sent[0].headers);
    expect([sent[0].method, headers.get('X-CSRF-Token'), headers.get('Content-Type')]).toEqual(['POST', 'token', null]);
    expect(sent[0].body).toBe(form);
  });

  it('sends PUT with a JSON body', async () => {
    rememberCsrfToken('token');
    const calls = stubFetch(() => json(200, { ok: true }));
    await api.put('/api/labs/1/policy', { k: 2 }, okSchema);
    expect(calls).toEqual([{ method: 'PUT', url: '/api/labs/1/policy', csrf: 'token', body: '{"k":2}' }]);
  });

  it('does not retry a 403 for any other reason', async () => {
    rememberCsrfToken('token');
    const calls = stubFetch(() => json(403, { error: { code: 'forbidden', message: 'Administrators only.' } }));
    await expect(api.post('/api/labs/1/invitations', {}, okSchema)).rejects.toMatchObject({
      status: 403,
      code: 'forbidden',
    });
    expect(calls).toHaveLength(1);
  });

  it('throws a typed ApiError with the server message on a non-2xx answer', async () => {
    rememberCsrfToken('token');
    stubFetch(() => json(429, { error: { code: 'rate_limited', message: 'Too many attempts; wait a minute.' } }));
    const failure = api.post('/api/auth/login', {}, okSchema);
    await expect(failure).rejects.toBeInstanceOf(ApiError);
    await expect(failure).rejects.toMatchObject({
      status: 429,
      code: 'rate_limited',
      message: 'Too many attempts; wait a minute.',
    });
  });

  it('reports an answer that does not match the contract instead of passing it on', async () => {
    stubFetch(() => json(200, { ok: 'yes' }));
    await expect(api.get('/api/thing', okSchema)).rejects.toMatchObject({ code: 'unexpected_response' });
  });

  it('turns a network failure into an ApiError with status 0', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => Promise.reject(new TypeError('fetch failed'))),
    );
    await expect(api.get('/api/thing', okSchema)).rejects.toMatchObject({ status: 0, code: 'network_unreachable' });
  });
});
