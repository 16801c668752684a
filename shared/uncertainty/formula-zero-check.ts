/**
 * A digit 0 typed for the letter O ("K2Cr207" for K2Cr2O7) makes a formula that still reads, with a count
 * that multiplies the molar mass (Cr × 207: 2.8 times the true concentration of a dichromate standard).
 * The rules (common practice of formula entry; no published source):
 * 1. A count never is 0 and never starts with 0: "CaO" typed "Ca0", "KMnO4" typed "KMn04" are refused.
 * 2. A count above 99 with a 0 inside it is refused when reading that 0 as O leaves counts of 2 to 99 on
 *    both sides of it and no count above 99 anywhere: "K2Cr207", "Na2S203", "Fe203", "H202". A count of 1 is
 *    never written, so C100H202… is read as a count (hectane keeps its C100 and is not refused).
 * 3. A part made of one element other than carbon whose count ends in 0 is refused: "H20", "10H20" in a
 *    hydrate. Fullerenes (C60, C70) stay readable; so do C18H38, Na2B4O7·10H2O and every count below 100
 *    inside a formula of several elements.
 * Each finding comes with the formula read with that 0 as O, so the message can ask "did you mean …?".
 */

/** What is wrong with a count, and the text with the zero read as the letter O. */
export interface MistypedZero {
  problem: string;
  /** Left out where an O makes no sense either (a 0 after a bracket). */
  corrected?: string;
}

const HYDRATE_SEPARATOR = /[·•.*]/;
const LARGEST_PLAUSIBLE_COUNT = 99;

/**
 * The first count in `text` (whitespace already removed) that is a 0 typed for an O, by the rules above.
 * @example findMistypedZero('K2Cr207')?.corrected // 'K2Cr2O7'
 */
export function findMistypedZero(text: string): MistypedZero | undefined {
  for (const run of text.matchAll(/\d+/g)) {
    const start = run.index;
    const digits = run[0];
    const before = text.slice(0, start);
    const owner = /([A-Z][a-z]?|[)\]])$/.exec(before)?.[1];
    if (owner === undefined) continue; // a hydrate's leading count: "10H2O"
    const what = owner === ')' || owner === ']' ? 'the bracketed group' : owner;
    if (digits.startsWith('0')) {
      return {
        problem:
          digits === '0'
            ? `has a count of 0 after ${what}`
            : `has the count "${digits}" after ${what}, and a count never starts with 0`,
        ...(owner === ')' || owner === ']' ? {} : { corrected: replaceAt(text, start, 'O') }),
      };
    }
    const inner = innerZero(digits);
    if (inner !== undefined && Number(digits) > LARGEST_PLAUSIBLE_COUNT) {
      const corrected = replaceAt(text, start + inner, 'O');
      if (largestCount(corrected) <= LARGEST_PLAUSIBLE_COUNT)
        return { problem: `reads as ${digits} atoms of ${what}`, corrected };
    }
  }
  return singleElementWithTrailingZero(text);
}

/** Position of a 0 with a count of 2 or more before it and a count of 2 or more (not starting with 0) after it. */
function innerZero(digits: string): number | undefined {
  for (let position = 1; position < digits.length - 1; position += 1) {
    if (digits[position] !== '0') continue;
    const left = digits.slice(0, position);
    const right = digits.slice(position + 1);
    if (left !== '1' && right !== '1' && !right.startsWith('0')) return position;
  }
  return undefined;
}

function largestCount(text: string): number {
  return Math.max(0, ...[...text.matchAll(/\d+/g)].map((run) => Number(run[0])));
}

function singleElementWithTrailingZero(text: string): MistypedZero | undefined {
  let offset = 0;
  for (const part of text.split(HYDRATE_SEPARATOR)) {
    const match = /^(\d*)([A-Z][a-z]?)(\d*0)$/.exec(part);
    if (match && match[2] !== 'C') {
      const zeroAt = offset + part.length - 1;
      return {
        problem: `reads as ${match[3]} atoms of ${match[2]} and nothing else`,
        corrected: replaceAt(text, zeroAt, 'O'),
      };
    }
    offset += part.length + 1;
  }
  return undefined;
}

function replaceAt(text: string, position: number, character: string): string {
  return `${text.slice(0, position)}${character}${text.slice(position + 1)}`;
}
