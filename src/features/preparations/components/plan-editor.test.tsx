// @vitest-environment happy-dom
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import type { EquipmentItem } from '../../../../shared/contracts/library';
import { checkDraft } from '../utils/evaluate-draft';
import { emptyDraft, type PlanDraft } from '../utils/plan-draft';
import { PlanEditor } from './plan-editor';

afterEach(cleanup);

/** An expired solid reference material of the invented Wellmere lab. */
const expiredNitrate: EquipmentItem = {
  id: 9,
  kind: 'solid-material',
  code: 'RM-PBN-02',
  status: 'active',
  retiredReason: null,
  current: {
    id: 90,
    number: 1,
    data: { name: 'Lead(II) nitrate', analyte: 'Pb' },
    reason: '',
    createdBy: 'Lena Marsh',
    createdAt: '2026-01-05T09:00:00.000Z',
  },
  calibration: 'not-tracked',
  expiry: 'expired',
  minimumWeightG: null,
  certificateCount: 0,
  flags: ['Expired on 2026-11-30'],
};

/** The editor as the workspace shows it: the draft's first problem found by the planner's own checks. */
function showEditor(draft: PlanDraft) {
  const library = [expiredNitrate];
  const problem = checkDraft(draft, new Map(library.map((item) => [String(item.id), item])));
  render(
    <PlanEditor
      draft={draft}
      onChange={() => undefined}
      library={library}
      problem={problem}
      budget={null}
      warnings={[]}
      readOnly={false}
    />,
  );
  return screen.getByRole('textbox', { name: 'Reason for using RM-PBN-02 (Expired on 2026-11-30)' });
}
const errorOf = (control: HTMLElement) => document.getElementById(`${control.id}-error`)?.textContent ?? null;

describe('an expired material in the planner', () => {
  const draft = { ...emptyDraft(1), materialId: '9' };

  it('asks for a reason at the reason box, in the words the server uses for the same rule', () => {
    const reason = showEditor(draft);
    expect(reason.getAttribute('aria-invalid')).toBe('true');
    expect(errorOf(reason)).toMatch(/Say why this item may be used, in a few words \(at least 3 characters\)\.$/);
  });

  it('still asks while the reason is shorter than the server accepts', () => {
    const reason = showEditor({ ...draft, overrides: { '9': ' ok ' } });
    expect(errorOf(reason)).toMatch(/Say why this item may be used/);
  });

  it('takes a reason of a few words and moves on to the next problem', () => {
    const reason = showEditor({ ...draft, overrides: { '9': 'Only stock left; assay checked today.' } });
    expect(reason.getAttribute('aria-invalid')).toBeNull();
    expect(errorOf(reason)).toBeNull();
    expect(screen.getByRole('textbox', { name: 'Analyte' }).getAttribute('aria-invalid')).toBe('true');
  });
});
