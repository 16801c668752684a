import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parsePlan, stepSchema, type Plan } from '../uncertainty';
import { EQUIPMENT_KINDS } from './library';
import { recordedReadingsSchema } from './preparations';
import type { UsedItem } from './snapshot';
import {
  isStepKind,
  itemIn,
  readingWords,
  snapshotStepNamer,
  STEP_KINDS,
  stepGroupName,
  stepInstruction,
} from './step-kinds';

const ENGINE_STEPS = stepSchema.options.map((option) => ({ kind: option.shape.kind.value, shape: option.shape }));
const MATERIAL_KINDS = EQUIPMENT_KINDS.filter((kind) => kind.endsWith('-material'));
const RECORDED_FIELDS = recordedReadingsSchema.shape.readings.element.shape.field.options;

/** An invented plan from tests/fixtures/plans, as the engine reads it. */
const fixturePlan = (name: string): Plan =>
  parsePlan(JSON.parse(readFileSync(new URL(`../../tests/fixtures/plans/${name}.json`, import.meta.url), 'utf8')));

/** Every step of a plan as the bench sheet words it: items by their code. */
const atTheBench = (plan: Plan) =>
  plan.steps.map((step, stepIndex) =>
    stepInstruction(step, {
      item: (slot) => itemIn(step, slot)?.itemId ?? '—',
      stepIndex,
      labTemperatureC: plan.settings.labTemperatureC,
    }),
  );

describe('the step-kind registry', () => {
  it('has an entry for every step kind of the engine, and no other', () => {
    expect(ENGINE_STEPS.length).toBeGreaterThan(0);
    expect(Object.keys(STEP_KINDS).sort()).toEqual(ENGINE_STEPS.map((step) => step.kind).sort());
  });

  it('gives every kind a name, a hint and an instruction, and only slots and fields the plan format has', () => {
    for (const { kind, shape } of ENGINE_STEPS) {
      const entry = STEP_KINDS[kind];
      expect(entry.label, kind).toMatch(/^[A-Z][a-z ]+$/);
      expect(entry.hint, kind).toMatch(/^[A-Z].+\.$/);
      expect(typeof entry.instruction, kind).toBe('function');
      // A step that takes the material has a material slot in the plan format, and the others have none.
      expect(entry.materialKinds !== null, kind).toBe('material' in shape);
      if (entry.slot) expect(Object.keys(shape), kind).toContain(entry.slot.name);
      if (entry.quantity) expect(Object.keys(shape), kind).toContain(entry.quantity.field);
      if (entry.recordedMass) expect(Object.keys(shape), kind).toContain(entry.recordedMass);
      // The container on the pan is asked exactly where the plan format has a containerMassG.
      expect(entry.container, kind).toBe('containerMassG' in shape);
    }
  });

  it('fills each slot with real library kinds: materials for the material, instruments for the rest', () => {
    for (const [kind, entry] of Object.entries(STEP_KINDS)) {
      const slotKinds = entry.slot?.libraryKinds ?? [];
      const materialKinds = entry.materialKinds ?? [];
      expect(slotKinds.length + materialKinds.length, kind).toBeGreaterThan(0);
      for (const libraryKind of slotKinds) {
        expect(EQUIPMENT_KINDS, kind).toContain(libraryKind);
        expect(MATERIAL_KINDS, kind).not.toContain(libraryKind);
      }
      for (const libraryKind of materialKinds) expect(MATERIAL_KINDS, kind).toContain(libraryKind);
    }
    expect(STEP_KINDS.pipetteAliquot.slot?.libraryKinds).toEqual(['glass-pipette', 'piston-pipette']);
  });

  it('records a mass exactly for the weighed steps, in a field a recorded reading may name', () => {
    const weighed = Object.entries(STEP_KINDS).filter(([, entry]) => entry.recordedMass !== null);
    expect(weighed.map(([kind]) => kind).sort()).toEqual([
      'dissolveInSolvent',
      'makeUpToMass',
      'weighAliquot',
      'weighSolid',
    ]);
    for (const [kind, entry] of weighed) {
      expect(RECORDED_FIELDS, kind).toContain(entry.recordedMass);
      // The reading replaces the very mass the analyst planned.
      expect(entry.quantity?.field, kind).toBe(entry.recordedMass);
      expect(entry.slot?.name, kind).toBe('balance');
      // The readings form says what lies on the pan for every weighed step, and for no other.
      expect(entry.onThePan?.('RM-PBN-01 lead nitrate'), kind).toMatch(/\w/);
    }
    expect(
      Object.entries(STEP_KINDS)
        .filter(([, entry]) => entry.onThePan !== null)
        .map(([kind]) => kind)
        .sort(),
    ).toEqual(weighed.map(([kind]) => kind).sort());
    expect(STEP_KINDS.weighSolid.onThePan?.('lead(II) nitrate')).toBe('lead(II) nitrate');
    expect(STEP_KINDS.weighAliquot.onThePan?.('')).toBe('aliquot of the solution');
    expect(readingWords('weighAliquot')).toBe('aliquot mass');
    expect(readingWords('makeUpToMass')).toBe('final solution mass');
  });

  it('knows only the kinds of the plan format, not names every object has', () => {
    expect(isStepKind('weighSolid')).toBe(true);
    expect(isStepKind('toString')).toBe(false);
    expect(isStepKind(undefined)).toBe(false);
  });
});

describe('step instructions', () => {
  it('word every kind of step, masses to the balance readability and piston volumes in µL', () => {
    expect(atTheBench(fixturePlan('lead-standard-from-nitrate'))).toEqual([
      'Weigh 0.1599 g of Lead(II) nitrate, analytical reagent (demo lot) — LOT-PBN-2291 — by difference on B-01.',
      'Transfer quantitatively into the 100 mL flask F-100-A, class A, and make up to the mark at about 20 °C; stopper and mix.',
      'Pipette 10 mL from the solution of step 2 with the one-mark pipette GP-10-A, class A.',
      'Transfer quantitatively into the 100 mL flask F-100-B, class A, and make up to the mark at about 20 °C; stopper and mix.',
      'Set the piston pipette PP-07 to 1000 µL and deliver the aliquot from the solution of step 4.',
      'Transfer quantitatively into the 100 mL flask F-100-C, class A, and make up to the mark at about 20 °C; stopper and mix.',
    ]);
    expect(atTheBench(fixturePlan('lead-gravimetric-dilution')).slice(1)).toEqual([
      'Weigh 1.0000 g of the solution by difference on B-01.',
      'Add solvent to a total solution mass of 100.0000 g on B-01; mix.',
    ]);
    expect(atTheBench(fixturePlan('sodium-chloride-molality'))[1]).toBe(
      'Dissolve in 1000.00 g of solvent weighed on B-04.',
    );
    expect(atTheBench(fixturePlan('selenium-working-standard'))[0]).toMatch(
      /^Let the certified solution Selenium .+ \(1000 mg\/L\) — CRM-SE-0415 — reach room temperature, and shake it\.$/,
    );
  });

  it('sets a piston pipette to a fractional µL volume as it is, and names glassware on its own calibration', () => {
    const plan = fixturePlan('lead-standard-from-nitrate');
    const [piston, glass] = [plan.steps[4], plan.steps[2]];
    if (piston.kind !== 'pipetteAliquot' || glass.kind !== 'pipetteAliquot' || glass.pipette.kind !== 'glassPipette')
      throw new Error('The fixture has a glass pipette at step 3 and a piston pipette at step 5.');
    const context = { item: () => 'P', stepIndex: 3, labTemperatureC: 20 };
    // Until now the bench sheet rounded the set volume to whole µL (2.5 µL printed as 3 µL) and wrote "class own".
    expect(stepInstruction({ ...piston, volumeMl: 0.0025 }, context)).toBe(
      'Set the piston pipette P to 2.5 µL and deliver the aliquot from the solution of step 3.',
    );
    expect(stepInstruction({ ...glass, pipette: { ...glass.pipette, toleranceClass: 'own' } }, context)).toBe(
      'Pipette 10 mL from the solution of step 3 with the one-mark pipette P, own calibration.',
    );
  });

  it('names each item through the caller, so the record can add its revision and certificate', () => {
    const plan = fixturePlan('sodium-chloride-molality');
    const sentence = stepInstruction(plan.steps[1], {
      item: (slot) => `${itemIn(plan.steps[1], slot)?.itemId} (revision 3)`,
      stepIndex: 1,
      labTemperatureC: 20,
    });
    expect(sentence).toBe('Dissolve in 1000.00 g of solvent weighed on B-04 (revision 3).');
  });
});

describe('budget group names', () => {
  const steps = [{ kind: 'weighSolid', code: 'BAL-05' }, { kind: 'makeUpToVolume', code: 'VF-100-A' }, { kind: 'x' }];

  it('name a step by its registry label and item, and a group shared by steps in words', () => {
    expect(stepGroupName('0', steps)).toBe('Step 1 · Weigh the solid (BAL-05)');
    expect(stepGroupName('1', steps)).toBe('Step 2 · Make up to volume (VF-100-A)');
    expect(stepGroupName('1+3', steps)).toBe('Shared by steps 2 and 4');
    expect(stepGroupName('0+1+2', steps)).toBe('Shared by steps 1, 2 and 3');
    expect(stepGroupName('5', steps)).toBe('Step 6');
    expect(stepGroupName('2', steps)).toBe('Step 3 · x');
    expect(stepGroupName('purity', steps)).toBe('purity');
  });

  it('name a computed step by the library code of its item, not the asset tag inside the plan', () => {
    const plan = fixturePlan('sodium-chloride-molality');
    const weighing = plan.steps[0];
    if (weighing.kind !== 'weighSolid') throw new Error('The fixture starts by weighing the solid.');
    expect(weighing.balance.itemId).toBe('B-01');
    const withLibraryId: Plan = { ...plan, steps: [{ ...weighing, balance: { ...weighing.balance, libraryId: '7' } }] };
    const used: UsedItem = {
      libraryId: '7',
      code: 'BAL-05',
      kind: 'balance',
      revisionId: '70',
      revisionNumber: 1,
      certificateReference: '',
      flags: [],
      override: null,
      hazardNotes: '',
    };
    expect(snapshotStepNamer({ plan: withLibraryId, items: [used] })('0')).toBe('Step 1 · Weigh the solid (BAL-05)');
    expect(snapshotStepNamer({ plan, items: [] })('1')).toBe('Step 2 · Dissolve in solvent (B-04)');
  });
});
