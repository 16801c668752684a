import { describe, expect, it } from 'vitest';
import { revisionChanges } from './revision-changes';

const flask = {
  code: 'VF-50-QA',
  description: '',
  certificateReference: '',
  nominalMl: 50,
  glassClass: 'A',
  toleranceMl: 0.06,
  toleranceDistribution: null,
  fillRepeatabilityMl: 0.012,
  calibrationTemperatureC: 20,
  calibratedOn: null,
  calibrationDueOn: null,
};

describe('revisionChanges', () => {
  it('lists only the fields that changed, with units, in the item page order', () => {
    const next = { ...flask, fillRepeatabilityMl: 0.01, calibrationDueOn: '2027-03-01' };
    expect(revisionChanges('flask', flask, next)).toEqual([
      { label: 'Fill repeatability s', before: '0.012 mL', after: '0.01 mL' },
      { label: 'Calibration due on', before: '—', after: '2027-03-01' },
    ]);
  });

  it('reads nested values (piston points, purity uncertainty) as text before comparing', () => {
    const solid = { purityUncertainty: { shape: 'normal', expandedUncertainty: 0.0002, coverageFactor: 2 } };
    const changed = revisionChanges('solid-material', solid, {
      purityUncertainty: { shape: 'rectangular', halfWidth: 0.0002 },
    });
    expect(changed).toEqual([
      { label: 'Purity uncertainty', before: 'U = 0.0002 (k = 2), normal', after: '± 0.0002, rectangular' },
    ]);
    expect(revisionChanges('flask', flask, { ...flask })).toEqual([]);
  });
});
