import { describe, expect, it } from 'vitest';
import { toEngineEquipment } from './engine-equipment';
import { solidMaterialDataSchema, type EquipmentItem } from './library';

/** The invented Wellmere lab's lead nitrate as the library stores it, with the given certificate values. */
function nitrate(extra: Record<string, unknown>): Pick<EquipmentItem, 'id' | 'kind' | 'code' | 'current'> {
  const data = solidMaterialDataSchema.parse({
    code: 'RM-PBN-01',
    name: 'Lead(II) nitrate',
    lot: 'PBN-24117',
    expiresOn: '2027-11-30',
    formula: 'Pb(NO3)2',
    analyte: 'Pb',
    purity: 0.9998,
    purityUncertainty: { shape: 'normal', expandedUncertainty: 0.0002, coverageFactor: 2 },
    ...extra,
  });
  return {
    id: 8,
    kind: 'solid-material',
    code: 'RM-PBN-01',
    current: { id: 80, number: 1, data, reason: '', createdBy: 'QA', createdAt: '2026-11-01T00:00:00.000Z' },
  };
}

describe('a solid’s certificate values reach the engine (atomic weights per lot; CIAAW, Possolo et al. 2018)', () => {
  it('a molar mass without an uncertainty is only a check: the engine keeps the standard atomic weights', () => {
    const material = toEngineEquipment(nitrate({ certificateMolarMassGPerMol: 331.2 }));
    expect(material).not.toHaveProperty('certificateMolarMass');
    expect(material).not.toHaveProperty('certificateAtomicWeight');
  });

  it('a molar mass with U and k becomes the lot’s molar mass, with its source', () => {
    const material = toEngineEquipment(
      nitrate({
        certificateMolarMassGPerMol: 331.22,
        certificateMolarMassExpandedUncertaintyGPerMol: 0.04,
        certificateMolarMassCoverageFactor: 2,
        compositionSource: 'certificate lot 2291',
      }),
    );
    expect(material).toMatchObject({
      certificateMolarMass: {
        valueGPerMol: 331.22,
        uncertainty: { shape: 'normal', expandedUncertainty: 0.04, coverageFactor: 2 },
        source: 'certificate lot 2291',
      },
    });
  });

  it('an analyte atomic weight becomes the lot’s atomic weight of that element', () => {
    const material = toEngineEquipment(
      nitrate({
        analyteAtomicWeightGPerMol: 207.21,
        analyteAtomicWeightExpandedUncertaintyGPerMol: 0.02,
        analyteAtomicWeightCoverageFactor: 2,
        compositionSource: 'certificate lot 2291, isotopic analysis',
      }),
    );
    expect(material).toMatchObject({ certificateAtomicWeight: { element: 'Pb', valueGPerMol: 207.21 } });
  });

  it('a revision stored before these fields existed maps as before', () => {
    const item = nitrate({});
    const stored = Object.fromEntries(
      Object.entries(item.current.data).filter(([key]) => !/^(certificate|analyteAtomic|composition)/.test(key)),
    ) as typeof item.current.data;
    const material = toEngineEquipment({ ...item, current: { ...item.current, data: stored } });
    expect(material).not.toHaveProperty('certificateMolarMass');
    expect(material).not.toHaveProperty('certificateAtomicWeight');
  });
});
