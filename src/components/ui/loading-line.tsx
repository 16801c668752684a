/** A quiet loading line for Suspense fallbacks and pending route loads. */
export function LoadingLine({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" className="py-8 text-muted">
      {label}
    </p>
  );
}
