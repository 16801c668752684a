import { describe, expect, it } from 'vitest';
import { dilutionComparison, planFigures } from './plan-figures';

const flask = (nominalMl: number) => ({ kind: 'volumetricFlask', nominalMl });

describe('planFigures', () => {
  it('counts the solid weighed, the dilutions and the solution not carried forward', () => {
    const figures = planFigures({
      steps: [
        { kind: 'weighSolid', netMassG: 0.1599 },
        { kind: 'makeUpToVolume', flask: flask(100) },
        { kind: 'pipetteAliquot', volumeMl: 10 },
        { kind: 'makeUpToVolume', flask: flask(100) },
      ],
    });
    // 100 mL stock minus the 10 mL aliquot is waste; the last 100 mL flask is the product.
    expect(figures).toEqual({
      dilutionSteps: 1,
      materialUsed: { massG: 0.1599 },
      wasteMl: 90,
      wasteG: 0,
      productMl: 100,
    });
  });

  it('counts the certified solution pipetted as material, not as a dilution', () => {
    const figures = planFigures({
      steps: [
        { kind: 'startFromCertifiedSolution' },
        { kind: 'pipetteAliquot', volumeMl: 1 },
        { kind: 'makeUpToVolume', flask: flask(100) },
        { kind: 'pipetteAliquot', volumeMl: 1 },
        { kind: 'makeUpToVolume', flask: flask(100) },
      ],
    });
    expect(figures).toEqual({
      dilutionSteps: 1,
      materialUsed: { volumeMl: 1 },
      wasteMl: 99,
      wasteG: 0,
      productMl: 100,
    });
  });
});

describe('dilutionComparison', () => {
  it('says whether the extra dilution lowers the relative expanded uncertainty', () => {
    expect(
      dilutionComparison(
        { title: 'A', dilutionSteps: 1, relativeU: 0.0038 },
        { title: 'B', dilutionSteps: 2, relativeU: 0.0046 },
      ),
    ).toBe(
      '“B” uses 1 more dilution step than “A” (2 against 1); relative U 0.46 % against 0.38 %: the extra step raises the total uncertainty.',
    );
    expect(
      dilutionComparison(
        { title: 'A', dilutionSteps: 2, relativeU: 0.0031 },
        { title: 'B', dilutionSteps: 1, relativeU: 0.0038 },
      ),
    ).toContain('the extra step lowers the total uncertainty');
  });
});
