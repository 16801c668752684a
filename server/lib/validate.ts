import type { RequestHandler } from 'express';
import { type z } from 'zod';
import type { FieldIssue } from '../../shared/contracts/errors';
import { validationError } from './errors';

type Part = 'params' | 'query' | 'body';
type Schemas = Partial<Record<Part, z.ZodType>>;
type Parsed<S extends Schemas> = { [K in keyof S]: S[K] extends z.ZodType ? z.output<S[K]> : never };

declare module 'express-serve-static-core' {
  interface Request {
    /** The request parts after the route's schema parsed them; handlers read only these. */
    valid?: unknown;
  }
}

export function toFieldIssues(error: z.ZodError, prefix?: string): FieldIssue[] {
  return error.issues.map((issue) => ({
    path: [prefix, ...issue.path.map(String)].filter(Boolean).join('.') || prefix || 'body',
    message: issue.message,
  }));
}

/**
 * The 400 for refused fields: the first refusal in its own words as the message, every field with its path in
 * `details` (where the client marks it). A field path never reaches a chemist as words.
 */
export function fieldsRefused(issues: FieldIssue[]) {
  return validationError(issues[0].message, issues);
}

/** Parses `{params, query, body}` with the route's schemas; a failure becomes one 400 naming each field. */
export function validate<S extends Schemas>(schemas: S): RequestHandler {
  return (req, _res, next) => {
    const out: Record<string, unknown> = {};
    const issues: FieldIssue[] = [];
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part];
      if (!schema) continue;
      const result = schema.safeParse(req[part] ?? {});
      if (result.success) out[part] = result.data;
      else issues.push(...toFieldIssues(result.error, part === 'body' ? undefined : part));
    }
    if (issues.length > 0) throw fieldsRefused(issues);
    req.valid = out;
    next();
  };
}

/** Reads what `validate` stored, typed by the same schemas. */
export function valid<S extends Schemas>(req: { valid?: unknown }, _schemas: S): Parsed<S> {
  return req.valid as Parsed<S>;
}
