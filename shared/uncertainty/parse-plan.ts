import type { z } from 'zod';
import { PlanError, type PlanPathSegment } from './plan-error';
import { planSchema, type Plan } from './plan-schema';

/**
 * Validates a plan document and fills in defaults.
 * @throws PlanError pointing at the first offending field, with a message a chemist reads
 */
export function parsePlan(input: unknown): Plan {
  return parseWithSchema(planSchema, input);
}

/**
 * Validates any engine input against its zod schema.
 * @throws PlanError pointing at the first offending field
 */
export function parseWithSchema<Schema extends z.ZodType>(schema: Schema, input: unknown): z.output<Schema> {
  const parsed = schema.safeParse(input);
  if (parsed.success) return parsed.data;
  const issue = deepestIssue(parsed.error.issues);
  const path = issue.path.filter((segment): segment is PlanPathSegment => typeof segment !== 'symbol');
  throw new PlanError(path, describeIssue(issue, path));
}

type Issue = z.core.$ZodIssue;

/** Inside a union, the alternative with the fewest complaints (then the deepest) is the one the author meant. */
function deepestIssue(issues: readonly Issue[], prefix: PropertyKey[] = []): Issue & { path: PropertyKey[] } {
  let best: (Issue & { path: PropertyKey[] }) | undefined;
  for (const issue of issues) {
    let candidate: Issue & { path: PropertyKey[] } = { ...issue, path: [...prefix, ...issue.path] };
    if (issue.code === 'invalid_union' && issue.errors.length > 0) {
      const [closest] = [...issue.errors].sort((left, right) => left.length - right.length);
      const nested = deepestIssue(closest, candidate.path);
      if (nested.path.length > candidate.path.length) candidate = nested;
    }
    if (best === undefined || candidate.path.length > best.path.length) best = candidate;
  }
  return best ?? { code: 'custom', message: 'The plan is not valid.', path: [...prefix], input: undefined };
}

/** ['steps', 1, 'pipette', 'nominalMl'] → 'Step 2 › pipette › nominalMl'. */
function describePath(path: PlanPathSegment[]): string {
  if (path.length === 0) return 'The plan';
  const parts: string[] = [];
  for (let index = 0; index < path.length; index += 1) {
    const segment = path[index];
    const next = path[index + 1];
    if (segment === 'steps' && typeof next === 'number') {
      parts.push(`Step ${next + 1}`);
      index += 1;
    } else parts.push(typeof segment === 'number' ? `item ${segment + 1}` : segment);
  }
  return parts.join(' › ');
}

function describeIssue(issue: Issue, path: PlanPathSegment[]): string {
  const where = describePath(path);
  const last = path[path.length - 1];
  if ((last === 'kind' || last === 'shape') && (issue.code === 'invalid_union' || issue.code === 'invalid_value')) {
    return `${where}: this ${last} is not known to the plan format${last === 'shape' ? ' (normal, rectangular, triangular, arcsine, studentT)' : ''}.`;
  }
  if (issue.code === 'invalid_union' && issue.message !== 'Invalid input') return `${where}: ${issue.message}`;
  if (issue.code === 'invalid_type' && issue.input === undefined) return `${where} is missing.`;
  // A cap on the plan's own lists ("A plan can have at most 20 steps; …") names what it counts.
  if (issue.code === 'too_big' && path.length <= 1) return issue.message;
  // A cap on a step's list says what it counts itself; the step is enough, not the field's name.
  if (issue.code === 'too_big' && issue.origin === 'array')
    return `${describePath(path.slice(0, -1))}: ${issue.message}`;
  if (issue.code === 'unrecognized_keys')
    return `${where} has fields the plan format does not know: ${issue.keys.join(', ')}.`;
  if (issue.code === 'invalid_union')
    return `${where} is not one of the accepted forms; check its "kind" or "shape" and fields.`;
  return `${where}: ${issue.message}`;
}
