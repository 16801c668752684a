import { equipmentDataSchemas, type EquipmentKind, type ImportResult } from '../../shared/contracts/library';
import type { SessionUser } from '../auth/authorize';
import { AppError } from '../lib/errors';
import { columnFor, parseLibraryCsv } from './csv-io';
import type { LibraryRepository } from './library-repository';
import type { LibraryService } from './library-service';
import { canonicalJson } from '../lib/canonical-json';
import type { Transact } from '../db/transaction';

/**
 * CSV import: every row is checked first and reported with its line number; only a file with no
 * errors is written, in one transaction. An existing ID gets a new revision, a new ID a new item.
 */
export function importService(deps: { transact: Transact; library: LibraryRepository; items: LibraryService }) {
  const { transact, library, items } = deps;

  return {
    async run(
      labId: number,
      actor: SessionUser,
      input: { kind: EquipmentKind; csv: string; dryRun: boolean },
    ): Promise<ImportResult> {
      const { kind } = input;
      const { headerErrors, rows } = parseLibraryCsv(kind, input.csv);
      const result: ImportResult = { kind, dryRun: input.dryRun, written: false, rows: [], errorCount: 0 };
      if (headerErrors.length > 0) {
        result.rows.push({
          line: 1,
          code: '',
          action: 'error',
          errors: headerErrors.map((message) => ({ column: '(header)', message })),
        });
      }
      if (rows.length === 0 && headerErrors.length === 0) {
        result.rows.push({
          line: 1,
          code: '',
          action: 'error',
          errors: [{ column: '(file)', message: 'The file has a header but no rows.' }],
        });
      }
      const seen = new Map<string, number>();
      const plan: { line: number; action: 'create' | 'revise'; itemId?: number; data: unknown }[] = [];
      for (const row of rows) {
        const code = String(row.data.code ?? '');
        const errors = [...row.errors];
        const parsed = equipmentDataSchemas[kind].safeParse(row.data);
        if (!parsed.success) {
          for (const issue of parsed.error.issues) {
            const column = columnFor(kind, issue.path.join('.'));
            // A cell that could not be read is already reported; the schema's "missing" adds nothing.
            if (!errors.some((e) => e.column === column)) errors.push({ column, message: issue.message });
          }
        }
        const previous = seen.get(code.toLowerCase());
        if (code && previous !== undefined)
          errors.push({ column: 'code', message: `The ID ${code} is also on line ${previous}.` });
        if (code) seen.set(code.toLowerCase(), row.line);
        let action: 'create' | 'revise' | 'unchanged' | 'error' = 'create';
        let itemId: number | undefined;
        if (errors.length === 0 && parsed.success) {
          const existing = await library.itemByCode(labId, code);
          if (existing && existing.kind !== kind)
            errors.push({ column: 'code', message: `The ID ${code} belongs to a ${existing.kind} in this lab.` });
          else if (existing && existing.status === 'retired')
            errors.push({ column: 'code', message: `${code} is retired and cannot be changed.` });
          else if (existing) {
            itemId = existing.id;
            const current = await library.revision(existing.current_revision_id);
            action =
              current && canonicalJson(storedWithDefaults(kind, current.data_json)) === canonicalJson(parsed.data)
                ? 'unchanged'
                : 'revise';
          }
        }
        if (errors.length > 0) action = 'error';
        result.rows.push({ line: row.line, code, action, errors });
        if (action === 'create' || action === 'revise')
          plan.push({ line: row.line, action, itemId, data: parsed.data });
      }
      result.errorCount = result.rows.reduce((n, r) => n + r.errors.length, 0);
      if (input.dryRun) return result;
      if (result.errorCount > 0) {
        throw new AppError(
          'validation',
          'import_rejected',
          `Nothing was imported: the file has ${result.errorCount} error(s). Correct them and try again.`,
          {
            result,
          },
        );
      }
      await transact(async (trx) => {
        for (const step of plan) {
          const reason = `CSV import, line ${step.line}`;
          if (step.action === 'create') await items.create(labId, actor, { kind, data: step.data, reason }, trx);
          else await items.revise(labId, actor, step.itemId as number, { data: step.data, reason }, trx);
        }
      });
      return { ...result, written: true };
    },
  };
}

/** A stored revision read with today's defaults, so a field added since (null by default) is no change. */
function storedWithDefaults(kind: EquipmentKind, dataJson: string): unknown {
  const stored: unknown = JSON.parse(dataJson);
  const read = equipmentDataSchemas[kind].safeParse(stored);
  return read.success ? read.data : stored;
}
