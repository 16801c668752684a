import { describe, expect, it } from 'vitest';
import { benchSheetLines } from './bench-sheet-lines';

describe('benchSheetLines', () => {
  it('gives masses to the balance readability and volumes as the glassware marks them', () => {
    const lines = benchSheetLines(
      {
        steps: [
          {
            kind: 'weighSolid',
            netMassG: 0.1599,
            balance: { itemId: 'BAL-05', readabilityG: 0.00001 },
            material: { itemId: 'RM-PBN-01', name: 'Lead(II) nitrate' },
          },
          { kind: 'makeUpToVolume', flask: { itemId: 'VF-100-A', nominalMl: 100, toleranceClass: 'A' } },
          { kind: 'pipetteAliquot', volumeMl: 0.25, pipette: { kind: 'pistonPipette', itemId: 'PP-1000' } },
          { kind: 'weighAliquot', netMassG: 2.5, balance: { itemId: 'BAL-04', readabilityG: 0.0001 } },
        ],
      },
      20,
    );
    expect(lines.map((line) => line.action)).toEqual([
      'Weigh 0.15990 g of Lead(II) nitrate (RM-PBN-01) by difference on BAL-05.',
      'Transfer quantitatively into flask VF-100-A (100 mL, class A) and make up to the mark at about 20 °C; stopper and mix.',
      'Set piston pipette PP-1000 to 250 µL and deliver the aliquot.',
      'Weigh 2.5000 g of the solution by difference on BAL-04.',
    ]);
    expect(lines.map((line) => line.readings)).toEqual(['weighing', 'volume', 'volume', 'weighing']);
  });
});
