import { parse } from 'csv-parse/sync';
import type { EquipmentItem, EquipmentKind } from '../../shared/contracts/library';
import { restoreCell, toSafeCsv } from '../lib/csv-cells';
import { CSV_COLUMNS, type CsvColumn } from './csv-columns';

export interface CsvRow {
  line: number;
  data: Record<string, unknown>;
  errors: { column: string; message: string }[];
}

function setPath(target: Record<string, unknown>, path: (string | number)[], value: unknown) {
  let node: Record<string | number, unknown> = target;
  path.forEach((key, index) => {
    if (index === path.length - 1) {
      node[key] = value;
      return;
    }
    node[key] ??= typeof path[index + 1] === 'number' ? [] : {};
    node = node[key] as Record<string | number, unknown>;
  });
}

function getPath(source: unknown, path: (string | number)[]): unknown {
  return path.reduce<unknown>(
    (node, key) => (node == null ? undefined : (node as Record<string | number, unknown>)[key]),
    source,
  );
}

/** Reads one cell; the apostrophe our exports put before formula-like text is taken off first. */
function readCell(column: CsvColumn, raw: string): { value?: unknown; error?: string } {
  const cell = restoreCell(raw.trim());
  const optional = column.type.startsWith('optional');
  if (cell === '') {
    if (optional) return { value: undefined };
    return { error: 'This cell is empty.' };
  }
  switch (column.type) {
    case 'number':
    case 'optional-number': {
      const value = Number(cell.replace(',', '.'));
      return Number.isFinite(value) && /^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/.test(cell)
        ? { value }
        : { error: `“${cell}” is not a number.` };
    }
    case 'boolean':
      if (/^(yes|true|1|y)$/i.test(cell)) return { value: true };
      if (/^(no|false|0|n)$/i.test(cell)) return { value: false };
      return { error: `“${cell}” is not yes or no.` };
    default:
      return { value: cell };
  }
}

/**
 * Parses a CSV file of one kind into item data, one entry per record with its line number in the
 * file. Unknown or missing columns are reported against line 1.
 */
export function parseLibraryCsv(kind: EquipmentKind, csv: string): { headerErrors: string[]; rows: CsvRow[] } {
  const columns = CSV_COLUMNS[kind];
  let records: { record: Record<string, string>; info: { lines: number } }[];
  try {
    records = parse(csv, {
      columns: (header: string[]) => header.map((h) => h.trim().toLowerCase()),
      bom: true,
      skip_empty_lines: true,
      relax_column_count: false,
      info: true,
      trim: false,
    });
  } catch (error) {
    return { headerErrors: [`The file is not readable as CSV: ${(error as Error).message}`], rows: [] };
  }
  const header =
    records.length > 0
      ? Object.keys(records[0].record)
      : (csv.split(/\r?\n/)[0] ?? '').split(',').map((h) => h.trim().toLowerCase());
  const known = new Set(columns.map((c) => c.column));
  const headerErrors = [
    ...header.filter((h) => !known.has(h)).map((h) => `Unknown column “${h}” for ${kind}.`),
    ...columns
      .filter((c) => !c.type.startsWith('optional') && !header.includes(c.column) && !/_[23]$/.test(c.column))
      .map((c) => `Missing column “${c.column}” (${c.help}).`),
  ];
  const rows = records.map(({ record, info }) => {
    const data: Record<string, unknown> = {};
    const errors: CsvRow['errors'] = [];
    for (const column of columns) {
      const raw = record[column.column];
      if (raw === undefined) continue;
      const { value, error } = readCell(column, raw);
      if (error) errors.push({ column: column.column, message: error });
      else if (value !== undefined) setPath(data, column.path, value);
    }
    if (Array.isArray(data.points))
      data.points = (data.points as unknown[]).filter((p) => p !== undefined && p !== null);
    return { line: info.lines, data, errors };
  });
  return { headerErrors, rows };
}

/** Maps a schema issue path inside `data` back to its CSV column name. */
export function columnFor(kind: EquipmentKind, path: string): string {
  const dataPath = path.replace(/^data\.?/, '');
  const column =
    CSV_COLUMNS[kind].find((c) => c.path.join('.') === dataPath) ??
    CSV_COLUMNS[kind].find((c) => dataPath && c.path.join('.').startsWith(dataPath));
  return column?.column ?? (dataPath || '(row)');
}

/**
 * The library of one kind as CSV in the import column set, so an export can be edited and imported
 * again; formula-like text is neutralised (and the import takes the apostrophe off again).
 */
export function libraryToCsv(kind: EquipmentKind, items: EquipmentItem[]): string {
  const columns = CSV_COLUMNS[kind];
  const rows = items.map((item) =>
    columns.map((column) => {
      const value = getPath(item.current.data, column.path);
      if (value === null || value === undefined) return '';
      if (typeof value === 'boolean') return value ? 'yes' : 'no';
      return String(value);
    }),
  );
  return toSafeCsv([columns.map((c) => c.column), ...rows]);
}

/** The template file offered for download: the header row of the kind's column set. */
export function csvTemplate(kind: EquipmentKind): string {
  const columns = CSV_COLUMNS[kind];
  return toSafeCsv([columns.map((c) => c.column)]);
}
