import { z } from 'zod';

/**
 * JSON has no infinity and no NaN: `JSON.stringify` silently writes them as `null`. Numbers in stored
 * results are therefore written as JSON numbers when finite and as one of these strings when not, and
 * read back as the number they name.
 */
const NON_FINITE_NUMBER_TEXTS = ['Infinity', '-Infinity', 'NaN'] as const;
type NonFiniteNumberText = (typeof NON_FINITE_NUMBER_TEXTS)[number];

/** 8.7 → 8.7, ∞ → "Infinity", −∞ → "-Infinity", NaN → "NaN". */
function encodeNumber(value: number): number | NonFiniteNumberText {
  return Number.isFinite(value) ? value : (String(value) as NonFiniteNumberText);
}

/** A replacer for `JSON.stringify` that writes every non-finite number as encodeNumber does. */
export function nonFiniteNumberReplacer(_key: string, value: unknown): unknown {
  return typeof value === 'number' ? encodeNumber(value) : value;
}

/** Any number, Infinity and NaN included (`z.number()` refuses them). */
const anyNumber = z.custom<number>((value) => typeof value === 'number', 'Expected a number.');
const nonFiniteText = z.enum(NON_FINITE_NUMBER_TEXTS);

/**
 * A number of a stored result: a JSON number, or "Infinity", "-Infinity" or "NaN". Snapshots stored before
 * this encoding wrote every non-finite number as `null`; which one it was is lost, so it reads as NaN.
 */
export const storedNumberSchema = z.codec(z.union([z.number(), nonFiniteText, z.null()]), anyNumber, {
  decode: (value) => (value === null ? Number.NaN : Number(value)),
  encode: encodeNumber,
});

/**
 * Degrees of freedom ν, or ∞, written "Infinity". Older snapshots wrote ∞ as `null`: a Type B
 * source and a budget of Type B sources only have infinitely many degrees of freedom, so `null` reads as ∞.
 */
export const degreesOfFreedomSchema = z.codec(z.union([z.number(), z.literal('Infinity'), z.null()]), anyNumber, {
  decode: (value) => (value === null ? Infinity : Number(value)),
  encode: (value) => (value === Infinity ? 'Infinity' : value),
});
