// @vitest-environment happy-dom
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { DEMO_LIBRARY, DEMO_LIBRARY_BY_ID, DEMO_POLICY } from '../test-support/demo-library';
import { evaluateDraft } from '../utils/evaluate-draft';
import { emptyStep, type DraftStep, type PlanDraft } from '../utils/plan-draft';
import { PlanEditor } from './plan-editor';

afterEach(cleanup);

/** The demo lead standard (invented Wellmere data): BAL-05, VF-100-A, then an aliquot made up in `finalFlask`. */
function leadDraft(aliquot: Partial<DraftStep>, makeUp: Partial<DraftStep> = {}): PlanDraft {
  const step = (kind: DraftStep['kind'], change: Partial<DraftStep>) => ({ ...emptyStep(kind), ...change });
  return {
    title: 'Pb 1 mg/L',
    materialId: '8',
    analyte: 'Pb',
    outputUnit: 'mg/L',
    labTemperatureC: '20',
    overrides: {},
    seed: 42,
    steps: [
      step('weighSolid', { equipmentId: '1', quantity: '0.1599' }),
      step('makeUpToVolume', { equipmentId: '3' }),
      step('pipetteAliquot', aliquot),
      step('makeUpToVolume', { equipmentId: '4', ...makeUp }),
    ],
  };
}

/** The editor as the workspace shows it: the draft's problem found by the planner's own checks and the engine. */
function showEditor(draft: PlanDraft, onChange: (draft: PlanDraft) => void = () => undefined) {
  const evaluation = evaluateDraft(draft, DEMO_LIBRARY_BY_ID, DEMO_POLICY);
  render(
    <PlanEditor
      draft={draft}
      onChange={onChange}
      library={DEMO_LIBRARY}
      problem={evaluation.problem}
      budget={null}
      warnings={[]}
      readOnly={false}
    />,
  );
  return screen.getAllByRole('listitem').filter((item) => item.getAttribute('aria-labelledby')?.startsWith('step-'));
}
const errorOf = (control: HTMLElement) => document.getElementById(`${control.id}-error`)?.textContent ?? null;
/** The unit printed beside a box: the text next to the input in its row. */
const unitBeside = (control: HTMLElement) => control.parentElement?.textContent ?? null;

describe('units in the planner (common practice: a piston pipette is set in µL)', () => {
  it('takes a piston pipette’s volume in µL, with µL beside the box', () => {
    const steps = showEditor(leadDraft({ equipmentId: '10', quantity: '1000' }));
    const volume = within(steps[2]).getByRole('textbox', { name: 'Volume (µL)' });
    expect((volume as HTMLInputElement).value).toBe('1000');
    expect(unitBeside(volume)).toBe('µL');
    expect(volume.getAttribute('aria-invalid')).toBeNull();
  });

  it('keeps a glass pipette’s volume in mL', () => {
    const steps = showEditor(leadDraft({ equipmentId: '6', quantity: '10' }));
    const volume = within(steps[2]).getByRole('textbox', { name: 'Volume (mL)' });
    expect(unitBeside(volume)).toBe('mL');
  });

  it('shows a unit beside every number box of the plan', () => {
    showEditor(leadDraft({ equipmentId: '10', quantity: '1000' }));
    const numberBoxes = screen.getAllByRole('textbox').filter((box) => box.getAttribute('inputmode') === 'decimal');
    expect(numberBoxes.length).toBeGreaterThanOrEqual(4); // lab temperature, net mass, container, volume
    for (const box of numberBoxes) {
      const unit = unitBeside(box);
      expect(['g', 'mL', 'µL', '°C']).toContain(unit);
      expect(
        box.getAttribute('aria-labelledby') ?? document.querySelector(`label[for="${box.id}"]`)?.textContent,
      ).toMatch(new RegExp(`\\(${unit}\\)$`));
    }
  });

  it('converts 0.5 mL typed before the pipette was chosen to 500 µL on choosing the piston pipette', () => {
    const onChange = vi.fn();
    const steps = showEditor(leadDraft({ quantity: '0.5' }), onChange);
    expect(within(steps[2]).getByRole('textbox', { name: 'Volume (mL)' })).toBeDefined();
    fireEvent.change(within(steps[2]).getByRole('combobox', { name: 'Pipette' }), { target: { value: '10' } });
    const changed = onChange.mock.calls[0][0] as PlanDraft;
    expect(changed.steps[2]).toMatchObject({ equipmentId: '10', quantity: '500' });
  });
});

describe('a flask reused in the plan (common practice: a flask holds one solution at a time)', () => {
  it('shows the refusal at the reused flask, and offers to bottle the earlier solution first', () => {
    const onChange = vi.fn();
    const steps = showEditor(leadDraft({ equipmentId: '6', quantity: '10' }, { equipmentId: '3' }), onChange);
    const flask = within(steps[3]).getByRole('combobox', { name: 'Volumetric flask' });
    expect(flask.getAttribute('aria-invalid')).toBe('true');
    expect(errorOf(flask)).toMatch(/^Flask VF-100-A still holds the solution made up in it at step 2/);
    const emptied = within(steps[3]).getByRole('checkbox', {
      name: 'Before this step, the solution made in VF-100-A at step 2 is poured into a labelled storage bottle and VF-100-A is rinsed',
    });
    fireEvent.click(emptied);
    const changed = onChange.mock.calls[0][0] as PlanDraft;
    expect(changed.steps[3].flaskEmptiedBefore).toBe(true);
  });

  it('computes once the earlier solution is bottled, and asks nothing where the flask is new', () => {
    const steps = showEditor(
      leadDraft({ equipmentId: '6', quantity: '10' }, { equipmentId: '3', flaskEmptiedBefore: true }),
    );
    const flask = within(steps[3]).getByRole('combobox', { name: 'Volumetric flask' });
    expect(flask.getAttribute('aria-invalid')).toBeNull();
    expect((within(steps[3]).getByRole('checkbox') as HTMLInputElement).checked).toBe(true);
    expect(within(steps[1]).queryByRole('checkbox')).toBeNull();
  });
});
