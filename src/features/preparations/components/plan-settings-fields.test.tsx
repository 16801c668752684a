// @vitest-environment happy-dom
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import type { EquipmentItem } from '../../../../shared/contracts/library';
import { emptyDraft } from '../utils/plan-draft';
import { PlanSettingsFields } from './plan-settings-fields';

afterEach(cleanup);

/** The invented Wellmere lab's lead nitrate, as the library answers it. */
const nitrate: EquipmentItem = {
  id: 8,
  kind: 'solid-material',
  code: 'RM-PBN-01',
  status: 'active',
  retiredReason: null,
  current: {
    id: 80,
    number: 1,
    data: { name: 'Lead(II) nitrate', formula: 'Pb(NO3)2', analyte: 'Pb', purity: 0.9998 },
    reason: '',
    createdBy: 'Lena Marsh',
    createdAt: '2026-01-05T09:00:00.000Z',
  },
  calibration: 'not-tracked',
  expiry: 'ok',
  minimumWeightG: null,
  certificateCount: 0,
  flags: [],
};

function show(analyte: string) {
  render(
    <PlanSettingsFields
      draft={{ ...emptyDraft(1), materialId: '8', analyte }}
      materials={[nitrate]}
      onChange={() => undefined}
      onMaterialChange={() => undefined}
      onOverrideChange={() => undefined}
      errorAt={() => undefined}
    />,
  );
}

describe('the planner shows the chosen material’s molar mass and the plan analyte’s mass fraction', () => {
  // CIAAW 2021 atomic weights (Pb interval midpoint 207.04): M(Pb(NO3)2) = 331.05 g/mol, w(Pb) = 0.6254,
  // w(NO3) = 2·62.005/331.05 = 0.3746.
  it('for Pb, and again for nitrate when the analyte is changed', () => {
    show('Pb');
    expect(screen.getByText(/M = 331\.05 g\/mol; Pb is 0\.6254 g\/g of it/)).toBeTruthy();
    expect(
      screen.getByRole('option', { name: /RM-PBN-01 \(Pb\(NO3\)2, 331\.05 g\/mol, purity 0\.9998\)/ }),
    ).toBeTruthy();
    cleanup();
    show('NO3');
    expect(screen.getByText(/NO3 is 0\.3746 g\/g of it/)).toBeTruthy();
  });
});
