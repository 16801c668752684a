/**
 * Batch CLI: the full uncertainty budget of one plan document as JSON on stdout, with the Monte Carlo
 * validation a stored version gets for the same seed (checkGumByMonteCarlo: the adaptive run and its verdict).
 *
 *   npm run budget -- <plan.json> [--seed S] [--no-monte-carlo]
 *   npm run budget -- --schema        (prints the plan JSON Schema, as committed in docs/plan.schema.json)
 *
 * Exit codes: 0 success; 1 invalid plan (message and field path on stderr); 2 usage or unreadable file.
 * Non-finite numbers (ν_eff = ∞) are written as null.
 */
import { readFileSync } from 'node:fs';
import { nonFiniteNumberReplacer } from '../../shared/contracts/json-number';
import { warningText } from '../../shared/contracts/warning-text';
import {
  checkGumByMonteCarlo,
  evaluatePlan,
  parsePlan,
  PlanError,
  planJsonSchema,
  resultStatement,
} from '../../shared/uncertainty/index';

const usage = 'usage: npm run budget -- <plan.json> [--seed S] [--no-monte-carlo]   |   npm run budget -- --schema';

function fail(code: number, message: string): never {
  process.stderr.write(`${message}\n`);
  process.exit(code);
}

function parseArguments(argv: string[]): { file?: string; monteCarlo: boolean; seed: number; schema: boolean } {
  const options = { file: undefined as string | undefined, monteCarlo: true, seed: 1, schema: false };
  for (let index = 0; index < argv.length; index += 1) {
    const argument = argv[index];
    const numberAfter = (name: string) => {
      const value = Number(argv[index + 1]);
      index += 1;
      if (!Number.isInteger(value) || value < 0) fail(2, `${name} needs a whole number.\n${usage}`);
      return value;
    };
    if (argument === '--no-monte-carlo') options.monteCarlo = false;
    else if (argument === '--seed') options.seed = numberAfter('--seed');
    else if (argument === '--schema') options.schema = true;
    else if (argument.startsWith('--')) fail(2, `Unknown option ${argument}.\n${usage}`);
    else if (options.file === undefined) options.file = argument;
    else fail(2, `Only one plan file at a time.\n${usage}`);
  }
  return options;
}

const options = parseArguments(process.argv.slice(2));
if (options.schema) {
  process.stdout.write(`${JSON.stringify(planJsonSchema(), null, 2)}\n`);
  process.exit(0);
}
if (options.file === undefined) fail(2, usage);

let document: unknown;
try {
  document = JSON.parse(readFileSync(options.file, 'utf8'));
} catch (error) {
  fail(2, `Cannot read ${options.file}: ${(error as Error).message}`);
}

try {
  const plan = parsePlan(document);
  const budget = evaluatePlan(plan);
  const check = options.monteCarlo ? checkGumByMonteCarlo(plan, budget, { seed: options.seed }) : undefined;
  const monteCarlo = check?.monteCarlo ?? null;
  const validation = check?.validation ?? null;
  const statement = resultStatement({ plan, budget, monteCarlo, validation });
  const output = {
    engineVersion: budget.engineVersion,
    title: plan.title,
    measurand: budget.measurand,
    value: budget.value,
    unit: budget.unit,
    standardUncertainty: budget.standardUncertainty,
    relativeStandardUncertainty: budget.relativeStandardUncertainty,
    effectiveDegreesOfFreedom: budget.effectiveDegreesOfFreedom,
    coverageProbability: budget.coverageProbability,
    coverageFactor: budget.coverageFactor,
    expandedUncertainty: budget.expandedUncertainty,
    relativeExpandedUncertainty: budget.relativeExpandedUncertainty,
    rounded: budget.rounded,
    statement: statement.text,
    statementReason: statement.reason,
    contributions: budget.rows,
    byStep: budget.byStep,
    byCategory: budget.byCategory,
    checkpoints: budget.checkpoints,
    monteCarlo,
    validation,
    warnings: budget.warnings.map((warning) => ({ ...warning, message: warningText(warning) })),
  };
  process.stdout.write(`${JSON.stringify(output, nonFiniteNumberReplacer, 2)}\n`);
} catch (error) {
  if (error instanceof PlanError) fail(1, `Invalid plan at ${error.path.join('.') || '(top level)'}: ${error.message}`);
  throw error;
}
