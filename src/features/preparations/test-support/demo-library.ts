import type { EquipmentItem, EquipmentKind } from '../../../../shared/contracts/library';

/**
 * A few items of the invented demo lab library (as the server's seed writes them), as the
 * GET /equipment API returns them, for the planner's tests.
 */
function item(
  id: number,
  kind: EquipmentKind,
  data: Record<string, unknown>,
  states: Partial<Pick<EquipmentItem, 'calibration' | 'expiry' | 'flags' | 'minimumWeightG'>> = {},
): EquipmentItem {
  return {
    id,
    kind,
    code: String(data.code),
    status: 'active',
    retiredReason: null,
    current: { id: id * 10, number: 1, data, reason: 'demo', createdBy: 'QA', createdAt: '2026-06-01T00:00:00.000Z' },
    calibration: states.calibration ?? 'ok',
    expiry: states.expiry ?? 'not-applicable',
    minimumWeightG: states.minimumWeightG ?? null,
    certificateCount: 0,
    flags: states.flags ?? [],
  };
}

const flask = (id: number, code: string, nominalMl: number, toleranceMl: number, glassClass: 'A' | 'B') =>
  item(id, 'flask', {
    code,
    nominalMl,
    glassClass,
    toleranceMl,
    toleranceDistribution: null,
    fillRepeatabilityMl: Number((toleranceMl * 0.2).toPrecision(2)),
    calibrationTemperatureC: 20,
  });

export const DEMO_LIBRARY: EquipmentItem[] = [
  item(
    1,
    'balance',
    {
      code: 'BAL-05',
      capacityG: 220,
      readabilityG: 0.00001,
      repeatabilityG: 0.000015,
      linearityG: 0.00003,
      sensitivityRelativeExpanded: 0.0000025,
      sensitivityCoverageFactor: 2,
    },
    { minimumWeightG: 0.03 },
  ),
  item(
    2,
    'balance',
    {
      code: 'BAL-04',
      capacityG: 320,
      readabilityG: 0.0001,
      repeatabilityG: 0.00008,
      linearityG: 0.0002,
      sensitivityRelativeExpanded: 0.000005,
      sensitivityCoverageFactor: 2,
    },
    {
      calibration: 'overdue',
      flags: ['calibration overdue'],
    },
  ),
  // ISO 1042:1998 class A / B tolerances for 100 mL flasks (0.10 / 0.20 mL), ISO 648:2008 class A for a 10 mL pipette (0.020 mL).
  flask(3, 'VF-100-A', 100, 0.1, 'A'),
  flask(4, 'VF-100-B', 100, 0.2, 'B'),
  flask(5, 'VF-250-A', 250, 0.15, 'A'),
  item(6, 'glass-pipette', {
    code: 'GP-10-A',
    nominalMl: 10,
    glassClass: 'A',
    toleranceMl: 0.02,
    toleranceDistribution: null,
    fillRepeatabilityMl: 0.005,
    calibrationTemperatureC: 20,
  }),
  item(7, 'glass-pipette', {
    code: 'GP-25-A',
    nominalMl: 25,
    glassClass: 'A',
    toleranceMl: 0.03,
    toleranceDistribution: null,
    fillRepeatabilityMl: 0.0075,
    calibrationTemperatureC: 20,
  }),
  item(
    8,
    'solid-material',
    {
      code: 'RM-PBN-01',
      name: 'Lead(II) nitrate, certified reference material',
      formula: 'Pb(NO3)2',
      analyte: 'Pb',
      purity: 0.9998,
      purityUncertainty: { shape: 'normal', expandedUncertainty: 0.0002, coverageFactor: 2 },
      hazardNotes: 'Lead compounds are toxic.',
    },
    { expiry: 'ok' },
  ),
];

export const DEMO_LIBRARY_BY_ID = new Map(DEMO_LIBRARY.map((each) => [String(each.id), each]));

export const DEMO_POLICY = {
  coverage: { mode: 'probability', probability: 0.9545 },
  glasswareDistribution: 'triangular',
  temperatureHalfRangeC: 4,
  minimumWeightRule: true,
  monteCarloInterval: 'symmetric',
} as const;
