import { describe, expect, it } from 'vitest';
import type { UsedItem } from '../../../../shared/contracts/snapshot';
import { stepNamer } from './step-names';

const used = (libraryId: string, code: string): UsedItem => ({
  libraryId,
  code,
  kind: 'balance',
  revisionId: `${libraryId}-r1`,
  revisionNumber: 1,
  certificateReference: '',
  flags: [],
  override: null,
  hazardNotes: '',
});

// An invented two-step plan in the plan format's shape (only the fields the namer reads).
const plan = {
  steps: [
    {
      kind: 'weighSolid',
      material: { libraryId: '9', itemId: 'RM-PBN-01' },
      balance: { libraryId: '1', itemId: 'BAL-05' },
    },
    { kind: 'makeUpToVolume', flask: { libraryId: '4', itemId: 'asset-77' } },
  ],
};

describe('stepNamer', () => {
  const name = stepNamer(plan, [used('1', 'BAL-05'), used('4', 'VF-100-A'), used('9', 'RM-PBN-01')]);

  it('names a step by its kind and the library code of its balance, flask or pipette', () => {
    expect(name('0')).toBe('Step 1 · Weighing the solid (BAL-05)');
    // The code comes from the library item, not the asset tag inside the plan.
    expect(name('1')).toBe('Step 2 · Make-up to volume (VF-100-A)');
  });

  it('names a group shared by several steps, and falls back for steps the plan does not hold', () => {
    expect(name('1+3')).toBe('Shared by steps 2 and 4');
    expect(name('0+1+2')).toBe('Shared by steps 1, 2 and 3');
    expect(name('5')).toBe('Step 6');
    expect(stepNamer({}, [])('0')).toBe('Step 1');
  });
});
