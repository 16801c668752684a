/**
 * The demo plans' figures as the server would store them: for each tests/fixtures/plans/*.json, under the default
 * lab policy, computed by computeSnapshot (GUM, Monte Carlo with the seed, their JCGM 101 §8 validation), the
 * value, U, k, the result as stated and the verdict. Used for before/after tables when the engine changes.
 *
 *   npm run demo-figures -- [--seed S]
 */
import { readdirSync, readFileSync } from 'node:fs';
import { DEFAULT_LAB_POLICY } from '../../shared/contracts/library';
import { VALIDATION_HEADLINES, validationOutcome } from '../../shared/contracts/validation-words';
import { formatDegreesOfFreedom, resultStatement } from '../../shared/uncertainty';
import { computeSnapshot } from '../preparations/compute-snapshot';

const seedAt = process.argv.indexOf('--seed');
const seed = seedAt >= 0 ? Number(process.argv[seedAt + 1]) : 1;
if (!Number.isInteger(seed) || seed < 0) {
  process.stderr.write('usage: npm run demo-figures -- [--seed S]\n');
  process.exit(2);
}

const folder = new URL('../../tests/fixtures/plans/', import.meta.url);
const files = readdirSync(folder)
  .filter((name) => name.endsWith('.json'))
  .sort();
const figure = (value: number) => Number(value.toPrecision(6)).toString();

process.stdout.write(`Demo plans, default lab policy, seed ${seed}\n`);
for (const file of files) {
  const plan = JSON.parse(readFileSync(new URL(file, folder), 'utf8')) as Record<string, unknown>;
  const snapshot = computeSnapshot({ plan, items: [], seed, computedAt: '', policy: DEFAULT_LAB_POLICY });
  const { budget, validation } = snapshot;
  const statement = resultStatement(snapshot);
  process.stdout.write(
    [
      `\n${file}`,
      `  value     ${figure(budget.value)} ${budget.unit}`,
      `  U         ${figure(budget.expandedUncertainty)} ${budget.unit} (k = ${budget.coverageFactor.toFixed(2)}, ν_eff = ${formatDegreesOfFreedom(budget.effectiveDegreesOfFreedom)})`,
      `  stated    ${statement.text}`,
      `  verdict   ${VALIDATION_HEADLINES[validationOutcome(validation)]} after ${snapshot.trials} trials (ends differ by ${figure(validation.lowEndDifference)} and ${figure(validation.highEndDifference)}, δ = ${figure(validation.numericalTolerance)} ${budget.unit})`,
      '',
    ].join('\n'),
  );
}
