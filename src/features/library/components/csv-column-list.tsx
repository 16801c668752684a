import type { CsvColumn } from '../api/get-csv-columns';

/** The documented column set of one kind: name, whether it is required, and what goes in it. */
export function CsvColumnList({ columns }: { columns: CsvColumn[] }) {
  return (
    <dl className="flex flex-col gap-2 text-sm">
      {columns.map((column) => (
        <div key={column.column}>
          <dt>
            <code className="font-semibold">{column.column}</code>
            {column.required ? <span className="ml-2 font-semibold text-ink">required</span> : null}
          </dt>
          <dd className="text-muted">{column.help}</dd>
        </div>
      ))}
    </dl>
  );
}
