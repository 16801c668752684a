import { z } from 'zod';
import { planSchema } from './plan-schema';

/** The plan document's JSON Schema (draft 2020-12), generated from the zod schema as the author writes it (defaults optional). */
export function planJsonSchema(): Record<string, unknown> {
  return {
    ...z.toJSONSchema(planSchema, { io: 'input', target: 'draft-2020-12' }),
    $id: 'https://dilutrace.example/schemas/plan.schema.json',
    title: 'Dilutrace plan document',
    description:
      'A solution preparation: analyte, settings and steps with inline equipment data. See docs/plan-format.md.',
  };
}
