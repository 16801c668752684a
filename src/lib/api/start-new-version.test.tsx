// @vitest-environment happy-dom
import { act, cleanup, renderHook } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { preparationAt, queryWrapper, stubServer } from '../../test-support/component-harness';
import { preparationKeys } from './preparation';
import { useStartNewVersion } from './start-new-version';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('starting a new version', () => {
  it('stores the new draft as the one preparation entry and marks the lists and the old versions for re-reading', async () => {
    const approved = preparationAt('approved');
    // The server's answer: version 2, a draft (the fixture's draft stands in for its content).
    const started = { ...approved, current: { ...preparationAt('draft').current, number: 2 } };
    const sent = stubServer((request) =>
      request.method === 'POST' && request.url === `/api/labs/1/preparations/${approved.id}/versions`
        ? { status: 201, body: started }
        : undefined,
    );
    const { client, wrapper } = queryWrapper();
    client.setQueryData(preparationKeys.detail(1, approved.id), approved);
    client.setQueryData(preparationKeys.version(1, approved.id, 1), approved.current);
    client.setQueryData(preparationKeys.list(1, {}), []);
    const { result } = renderHook(() => useStartNewVersion(1, approved.id), { wrapper });

    await act(() => result.current.mutateAsync());

    expect(client.getQueryData(preparationKeys.detail(1, approved.id))).toMatchObject({ current: { number: 2 } });
    expect(client.getQueryState(preparationKeys.list(1, {}))?.isInvalidated).toBe(true);
    expect(client.getQueryState(preparationKeys.version(1, approved.id, 1))?.isInvalidated).toBe(true);
    expect(sent.map(({ method, url }) => `${method} ${url}`)).toEqual([
      `POST /api/labs/1/preparations/${approved.id}/versions`,
    ]);
  });
});
