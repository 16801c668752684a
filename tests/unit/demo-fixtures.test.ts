import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { pistonErrorsUl } from '../../shared/uncertainty/volume-delivery';

const plansFolder = new URL('../fixtures/plans/', import.meta.url);
const readJson = (relative: string): unknown => JSON.parse(readFileSync(new URL(relative, plansFolder), 'utf8'));

type Item = { kind: string; itemId: string } & Record<string, unknown>;
const library = readJson('library/demo-equipment-library.json') as Record<'balances' | 'flasks' | 'pipettes', Item[]>;
const libraryItems = [...library.balances, ...library.flasks, ...library.pipettes];
const EQUIPMENT_KINDS = new Set(libraryItems.map((item) => item.kind));

/** Every object with an itemId in a plan document: its balances, flasks, pipettes and materials. */
function itemsIn(value: unknown): Item[] {
  if (Array.isArray(value)) return value.flatMap(itemsIn);
  if (value === null || typeof value !== 'object') return [];
  const own = 'itemId' in value ? [value as Item] : [];
  return [...own, ...Object.values(value).flatMap(itemsIn)];
}

const planFiles = readdirSync(plansFolder).filter((name) => name.endsWith('.json'));
const equipmentUses = planFiles.flatMap((file) =>
  itemsIn(readJson(file))
    .filter((item) => EQUIPMENT_KINDS.has(item.kind))
    .map((item) => ({ file, item })),
);

describe('the demo fixtures: one data set per itemId', () => {
  it('lists each itemId once in the demo library', () => {
    const ids = libraryItems.map((item) => item.itemId);
    expect(ids.length).toBeGreaterThan(20);
    expect(new Set(ids).size).toBe(ids.length);
  });

  it('gives every balance, flask and pipette of every fixture plan exactly its library entry', () => {
    expect(planFiles.length).toBeGreaterThanOrEqual(4);
    expect(equipmentUses.length).toBeGreaterThan(10);
    for (const { file, item } of equipmentUses) {
      const entry = libraryItems.find((each) => each.itemId === item.itemId);
      expect(entry, `${item.itemId} of ${file} is not in the demo library`).toBeDefined();
      expect(item, `${item.itemId} in ${file}`).toEqual(entry);
    }
  });

  it('keeps the 100–1000 µL piston pipette PP-07 at its nominal limits over its whole range (ISO 8655-2, from memory)', () => {
    // ISO 8655-2 (from memory): for an adjustable pipette the maximum permissible errors in µL at the nominal
    // volume (1000 µL: systematic ±8 µL, random 3 µL) apply at every selected volume; they are not the
    // limits of a 100 µL pipette (0.8 µL / 0.3 µL) at 100 µL.
    const pipette = libraryItems.find((item) => item.itemId === 'PP-07') as Item & {
      errorSpecifications: { volumeUl: number; systematicError: unknown; randomError: unknown }[];
    };
    expect(pipette.errorSpecifications.map((spec) => spec.volumeUl)).toEqual([100, 500, 1000]);
    for (const spec of pipette.errorSpecifications) {
      expect(spec.systematicError).toEqual({ absoluteUl: 8 });
      expect(spec.randomError).toEqual({ absoluteUl: 3 });
    }
    const uses = equipmentUses.filter(({ item }) => item.itemId === 'PP-07');
    expect(uses.length).toBeGreaterThanOrEqual(3);
    // As the engine reads each plan's PP-07 at 100, 250 and 1000 µL: the 1000 µL limits everywhere.
    for (const { item } of uses)
      for (const volumeUl of [100, 250, 1000])
        expect(pistonErrorsUl(item as never, volumeUl)).toMatchObject({ systematicUl: 8, randomUl: 3 });
  });
});
