import type { ReactNode } from 'react';

/** What a chosen template filled in, and, for a value recalled rather than read from the table, a warning. */
export function TemplateNote({
  standard,
  provenance,
  children,
}: {
  standard: string;
  provenance: 'read' | 'memory';
  children: ReactNode;
}) {
  return (
    <div role="status" className="mt-2 rounded-md border-l-4 border-line-strong bg-paper px-3 py-2 text-sm">
      <p>{children}</p>
      {provenance === 'memory' ? (
        <p className="font-semibold text-caution">Value recalled, check against your copy of {standard}.</p>
      ) : (
        <p className="text-muted">Value read from the {standard} table.</p>
      )}
    </div>
  );
}
