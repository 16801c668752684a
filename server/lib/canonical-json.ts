import { createHash } from 'node:crypto';

/** JSON with object keys sorted at every depth, so the same content always gives the same bytes. */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v)
      ? Object.fromEntries(
          Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)),
        )
      : v,
  );
}

export const sha256Hex = (text: string): string => createHash('sha256').update(text, 'utf8').digest('hex');
