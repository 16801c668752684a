import { pipeline } from 'node:stream/promises';
import { stringify as stringifyStream } from 'csv-stringify';
import { stringify } from 'csv-stringify/sync';

/** A cell a spreadsheet would evaluate: OWASP's CSV-injection list (= + - @, tab, carriage return first). */
const FORMULA_START = /^[=+\-@\t\r]/;
/** A plain number such as -0.5 or +1e-3 is read as a number, never as a formula, so it is left as it is. */
const PLAIN_NUMBER = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/;

/**
 * One cell made safe to open in a spreadsheet: text that starts like a formula gets a leading
 * apostrophe (OWASP's guidance), so it shows as text and is never run.
 * @example neutraliseCell('=HYPERLINK("http://x")') // → "'=HYPERLINK(\"http://x\")"
 * @example neutraliseCell(-0.5) // → '-0.5'
 */
export function neutraliseCell(value: unknown): string {
  const text = value === null || value === undefined ? '' : String(value);
  return FORMULA_START.test(text) && !PLAIN_NUMBER.test(text) ? `'${text}` : text;
}

/** Takes off the apostrophe neutraliseCell added, so an exported file imports back to the same values. */
export function restoreCell(cell: string): string {
  return cell.startsWith("'") && FORMULA_START.test(cell.slice(1)) ? cell.slice(1) : cell;
}

/** Every CSV the app writes goes through here: each cell neutralised, then quoted as CSV needs. */
export function toSafeCsv(rows: unknown[][]): string {
  return stringify(rows.map((row) => row.map(neutraliseCell)));
}

/**
 * The streaming form of toSafeCsv: rows are neutralised one by one and csv-stringify's stream is
 * piped straight into `out` (an HTTP response), so memory stays flat however many rows there are.
 * Resolves when the last byte is written; rejects (and destroys `out`) if reading or writing fails.
 */
export async function writeSafeCsv(rows: AsyncIterable<unknown[]>, out: NodeJS.WritableStream): Promise<void> {
  await pipeline(
    async function* neutralised() {
      for await (const row of rows) yield row.map(neutraliseCell);
    },
    stringifyStream(),
    out,
  );
}
