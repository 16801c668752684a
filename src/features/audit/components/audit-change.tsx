/** A before or after value of an audit event as indented JSON, or a dash when the event has none. */
export function AuditChange({ label, value }: { label: string; value: unknown }) {
  return (
    <div className="min-w-0 flex-1">
      <p className="mb-1 text-sm font-semibold text-muted">{label}</p>
      {value === null || value === undefined ? (
        <p className="text-muted">—</p>
      ) : (
        <pre className="max-h-80 overflow-auto rounded-md border border-line bg-paper p-3 font-mono text-sm whitespace-pre-wrap break-words">
          {JSON.stringify(value, null, 2)}
        </pre>
      )}
    </div>
  );
}
