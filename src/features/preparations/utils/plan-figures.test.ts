import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluatePlan, parsePlan } from '../../../../shared/uncertainty';
import { dilutionComparison, planFigures, relativeVarianceByStep } from './plan-figures';

const fixturePlan = (name: string) =>
  parsePlan(JSON.parse(readFileSync(new URL(`../../../../tests/fixtures/plans/${name}`, import.meta.url), 'utf8')));

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

describe('relativeVarianceByStep (the compare chart)', () => {
  // Selenium working standard: the piston pipette PP-07 delivers both aliquots (steps 2 and 4), so its calibration
  // offset is one source shared by the two steps.
  const twoPipettings = evaluatePlan(fixturePlan('selenium-working-standard.json'));
  const oneStep = evaluatePlan(fixturePlan('sodium-chloride-molality.json'));

  it('adds up to each preparation’s (u_c/y)² with the pipette used twice as a bar of its own (JCGM 100:2008 5.1.2: variances add)', () => {
    const bars = relativeVarianceByStep([
      { key: 'twice', budget: twoPipettings },
      { key: 'once', budget: oneStep },
    ]);
    expect(bars.map((bar) => bar.step)).toContain('Shared by steps 2 and 4');
    for (const [key, budget] of [
      ['twice', twoPipettings],
      ['once', oneStep],
    ] as const) {
      const total = bars.reduce((sum, bar) => sum + (typeof bar[key] === 'number' ? bar[key] : 0), 0);
      const expected = ((100 * budget.standardUncertainty) / budget.value) ** 2;
      expect(total).toBeGreaterThan(0);
      expect(Math.abs(total - expected) / expected).toBeLessThan(1e-12);
    }
  });

  it('puts the steps in order and the shared groups after them', () => {
    const bars = relativeVarianceByStep([{ key: 'p1', budget: twoPipettings }]);
    expect(bars.map((bar) => bar.step)).toEqual([
      'Step 1',
      'Step 2',
      'Step 3',
      'Step 4',
      'Step 5',
      'Shared by steps 2 and 4',
    ]);
    // The shared pipette offset dominates this budget (its share of the variance, as the record states it).
    const shared = twoPipettings.byStep.find((group) => group.key === '1+3')!;
    expect(shared.indexPercent).toBeGreaterThan(50);
  });
});
