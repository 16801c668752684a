import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { planJsonSchema } from './plan-json-schema';

const root = fileURLToPath(new URL('../../', import.meta.url));

describe('generated plan JSON Schema', () => {
  it('docs/plan.schema.json is up to date (regenerate: npm run -s budget -- --schema > docs/plan.schema.json)', () => {
    const committed = JSON.parse(readFileSync(new URL('docs/plan.schema.json', `file://${root}`), 'utf8')) as unknown;
    expect(committed).toEqual(JSON.parse(JSON.stringify(planJsonSchema())));
  });
});

describe('budget CLI', () => {
  const run = (...args: string[]) =>
    spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/budget.ts', ...args], { cwd: root, encoding: 'utf8' });

  it('prints the budget, Monte Carlo summary and validation as JSON', () => {
    const result = run('tests/fixtures/engine/eurachem-cg4-a1.json', '--seed', '3');
    // The A1 fixture wraps its plan; the CLI needs the plan itself, so this one is refused...
    expect(result.status).toBe(1);
    expect(result.stderr).toMatch(/Invalid plan/);
    const plan = run('tests/fixtures/plans/selenium-working-standard.json', '--seed', '3');
    expect(plan.status).toBe(0);
    const output = JSON.parse(plan.stdout) as {
      value: number;
      unit: string;
      expandedUncertainty: number;
      monteCarlo: { seed: number; trials: number; symmetricInterval: { low: number; high: number } };
      validation: {
        passed: boolean;
        decided?: boolean;
        numericalTolerance: number;
        lowEndDifference: number;
        highEndDifference: number;
      };
      contributions: unknown[];
    };
    expect(output.unit).toBe('µg/L');
    // At the plan's 21 °C the two flasks (calibrated at 20 °C) have expanded by 1×10⁻⁵ K⁻¹ (borosilicate 3.3 cubic,
    // read) and the piston pipettes have not: c = 100/(1 + 1×10⁻⁵)² µg/L at 20 °C (EURACHEM/CITAC CG4 A1 model).
    expect(output.value).toBeCloseTo(100 / (1 + 1e-5) ** 2, 6);
    // The adaptive verdict run (JCGM 101:2008 7.9.4): whole batches of 10⁴ trials, at least 10 of them.
    expect(output.monteCarlo.seed).toBe(3);
    expect(output.monteCarlo.trials % 10_000).toBe(0);
    expect(output.monteCarlo.trials).toBeGreaterThanOrEqual(100_000);
    // The printed validation follows from the printed numbers (JCGM 101:2008 §8): d_low = |y − U − y_low|,
    // d_high = |y + U − y_high|, passed when both are within δ. JSON carries the same doubles, so 9 decimals.
    const { validation, monteCarlo } = output;
    expect(validation.lowEndDifference).toBeCloseTo(
      Math.abs(output.value - output.expandedUncertainty - monteCarlo.symmetricInterval.low),
      9,
    );
    expect(validation.highEndDifference).toBeCloseTo(
      Math.abs(output.value + output.expandedUncertainty - monteCarlo.symmetricInterval.high),
      9,
    );
    expect(validation.numericalTolerance).toBeGreaterThan(0);
    expect(validation.passed).toBe(
      validation.decided !== false &&
        validation.lowEndDifference <= validation.numericalTolerance &&
        validation.highEndDifference <= validation.numericalTolerance,
    );
    expect(output.contributions.length).toBeGreaterThan(5);
  });

  it('prints each warning as its code, step and figures, with its words', () => {
    const plan = JSON.parse(
      readFileSync(join(root, 'tests/fixtures/plans/lead-standard-from-nitrate.json'), 'utf8'),
    ) as {
      steps: { netMassG?: number }[];
    };
    plan.steps[0].netMassG = 0.05;
    const file = join(mkdtempSync(join(tmpdir(), 'dilutrace-cli-')), 'below-minimum.json');
    writeFileSync(file, JSON.stringify(plan));
    const result = run(file, '--no-monte-carlo');
    expect(result.status).toBe(0);
    const { warnings } = JSON.parse(result.stdout) as { warnings: Record<string, unknown>[] };
    // B-01: s = 0.05 mg ≥ 0.41·d, so m_min = 2000·s = 0.100 g (USP <41>).
    expect(warnings).toEqual([
      {
        code: 'belowMinimumWeight',
        stepIndex: 0,
        params: { balanceItemId: 'B-01', netMassG: 0.05, minimumWeightG: expect.closeTo(0.1, 12) },
        message:
          'Step 1: 0.05 g is below the minimum weight of Balance B-01 (0.100 g by USP <41>: 2·s/m ≤ 0.10 %, s ≥ 0.41·d).',
      },
    ]);
  });

  it('exits non-zero with a message on stderr for a missing file', () => {
    const result = run('no-such-plan.json');
    expect(result.status).toBe(2);
    expect(result.stderr).toMatch(/Cannot read/);
  });
});
