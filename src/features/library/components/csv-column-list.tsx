import type { CsvColumn } from '../api/get-csv-columns';

/** The documented column set of one kind: name, whether it is required, and what goes in it. */
export function CsvColumnList({ columns }: { columns: CsvColumn[] }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
      {columns.map((column) => (
        <div key={column.column} className="contents">
          <dt>
            <code className="font-semibold">{column.column}</code>
          </dt>
          <dd className="text-muted">
            {column.help}
            {column.required ? <span className="font-semibold text-ink"> · required</span> : null}
          </dd>
        </div>
      ))}
    </dl>
  );
}
