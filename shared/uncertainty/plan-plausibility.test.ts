import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluatePlan } from './evaluate-plan';
import { PlanError } from './plan-error';
import type { PlanInput } from './plan-schema';

// Every check here is common practice at the bench: an aliquot cannot be more than the solution it is drawn
// from, a make-up cannot hold less than what is put into it, and a flask holds one solution at a time.

const fixtures = new URL('../../tests/fixtures/plans/', import.meta.url);
const readJson = <T>(relative: string): T => JSON.parse(readFileSync(new URL(relative, fixtures), 'utf8')) as T;
type Step = PlanInput['steps'][number];
type Item = { itemId: string } & Record<string, unknown>;
const library = readJson<{ balances: Item[]; flasks: Item[]; pipettes: Item[] }>('library/demo-equipment-library.json');
const lead = readJson<{ steps: Step[] }>('lead-standard-from-nitrate.json');
const gravimetric = readJson<{ steps: Step[] }>('lead-gravimetric-dilution.json');

const find = (items: Item[], itemId: string) => {
  const item = items.find((each) => each.itemId === itemId);
  if (!item) throw new Error(`${itemId} is not in the demo library fixture`);
  return item;
};
const balance = find(library.balances, 'B-01');
const flask = (itemId: string) => ({ kind: 'makeUpToVolume', flask: find(library.flasks, itemId) }) as Step;
const pipette = (itemId: string, volumeMl: number) =>
  ({ kind: 'pipetteAliquot', pipette: find(library.pipettes, itemId), volumeMl }) as Step;
const weighAliquot = (netMassG: number) => ({ kind: 'weighAliquot', balance, netMassG, containerMassG: 60 }) as Step;
const makeUpToMass = (finalMassG: number) =>
  ({ kind: 'makeUpToMass', balance, finalMassG, containerMassG: 60 }) as Step;
/** 0.1599 g of lead nitrate, as in the lead example plan. */
const weighedSolid = lead.steps[0];
/** 1000 mg/kg Pb certified solution, as in the gravimetric example plan. */
const certifiedPb = gravimetric.steps[0];

const plan = (steps: Step[], outputUnit: PlanInput['settings']['outputUnit'] = 'mg/L'): PlanInput => ({
  formatVersion: 1,
  analyte: { formula: 'Pb' },
  settings: { outputUnit, labTemperatureC: 20 },
  steps,
});

function refusal(steps: Step[], outputUnit?: PlanInput['settings']['outputUnit']): PlanError {
  try {
    evaluatePlan(plan(steps, outputUnit));
  } catch (error) {
    expect(error).toBeInstanceOf(PlanError);
    return error as PlanError;
  }
  throw new Error('expected the plan to be refused');
}

describe('an aliquot is smaller than the solution it is drawn from (common practice)', () => {
  it('refuses 25 g weighed out of a 20 mL stock, comparing through the density of water at 20 °C', () => {
    const error = refusal([weighedSolid, flask('F-20-A'), weighAliquot(25), flask('F-100-A')]);
    expect(error.path).toEqual(['steps', 2, 'netMassG']);
    // 25 g / 0.998207 g/mL (Tanaka et al. 2001 at 20 °C) = 25.04 mL.
    expect(error.message).toBe(
      'Step 3: the aliquot (25 g, about 25.04 mL at 0.9982 g/mL) is not smaller than the solution it is taken from ' +
        '(20 mL, made up to volume at step 2); take a smaller aliquot, or make up more solution at step 2.',
    );
  });

  it('refuses 25 mL pipetted from a stock made up to 20 g', () => {
    const error = refusal([certifiedPb, weighAliquot(1), makeUpToMass(20), pipette('GP-25-A', 25), flask('F-100-A')]);
    expect(error.path).toEqual(['steps', 3, 'volumeMl']);
    expect(error.message).toMatch(/^Step 4: the aliquot \(25 mL, about 24\.96 g at 0\.9982 g\/mL\) is not smaller/);
    expect(error.message).toMatch(/\(20 g, made up to mass at step 3\); take a smaller aliquot/);
  });

  it('refuses a weighed aliquot larger than a solution made up to mass', () => {
    const error = refusal(
      [certifiedPb, weighAliquot(1), makeUpToMass(20), weighAliquot(25), makeUpToMass(100)],
      'mg/kg',
    );
    expect(error.path).toEqual(['steps', 3, 'netMassG']);
    expect(error.message).toMatch(
      /^Step 4: the aliquot \(25 g\) is not smaller than the solution it is taken from \(20 g,/,
    );
  });

  it('refuses an aliquot equal to its source, within 1e-9 relative (0.1 + 0.2 g from 0.3 g)', () => {
    const error = refusal(
      [certifiedPb, weighAliquot(0.1), makeUpToMass(0.3), weighAliquot(0.1 + 0.2), makeUpToMass(100)],
      'mg/kg',
    );
    expect(error.path).toEqual(['steps', 3, 'netMassG']);
    expect(error.message).toMatch(/the aliquot \(0\.3 g\) is not smaller than the solution it is taken from \(0\.3 g,/);
  });

  it('accepts a 10 mL aliquot of 100 mL, and does not check a certified solution (its amount is not known)', () => {
    expect(
      evaluatePlan(plan([weighedSolid, flask('F-100-A'), pipette('GP-10-A', 10), flask('F-100-B')])).value,
    ).toBeGreaterThan(0);
    expect(evaluatePlan(plan([certifiedPb, pipette('GP-100-A', 100), flask('F-1000-A')])).value).toBeGreaterThan(0);
  });
});

describe('a make-up holds more than what is put into it (common practice)', () => {
  it('refuses a 25 mL aliquot into a 20 mL flask', () => {
    const error = refusal([weighedSolid, flask('F-100-A'), pipette('GP-25-A', 25), flask('F-20-A')]);
    expect(error.path).toEqual(['steps', 3, 'flask']);
    expect(error.message).toBe(
      'Step 4: the aliquot (25 mL) does not fit in the 20 mL flask it is to be made up in; choose a larger flask or a smaller aliquot.',
    );
  });

  it('refuses a 30 g aliquot into a 25 mL flask, and accepts 20 g', () => {
    const error = refusal([weighedSolid, flask('F-100-A'), weighAliquot(30), flask('F-25-A')]);
    expect(error.path).toEqual(['steps', 3, 'flask']);
    expect(error.message).toMatch(
      /^Step 4: the aliquot \(30 g, about 30\.05 mL at 0\.9982 g\/mL\) does not fit in the 25 mL flask/,
    );
    expect(
      evaluatePlan(plan([weighedSolid, flask('F-100-A'), weighAliquot(20), flask('F-25-A')])).value,
    ).toBeGreaterThan(0);
  });

  it('refuses a final mass not more than the weighed aliquot (1 g made up to 1 g)', () => {
    const error = refusal([certifiedPb, weighAliquot(1), makeUpToMass(1)], 'mg/kg');
    expect(error.path).toEqual(['steps', 2, 'finalMassG']);
    expect(error.message).toBe(
      'Step 3: the final solution mass (1 g) is not more than the aliquot it is made up from (1 g); make up to a larger mass, or take a smaller aliquot.',
    );
  });

  it('refuses a pipetted aliquot heavier than the final mass, and a solid heavier than its solution', () => {
    const pipetted = refusal([certifiedPb, pipette('GP-25-A', 25), makeUpToMass(20)], 'mg/kg');
    expect(pipetted.path).toEqual(['steps', 2, 'finalMassG']);
    expect(pipetted.message).toMatch(
      /final solution mass \(20 g\) is not more than the aliquot .*\(25 mL, about 24\.96 g/,
    );
    const solid = refusal([weighedSolid, makeUpToMass(0.1)], 'mg/kg');
    expect(solid.message).toMatch(
      /not more than the weighed solid it is made up from \(0\.1599 g\); .* take less of the solid\.$/,
    );
  });
});

describe('a flask holds one solution at a time (common practice)', () => {
  const reuse = (emptied?: boolean) => {
    const again = { ...flask('F-100-A'), ...(emptied === undefined ? {} : { flaskEmptiedBefore: emptied }) } as Step;
    return [weighedSolid, flask('F-100-A'), pipette('GP-10-A', 10), again];
  };

  it('refuses making up in the flask that still holds the stock the aliquot is drawn from', () => {
    const error = refusal(reuse());
    expect(error.path).toEqual(['steps', 3, 'flask']);
    expect(error.message).toBe(
      'Step 4: flask F-100-A still holds the solution made up in it at step 2, from which step 3 takes its aliquot. ' +
        'Choose another flask, or state that the solution of step 2 is first transferred to a labelled storage bottle and the flask rinsed.',
    );
    expect(refusal(reuse(false)).path).toEqual(['steps', 3, 'flask']);
  });

  it('accepts it when the plan says the stock was first moved to a storage bottle', () => {
    const moved = evaluatePlan(plan(reuse(true)));
    const twoFlasks = evaluatePlan(plan([weighedSolid, flask('F-100-A'), pipette('GP-10-A', 10), flask('F-100-B')]));
    expect(moved.value).toBeCloseTo(twoFlasks.value, 9);
  });

  it('refuses a flask reused two make-ups later, when the solution in it is no longer drawn from', () => {
    const steps = [...lead.steps];
    steps[5] = { ...steps[5], flask: steps[1].kind === 'makeUpToVolume' ? steps[1].flask : undefined } as Step;
    const error = refusal(steps);
    expect(error.path).toEqual(['steps', 5, 'flask']);
    expect(error.message).toMatch(
      /^Step 6: flask F-100-A still holds the solution made up in it at step 2\. Choose another flask/,
    );
  });

  it('refuses the statement that a flask was emptied when no earlier step used it', () => {
    const steps = [weighedSolid, { ...flask('F-100-A'), flaskEmptiedBefore: true } as Step];
    const error = refusal(steps);
    expect(error.path).toEqual(['steps', 1, 'flaskEmptiedBefore']);
    expect(error.message).toMatch(/no earlier step makes a solution in flask F-100-A/);
  });
});
