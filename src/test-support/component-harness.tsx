import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { Suspense, type ReactElement, type ReactNode } from 'react';
import { MemoryRouter, Route, Routes } from 'react-router';
import { vi } from 'vitest';
import { meSchema, type Me } from '../../shared/contracts/auth';
import { preparationDetailSchema, type PreparationDetail } from '../../shared/contracts/preparations';
import { rememberCsrfToken } from '../lib/api-client';

type Stage = 'draft' | 'prepared' | 'submitted' | 'approved';
type Person = 'analyst' | 'qa' | 'auditor';

// Vitest runs from the repository root (under happy-dom, import.meta.url is not a file URL).
const raw = JSON.parse(readFileSync(resolve('tests/fixtures/records/lead-check-standard.json'), 'utf8')) as Record<
  string,
  unknown
> & {
  me: Record<Person, unknown>;
  allowedActionsOf: Record<Exclude<Person, 'analyst'>, Record<Stage, unknown>>;
};

/**
 * The fixture's preparation as the server answered `person` (the owning analyst unless said) after `stage`,
 * read through the client's own schema. Readers' answers differ only in what they may do (`allowedActions`).
 */
export function preparationAt(stage: Stage, person: Person = 'analyst'): PreparationDetail {
  const answer = raw[stage] as { current: object };
  const allowedActions = person === 'analyst' ? undefined : raw.allowedActionsOf[person][stage];
  return preparationDetailSchema.parse(
    allowedActions ? { ...answer, current: { ...answer.current, allowedActions } } : answer,
  );
}

/** The fixture's signed-in `Me` of a demo person, read through the client's own schema. */
export const meOf = (person: Person): Me => meSchema.parse(raw.me[person]);

export type SentRequest = { method: string; url: string; body: unknown; csrf: string | null };
export type Answer = { status: number; body: unknown };

/**
 * Replaces fetch: every request is kept in `sent`, and `answer` decides the reply (a 404 error when it
 * returns nothing, so an unexpected read fails loudly instead of hanging).
 */
export function stubServer(answer: (request: SentRequest) => Answer | undefined) {
  const sent: SentRequest[] = [];
  rememberCsrfToken('test-csrf-token');
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init: RequestInit = {}) => {
      const headers = (init.headers ?? {}) as Record<string, string>;
      const request = {
        method: init.method ?? 'GET',
        url,
        body: typeof init.body === 'string' ? JSON.parse(init.body) : undefined,
        csrf: headers['X-CSRF-Token'] ?? null,
      };
      sent.push(request);
      const reply = answer(request) ?? {
        status: 404,
        body: { error: { code: 'not_found', message: `No answer for ${request.method} ${url} in this test.` } },
      };
      return new Response(JSON.stringify(reply.body), {
        status: reply.status,
        headers: { 'Content-Type': 'application/json' },
      });
    }),
  );
  return sent;
}

/** A fresh query cache whose data never goes stale by itself (only an invalidation re-reads it), for renderHook. */
export function queryWrapper() {
  const client = new QueryClient({
    defaultOptions: { queries: { retry: false, staleTime: Infinity }, mutations: { retry: false } },
  });
  const wrapper = ({ children }: { children: ReactNode }) => (
    <QueryClientProvider client={client}>
      <Suspense fallback={null}>{children}</Suspense>
    </QueryClientProvider>
  );
  return { client, wrapper };
}

/** Renders `element` at `path` under `pattern` with a fresh query cache that `seed` may fill first. */
export function renderAt(
  element: ReactElement,
  { pattern = '*', path = '/', seed }: { pattern?: string; path?: string; seed?: (client: QueryClient) => void } = {},
) {
  const client = new QueryClient({
    defaultOptions: { queries: { retry: false, staleTime: Infinity }, mutations: { retry: false } },
  });
  seed?.(client);
  const view = render(
    <QueryClientProvider client={client}>
      <MemoryRouter initialEntries={[path]}>
        <Suspense fallback={<p>Loading…</p>}>
          <Routes>
            <Route path={pattern} element={element} />
          </Routes>
        </Suspense>
      </MemoryRouter>
    </QueryClientProvider>,
  );
  return { ...view, client };
}
