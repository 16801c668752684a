import { describe, expect, it } from 'vitest';
import type { RecordedReadings } from '../../../../shared/contracts/preparations';
import {
  netFromGrossAndTare,
  placeServerIssues,
  plannedPlan,
  readingsFormSchema,
  readingsFormValues,
  weighingRows,
} from './bench-readings';

const plan = {
  steps: [
    {
      kind: 'weighSolid',
      netMassG: 0.1599,
      balance: { itemId: 'BAL-05', readabilityG: 0.00001 },
      material: { itemId: 'RM-PBN-01', name: 'Lead(II) nitrate' },
    },
    { kind: 'makeUpToVolume', flask: { itemId: 'VF-100-A' } },
    { kind: 'weighAliquot', netMassG: 2.5, balance: { itemId: 'BAL-04', readabilityG: 0.0001 } },
  ],
};

describe('netFromGrossAndTare', () => {
  it('subtracts the tare from the gross to the decimals typed, without binary remainders', () => {
    // 12.34567 − 12.18577 is 0.15990000000000038 in double precision; the balance showed five decimals.
    expect(netFromGrossAndTare('12.18577', '12.34567')).toBe('0.15990');
    expect(netFromGrossAndTare('12,1', '14.62')).toBe('2.52');
    expect(netFromGrossAndTare('0', '2.5001')).toBe('2.5001');
  });

  it('gives nothing while a value is missing, not a number, or the gross is not above the tare', () => {
    expect(netFromGrossAndTare('', '12.34567')).toBeNull();
    expect(netFromGrossAndTare('12.18577', '')).toBeNull();
    expect(netFromGrossAndTare('12.1x', '12.34567')).toBeNull();
    expect(netFromGrossAndTare('12.34567', '12.18577')).toBeNull();
  });
});

describe('weighingRows', () => {
  it('lists only the weighing steps, with the planned mass to the balance readability', () => {
    const rows = weighingRows(plan, null);
    expect(rows.map((row) => [row.stepIndex, row.what, row.field, row.plannedText])).toEqual([
      [0, 'On BAL-05: Lead(II) nitrate', 'netMassG', '0.15990'],
      [2, 'On BAL-04: aliquot of the solution', 'netMassG', '2.5000'],
    ]);
  });

  it('reads the planned mass back from the readings once the plan holds the mass weighed', () => {
    const readings: RecordedReadings = {
      recordedAt: '2026-12-02T10:00:00.000Z',
      recordedBy: 'Ana Analyst',
      deviations: '',
      readings: [
        { stepIndex: 0, field: 'netMassG', plannedG: 0.1599, actualG: 0.1602, tareG: 12.18577, grossG: 12.34597 },
      ],
    };
    const weighed = { steps: [{ ...plan.steps[0], netMassG: 0.1602 }, plan.steps[1], plan.steps[2]] };
    expect(weighingRows(weighed, readings)[0]).toMatchObject({
      plannedG: 0.1599,
      plannedText: '0.15990',
      recorded: { actualG: 0.1602 },
    });
    expect(readingsFormValues(weighingRows(weighed, readings), readings).readings[0]).toEqual({
      stepIndex: 0,
      tareG: '12.18577',
      grossG: '12.34597',
      actualMassG: '0.16020',
    });
    expect((plannedPlan(weighed, readings).steps as { netMassG?: number }[])[0].netMassG).toBe(0.1599);
  });
});

describe('readingsFormSchema', () => {
  const typed = (rows: [string, string, string][], deviations = '') => ({
    readings: rows.map(([tareG, grossG, actualMassG], index) => ({
      stepIndex: [0, 2][index],
      tareG,
      grossG,
      actualMassG,
    })),
    deviations,
  });
  /** The problems found, keyed by the path the form's boxes and the server share. */
  const problems = (values: ReturnType<typeof typed>) => {
    const parsed = readingsFormSchema.safeParse(values);
    expect(parsed.success).toBe(false);
    return Object.fromEntries((parsed.error?.issues ?? []).map((issue) => [issue.path.join('.'), issue.message]));
  };

  it('builds the request in the order of the rows, with tare and gross when typed', () => {
    const parsed = readingsFormSchema.parse(
      typed(
        [
          ['12.18577', '12.34567', '0.15990'],
          ['', '', '2,4988'],
        ],
        ' Flask rinsed twice. ',
      ),
    );
    expect(parsed).toEqual({
      readings: [
        { stepIndex: 0, actualMassG: 0.1599, tareG: 12.18577, grossG: 12.34567 },
        { stepIndex: 2, actualMassG: 2.4988 },
      ],
      deviations: 'Flask rinsed twice.',
    });
  });

  it('puts each problem on its field under the path the server uses, in the shared schema’s words', () => {
    expect(
      problems(
        typed([
          ['12.3', '12.1', ''],
          ['', '', '2.5g'],
        ]),
      ),
    ).toEqual({
      'readings.0.grossG': 'The gross must be more than the tare.',
      'readings.0.actualMassG': 'Enter the net mass weighed, or the tare and gross.',
      'readings.1.actualMassG': 'Enter the mass as a number, e.g. 0.15990.',
    });
  });

  it('words a negative tare and a mass of zero for the chemist', () => {
    expect(problems(typed([['-1', '', '0']]))).toEqual({
      'readings.0.tareG': 'The tare cannot be negative.',
      'readings.0.actualMassG': 'The mass weighed must be greater than zero.',
    });
  });
});

describe('placeServerIssues', () => {
  it('maps the server’s paths, and a plan problem of step 3 onto that step’s row', () => {
    const rows = weighingRows(plan, null);
    const placed = placeServerIssues(rows, [
      { path: 'readings.0.actualMassG', message: 'Gross − tare is 0.159900 g, not 0.16 g.' },
      { path: 'plan.steps.2.netMassG', message: 'The aliquot is larger than the solution.' },
      { path: 'plan.settings', message: 'Something else.' },
    ]);
    expect(placed.errors).toEqual({
      'readings.0.actualMassG': 'Gross − tare is 0.159900 g, not 0.16 g.',
      'readings.1.actualMassG': 'The aliquot is larger than the solution.',
    });
    expect(placed.unplaced).toEqual(['Something else.']);
  });
});
