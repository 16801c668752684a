import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluatePlan } from './evaluate-plan';
import { minimumWeightG } from './minimum-weight';
import type { PlanInput } from './plan-schema';
import { findRoutes, type RouteRequest } from './route-finder';

const fixtures = new URL('../../tests/fixtures/plans/', import.meta.url);
const readJson = <T>(relative: string): T => JSON.parse(readFileSync(new URL(relative, fixtures), 'utf8')) as T;
type Library = {
  balances: { itemId: string; capacityG: number; readabilityG: number; repeatabilityG: number }[];
  flasks: { itemId: string; nominalMl: number }[];
  pipettes: { itemId: string; kind: string; nominalMl?: number }[];
};
const library = readJson<Library>('library/demo-equipment-library.json');
const selenium = readJson<{ steps: { material: RouteRequest['material'] }[] }>('selenium-working-standard.json');
const lead = readJson<{ steps: { material: RouteRequest['material'] }[] }>('lead-standard-from-nitrate.json');
const pick = <T extends { itemId: string }>(items: T[], ids: string[]) =>
  ids.map((id) => items.find((item) => item.itemId === id) as T);

const twoDigits = (value: number) => Number(value.toPrecision(2));

describe('route finder', () => {
  // A small library where every route can be listed by hand: 1000 mg/L Se certified solution → 10 mg/L
  // with flasks 100, 100, 10 mL and pipettes 10 mL, 1 mL glass and a 100–1000 µL piston pipette.
  const smallFlasks = pick(library.flasks, ['F-100-A', 'F-100-B', 'F-10-A']) as RouteRequest['flasks'];
  const smallPipettes = pick(library.pipettes, ['GP-10-A', 'GP-1-A', 'PP-07']) as NonNullable<RouteRequest['pipettes']>;
  const certified = selenium.steps[0].material as Extract<RouteRequest['material'], { kind: 'certifiedSolution' }>;
  const small: RouteRequest = {
    target: { value: 10, unit: 'mg/L' },
    analyte: { formula: 'Se' },
    material: certified,
    balances: [],
    flasks: smallFlasks,
    pipettes: smallPipettes,
    limit: 50,
    maximumDilutions: 2,
  };

  it('finds the best route that an exhaustive enumeration finds, and ranks by relative U', () => {
    const result = findRoutes(small);
    // Exhaustive: one dilution by 100 (1 mL glass or 1000 µL piston into a 100 mL flask), or two by 10
    // (10 mL into 100 mL, then 10 mL into the other 100 mL); a 10 mL aliquot cannot come from the 10 mL flask.
    const exhaustive: PlanInput[] = [];
    const start = { kind: 'startFromCertifiedSolution' as const, material: certified };
    const flask = (id: string) => ({
      kind: 'makeUpToVolume' as const,
      flask: smallFlasks.find((item) => item.itemId === id) as RouteRequest['flasks'][number],
    });
    const aliquot = (id: string, volumeMl: number) => ({
      kind: 'pipetteAliquot' as const,
      pipette: smallPipettes.find((item) => item.itemId === id) as NonNullable<RouteRequest['pipettes']>[number],
      volumeMl,
    });
    const plan = (steps: PlanInput['steps']): PlanInput => ({
      formatVersion: 1,
      analyte: { formula: 'Se' },
      settings: { outputUnit: 'mg/L' },
      steps,
    });
    for (const [pipette, volume] of [
      ['GP-1-A', 1],
      ['PP-07', 1],
    ] as const)
      for (const target of ['F-100-A', 'F-100-B'])
        exhaustive.push(plan([start, aliquot(pipette, volume), flask(target)]));
    exhaustive.push(plan([start, aliquot('GP-10-A', 10), flask('F-100-A'), aliquot('GP-10-A', 10), flask('F-100-B')]));
    const best = Math.min(...exhaustive.map((entry) => evaluatePlan(entry).relativeExpandedUncertainty));
    expect(twoDigits(result.routes[0].relativeExpandedUncertainty)).toBe(twoDigits(best));
    const keys = result.routes.map((route) => twoDigits(route.relativeExpandedUncertainty));
    expect([...keys].sort((left, right) => left - right)).toEqual(keys);
    // The glass 1 mL pipette (±0.008 mL, ISO 648:2008 class A, from memory) beats the piston pipette (±8 µL systematic + 3 µL random, ISO 8655-2:2002 at 1000 µL, read).
    const oneStep = result.routes.filter((route) => route.dilutionSteps === 1);
    expect(oneStep[0].description).toContain('GP-1-A');
  });

  it('every route meets its target and respects the items on hand', () => {
    const routes = findRoutes(small).routes;
    expect(routes.length).toBeGreaterThan(1);
    for (const route of routes) {
      expect(Math.abs(route.value / 10 - 1)).toBeLessThanOrEqual(0.005);
      const steps = route.plan.steps as {
        kind: string;
        flask?: { itemId: string; nominalMl: number };
        volumeMl?: number;
      }[];
      const flasks = steps.filter((step) => step.flask).map((step) => step.flask?.itemId);
      expect(new Set(flasks).size).toBe(flasks.length);
      expect(flasks.length).toBeGreaterThan(0);
      let previousMl = Infinity;
      for (const step of steps) {
        if (step.volumeMl !== undefined) expect(step.volumeMl).toBeLessThan(previousMl);
        if (step.flask) previousMl = step.flask.nominalMl;
      }
    }
  });

  it('never makes up twice in one flask, even when the library lists the same flask twice (common practice)', () => {
    // A flask holds one solution at a time: with F-100-A listed twice and F-10-A too small for a 10 mL aliquot,
    // two dilutions by 10 would need F-100-A again, and the plan compiler would refuse that route.
    const twice = pick(library.flasks, ['F-100-A', 'F-100-A', 'F-100-B']) as RouteRequest['flasks'];
    const routes = findRoutes({ ...small, flasks: twice }).routes;
    expect(routes.length).toBeGreaterThan(0);
    const twoStep = routes.filter((route) => route.dilutionSteps === 2);
    expect(twoStep.length).toBeGreaterThan(0);
    for (const route of routes) {
      const flasks = (route.plan.steps as { flask?: { itemId: string } }[]).flatMap((step) =>
        step.flask ? [step.flask.itemId] : [],
      );
      expect(new Set(flasks).size).toBe(flasks.length);
    }
    const oneFlask = findRoutes({
      ...small,
      flasks: pick(library.flasks, ['F-100-A', 'F-100-A']) as RouteRequest['flasks'],
    });
    expect(oneFlask.routes.length).toBeGreaterThan(0);
    expect(oneFlask.routes.every((route) => route.dilutionSteps === 1)).toBe(true);
  });

  it('from a solid, weighs at least the USP <41> minimum and no more than the capacity', () => {
    const result = findRoutes({
      target: { value: 10, unit: 'µg/L' },
      analyte: { formula: 'Pb' },
      material: lead.steps[0].material,
      balances: library.balances as RouteRequest['balances'],
      flasks: library.flasks as RouteRequest['flasks'],
      pipettes: library.pipettes as RouteRequest['pipettes'],
      limit: 10,
    });
    expect(result.routes.length).toBe(10);
    for (const route of result.routes) {
      const weighing = route.plan.steps[0] as {
        balance: { capacityG: number; readabilityG: number; repeatabilityG: number };
        netMassG: number;
      };
      expect(weighing.netMassG).toBeGreaterThanOrEqual(
        minimumWeightG(weighing.balance.repeatabilityG, weighing.balance.readabilityG) * (1 - 1e-3),
      );
      expect(weighing.netMassG).toBeLessThanOrEqual(weighing.balance.capacityG);
      expect(Math.abs(route.value / 10 - 1)).toBeLessThan(0.01); // mass rounded to the balance's readability
    }
  });

  it('refuses a mass-fraction target with a path', () => {
    expect(() => findRoutes({ ...small, target: { value: 1, unit: 'mg/kg' } })).toThrow(/volumetric routes/);
  });

  // A library of many flasks and pipettes (duplicates of the demo items under their own tags) and a target no
  // route reaches: nothing tightens the search bound, so before the search had a budget it enumerated every
  // sequence of up to three dilutions (its cost grows with the cube of the library) on the request thread.
  const many = <T extends { itemId: string }>(items: T[], copies: number) =>
    Array.from({ length: copies }, (_, copy) =>
      items.map((item) => ({ ...item, itemId: `${item.itemId}-${copy}` })),
    ).flat();
  const unreachable: RouteRequest = {
    ...small,
    target: { value: 0.0123457, unit: 'mg/L' },
    flasks: many(library.flasks as RouteRequest['flasks'], 2),
    pipettes: many(library.pipettes as NonNullable<RouteRequest['pipettes']>, 2),
    relativeTargetTolerance: 1e-9,
    maximumDilutions: 3,
  };

  it('stops a search that exceeds its budget and says so in the answer', () => {
    const result = findRoutes(unreachable);
    expect(result.stoppedEarly).toBe(true);
    expect(result.searchNote).toMatch(/stopped after .* candidate routes/);
    expect(result.routes).toEqual([]);
  });

  it('says nothing about stopping when the search finished', () => {
    const result = findRoutes(small);
    expect(result.stoppedEarly).toBe(false);
    expect(result.searchNote).toBeNull();
  });
});
