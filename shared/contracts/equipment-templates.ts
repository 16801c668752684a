/**
 * Class templates for new glassware and piston pipettes: tolerances from the ISO standards for the
 * common nominal volumes. QA picks one, then adjusts and adds the lab's own fill repeatability.
 * Each row says whether its figure was read from a copy of the table or is recalled from memory.
 */

export interface GlasswareTemplate {
  kind: 'flask' | 'glass-pipette';
  standard: string;
  glassClass: 'A' | 'B';
  nominalMl: number;
  toleranceMl: number;
  provenance: 'read' | 'memory';
}

export interface PistonTemplate {
  kind: 'piston-pipette';
  standard: string;
  nominalUl: number;
  systematicErrorUl: number;
  randomErrorUl: number;
  provenance: 'read' | 'memory';
}

/** ISO 1042:1998 one-mark volumetric flasks, class A, ± mL (read: a national verification table identical to ISO 1042:1998 class A; 5 mL from memory). */
const ISO_1042_CLASS_A: [number, number, 'read' | 'memory'][] = [
  [5, 0.025, 'memory'],
  [10, 0.025, 'read'],
  [20, 0.04, 'read'],
  [25, 0.04, 'read'],
  [50, 0.06, 'read'],
  [100, 0.1, 'read'],
  [200, 0.15, 'read'],
  [250, 0.15, 'read'],
  [500, 0.25, 'read'],
  [1000, 0.4, 'read'],
  [2000, 0.6, 'read'],
];

/** ISO 648:2008 one-mark pipettes, class A, ± mL (from memory). */
const ISO_648_CLASS_A: [number, number][] = [
  [1, 0.008],
  [2, 0.01],
  [5, 0.015],
  [10, 0.02],
  [20, 0.03],
  [25, 0.03],
  [50, 0.05],
  [100, 0.08],
];

/**
 * ISO 8655-2:2002 maximum permissible errors of single-channel piston pipettes at nominal volume:
 * systematic (±) and random (as a standard deviation), µL. 1000 µL read; the others from memory.
 */
const ISO_8655_2: [number, number, number, 'read' | 'memory'][] = [
  [10, 0.12, 0.08, 'memory'],
  [20, 0.2, 0.1, 'memory'],
  [50, 0.5, 0.2, 'memory'],
  [100, 0.8, 0.3, 'memory'],
  [200, 1.6, 0.6, 'memory'],
  [500, 4, 1.5, 'memory'],
  [1000, 8, 3, 'read'],
  [2000, 16, 6, 'memory'],
  [5000, 40, 15, 'memory'],
  [10000, 60, 30, 'memory'],
];

/** Class B tolerances are twice class A for both standards (from memory). */
const CLASS_B_FACTOR = 2;

const round = (value: number) => Number(value.toPrecision(6));

export const GLASSWARE_TEMPLATES: GlasswareTemplate[] = [
  ...ISO_1042_CLASS_A.flatMap(([nominalMl, toleranceMl, provenance]): GlasswareTemplate[] => [
    { kind: 'flask', standard: 'ISO 1042', glassClass: 'A', nominalMl, toleranceMl, provenance },
    {
      kind: 'flask',
      standard: 'ISO 1042',
      glassClass: 'B',
      nominalMl,
      toleranceMl: round(toleranceMl * CLASS_B_FACTOR),
      provenance: 'memory',
    },
  ]),
  ...ISO_648_CLASS_A.flatMap(([nominalMl, toleranceMl]): GlasswareTemplate[] => [
    { kind: 'glass-pipette', standard: 'ISO 648', glassClass: 'A', nominalMl, toleranceMl, provenance: 'memory' },
    {
      kind: 'glass-pipette',
      standard: 'ISO 648',
      glassClass: 'B',
      nominalMl,
      toleranceMl: round(toleranceMl * CLASS_B_FACTOR),
      provenance: 'memory',
    },
  ]),
];

export const PISTON_TEMPLATES: PistonTemplate[] = ISO_8655_2.map(
  ([nominalUl, systematicErrorUl, randomErrorUl, provenance]) => ({
    kind: 'piston-pipette',
    standard: 'ISO 8655-2',
    nominalUl,
    systematicErrorUl,
    randomErrorUl,
    provenance,
  }),
);
