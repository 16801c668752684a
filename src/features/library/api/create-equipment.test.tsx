// @vitest-environment happy-dom
import { act, cleanup, renderHook, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { EquipmentItem } from '../../../../shared/contracts/library';
import { useActiveEquipment } from '../../../lib/api/lab-equipment';
import { queryWrapper, stubServer } from '../../../test-support/component-harness';
import { useCreateEquipment } from './create-equipment';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

/** A volumetric flask of the invented Wellmere lab, as the equipment list answers it. */
const flask = (id: number, code: string): EquipmentItem => ({
  id,
  kind: 'flask',
  code,
  status: 'active',
  retiredReason: null,
  current: {
    id: id * 10,
    number: 1,
    data: { code },
    reason: '',
    createdBy: 'Lena Marsh',
    createdAt: '2026-11-02T09:00:00.000Z',
  },
  calibration: 'not-tracked',
  expiry: 'not-applicable',
  minimumWeightG: null,
  certificateCount: 0,
  flags: [],
});

describe('a new library item', () => {
  it('reaches an open planner’s list of active items before the save settles', async () => {
    const items = [flask(1, 'VF-100-A')];
    const sent = stubServer((request) => {
      if (request.method === 'GET' && request.url === '/api/labs/1/equipment?status=active')
        return { status: 200, body: items };
      if (request.method === 'POST' && request.url === '/api/labs/1/equipment') {
        const added = flask(2, 'VF-50-A');
        items.push(added);
        return { status: 201, body: { ...added, revisions: [added.current], certificates: [] } };
      }
      return undefined;
    });
    const { wrapper } = queryWrapper();
    // The planner's read of the library and the library page's "add item", open at the same time.
    const { result } = renderHook(() => ({ planner: useActiveEquipment(1), add: useCreateEquipment() }), { wrapper });
    await waitFor(() => expect(result.current?.planner.map((item) => item.code)).toEqual(['VF-100-A']));

    await act(() => result.current.add.mutateAsync({ labId: 1, kind: 'flask', data: { code: 'VF-50-A' } }));

    expect(result.current.planner.map((item) => item.code)).toEqual(['VF-100-A', 'VF-50-A']);
    expect(sent.filter((request) => request.method === 'GET')).toHaveLength(2);
  });
});
