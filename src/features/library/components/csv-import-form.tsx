import { useRef, useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router';
import type { EquipmentKind, ImportResult } from '../../../../shared/contracts/library';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/select';
import { paths } from '../../../config/paths';
import { isApiError } from '../../../lib/api-error';
import { useImportEquipmentCsv } from '../api/import-equipment-csv';
import { KIND_TABS } from '../utils/equipment-kinds';
import { ImportResultTable } from './import-result-table';

const KIND_OPTIONS = KIND_TABS.map((tab) => ({ value: tab.kind, label: tab.label }));
/** The server's limit on an import file. */
const MAX_CSV_CHARACTERS = 2_000_000;

type Checked = { fileName: string; csv: string; result: ImportResult };

/**
 * Two steps: a dry run lists every line with what it would do and its problems; only a file
 * with no error can then be imported, all rows in one go.
 */
export function CsvImportForm({ labId, kind }: { labId: number; kind: EquipmentKind }) {
  const navigate = useNavigate();
  const importCsv = useImportEquipmentCsv();
  const fileRef = useRef<HTMLInputElement>(null);
  const [checked, setChecked] = useState<Checked | null>(null);
  const [imported, setImported] = useState<ImportResult | null>(null);
  const [problem, setProblem] = useState<string | null>(null);

  const check = async (event: FormEvent) => {
    event.preventDefault();
    setProblem(null);
    setImported(null);
    setChecked(null);
    const file = fileRef.current?.files?.[0];
    if (!file) return setProblem('Choose a CSV file first.');
    const csv = await file.text();
    if (csv.trim() === '') return setProblem('The file is empty.');
    if (csv.length > MAX_CSV_CHARACTERS) return setProblem('The file is larger than 2 MB.');
    importCsv.mutate(
      { labId, kind, csv, dryRun: true },
      {
        onSuccess: (result) => setChecked({ fileName: file.name, csv, result }),
        onError: (error) => setProblem(messageOf(error)),
      },
    );
  };

  const runImport = () => {
    if (!checked) return;
    setProblem(null);
    importCsv.mutate(
      { labId, kind, csv: checked.csv, dryRun: false },
      {
        onSuccess: (result) => {
          setImported(result);
          setChecked(null);
        },
        // Refused whole (e.g. another ID was taken since the check): say so and check the file again.
        onError: (error) => {
          setProblem(messageOf(error));
          importCsv.mutate(
            { labId, kind, csv: checked.csv, dryRun: true },
            { onSuccess: (result) => setChecked({ ...checked, result }) },
          );
        },
      },
    );
  };

  const toWrite = checked
    ? checked.result.rows.filter((row) => row.action === 'create' || row.action === 'revise').length
    : 0;
  return (
    <div className="flex flex-col gap-6">
      <form onSubmit={check} className="flex flex-wrap items-end gap-4" aria-label="Check a CSV file">
        <Select
          label="Kind of item"
          options={KIND_OPTIONS}
          value={kind}
          onChange={(event) =>
            navigate(
              paths.app.libraryImport.href(KIND_OPTIONS.find((option) => option.value === event.target.value)?.value),
            )
          }
        />
        <div className="flex flex-col gap-1">
          <label htmlFor="csv-file" className="font-semibold">
            CSV file
          </label>
          <input
            id="csv-file"
            ref={fileRef}
            type="file"
            accept=".csv,text/csv"
            className="text-sm file:mr-3 file:rounded-md file:border file:border-line-strong file:bg-surface file:px-3 file:py-1.5 file:font-semibold file:text-ink hover:file:bg-paper"
            onChange={() => setChecked(null)}
          />
        </div>
        <Button type="submit" pending={importCsv.isPending && !checked} pendingLabel="Checking…">
          Check the file
        </Button>
      </form>
      {problem ? <Alert tone="danger">{problem}</Alert> : null}
      {imported ? (
        <Alert tone="ok" title="Imported">
          {imported.rows.filter((row) => row.action === 'create').length} new items and{' '}
          {imported.rows.filter((row) => row.action === 'revise').length} new revisions were saved;{' '}
          {imported.rows.filter((row) => row.action === 'unchanged').length} rows were unchanged.
        </Alert>
      ) : null}
      {checked ? (
        <section aria-labelledby="dry-run-heading" className="flex flex-col gap-3">
          <h2 id="dry-run-heading" className="text-xl font-bold">
            Check of {checked.fileName}
          </h2>
          {checked.result.errorCount > 0 ? (
            <Alert
              tone="danger"
              title={`${checked.result.errorCount} ${checked.result.errorCount === 1 ? 'row has' : 'rows have'} problems`}
            >
              Nothing can be imported until every row is correct. Fix the lines listed below in your file and check it
              again.
            </Alert>
          ) : (
            <Alert tone="info">No problems found. Nothing has been saved yet.</Alert>
          )}
          <ImportResultTable rows={checked.result.rows} />
          <Button
            onClick={runImport}
            disabled={checked.result.errorCount > 0 || toWrite === 0}
            pending={importCsv.isPending}
            pendingLabel="Importing…"
            className="self-start"
          >
            Import {toWrite} {toWrite === 1 ? 'row' : 'rows'}
          </Button>
        </section>
      ) : null}
    </div>
  );
}

const messageOf = (error: unknown) => (isApiError(error) ? error.message : 'The file could not be checked. Try again.');
