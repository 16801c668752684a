// @vitest-environment happy-dom
import { act, cleanup, renderHook, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { DEFAULT_LAB_POLICY, type LabPolicy } from '../../../shared/contracts/library';
import { queryWrapper, stubServer } from '../../test-support/component-harness';
import { policyKeys, useLabPolicy, useUpdateLabPolicy } from './lab-policy';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const policyUrl = '/api/labs/1/policy';

/** A server holding one lab's policy: GET reads it, PUT replaces it. */
function policyServer() {
  let stored: LabPolicy & { updatedAt: string | null; updatedBy: string | null } = {
    ...DEFAULT_LAB_POLICY,
    updatedAt: null,
    updatedBy: null,
  };
  return stubServer((request) => {
    if (request.url !== policyUrl) return undefined;
    if (request.method === 'PUT')
      stored = { ...(request.body as LabPolicy), updatedAt: '2026-12-03T10:00:00.000Z', updatedBy: 'Quinn Abara' };
    return { status: 200, body: stored };
  });
}

describe('the lab policy is one cache entry', () => {
  it('saving the policy re-reads it for an open planner before the save settles', async () => {
    const sent = policyServer();
    // Fresh data never goes stale here: only the save's invalidation can bring the new policy.
    const { client, wrapper } = queryWrapper();
    // The planner's read of the policy and the policy page's save, open at the same time.
    const { result } = renderHook(() => ({ planner: useLabPolicy(1), save: useUpdateLabPolicy() }), { wrapper });
    await waitFor(() => expect(result.current?.planner.coverage).toEqual({ mode: 'probability', probability: 0.9545 }));

    const changed: LabPolicy = { ...DEFAULT_LAB_POLICY, coverage: { mode: 'fixed-k', k: 3 } };
    await act(() => result.current.save.mutateAsync({ labId: 1, policy: changed }));

    // Settled means read again: the planner computes with k = 3 at once, not 30 s later.
    expect(result.current.planner.coverage).toEqual({ mode: 'fixed-k', k: 3 });
    expect(result.current.planner.updatedBy).toBe('Quinn Abara');
    expect(client.getQueryState(policyKeys.detail(1))?.dataUpdateCount).toBe(2);
    expect(sent.map(({ method, url }) => `${method} ${url}`)).toEqual([
      `GET ${policyUrl}`,
      `PUT ${policyUrl}`,
      `GET ${policyUrl}`,
    ]);
  });
});

describe('an open planner and a policy saved in another browser', () => {
  it('reads the policy again every 30 s, so the change reaches it without a reload', async () => {
    vi.useFakeTimers({ shouldAdvanceTime: true });
    try {
      let stored: LabPolicy = DEFAULT_LAB_POLICY;
      stubServer((request) =>
        request.url === policyUrl ? { status: 200, body: { ...stored, updatedAt: null, updatedBy: null } } : undefined,
      );
      const { wrapper } = queryWrapper();
      const { result } = renderHook(() => useLabPolicy(1, { live: true }), { wrapper });
      await waitFor(() => expect(result.current?.minimumWeightRule).toBe(DEFAULT_LAB_POLICY.minimumWeightRule));

      // QA switches the rule in another browser: nothing in this one invalidates the entry.
      stored = { ...DEFAULT_LAB_POLICY, minimumWeightRule: !DEFAULT_LAB_POLICY.minimumWeightRule };
      await act(() => vi.advanceTimersByTimeAsync(30_000));
      await waitFor(() => expect(result.current.minimumWeightRule).toBe(!DEFAULT_LAB_POLICY.minimumWeightRule));
    } finally {
      vi.useRealTimers();
    }
  });
});
