import { Link } from 'react-router';

type AuditPagerProps = {
  offset: number;
  pageSize: number;
  shown: number;
  total: number;
  hrefAt: (offset: number) => string;
};

/** "Events 51–100 of 230" with links to the newer and older pages. */
export function AuditPager({ offset, pageSize, shown, total, hrefAt }: AuditPagerProps) {
  const first = total === 0 ? 0 : offset + 1;
  const last = offset + shown;
  return (
    <nav aria-label="Audit trail pages" className="mt-3 flex flex-wrap items-center gap-4">
      <p className="text-sm text-muted" aria-live="polite">
        {total === 0 ? 'No events' : `Events ${first}–${last} of ${total}`}, newest first.
      </p>
      <div className="ml-auto flex gap-3">
        {offset > 0 ? <Link to={hrefAt(Math.max(0, offset - pageSize))}>← Newer</Link> : null}
        {last < total ? <Link to={hrefAt(offset + pageSize)}>Older →</Link> : null}
      </div>
    </nav>
  );
}
