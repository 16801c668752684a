import type { ReactNode } from 'react';
import type { PreparationDetail, VersionDetail } from '../../../../shared/contracts/preparations';
import { formatDateTime } from '../../../lib/format-date';
import { RecordStatusBadge } from './record-status-badge';

type RecordHeaderProps = { preparation: PreparationDetail; version: VersionDetail; actions?: ReactNode };

function When({ at }: { at: string }) {
  return <time dateTime={at}>{formatDateTime(at)}</time>;
}

/**
 * The page's h1 with the version, its status and who did what when. An approved version shows the
 * title and analyte it was signed under, whatever later versions were renamed to.
 */
export function RecordHeader({ preparation, version, actions }: RecordHeaderProps) {
  const title = version.approvedAs?.title ?? preparation.title;
  const analyte = version.approvedAs?.analyte ?? preparation.analyte;
  // The last submission, or the analyst's withdrawal of it.
  const submitted = version.reviews.findLast(
    (review) => review.action === 'submitted' || review.action === 'withdrawn',
  );
  const approved = version.reviews.find((review) => review.action === 'approved');
  const facts: [string, ReactNode][] = [
    ['Analyst', preparation.createdBy],
    ['Analyte', analyte || '—'],
    ...(version.approvedAs ? ([['Laboratory', version.approvedAs.labName]] as [string, ReactNode][]) : []),
    ['Version started', <When key="started" at={version.createdAt} />],
    ['Last computed', version.snapshot ? <When key="computed" at={version.snapshot.computedAt} /> : 'Not computed'],
    ...(submitted
      ? ([
          [
            submitted.action === 'withdrawn' ? 'Withdrawn from review' : 'Submitted',
            <When key="submitted" at={submitted.at} />,
          ],
        ] as [string, ReactNode][])
      : []),
    ...(approved
      ? ([
          [
            'Approved',
            <span key="approved">
              {approved.actor}, <When at={approved.at} />
            </span>,
          ],
        ] as [string, ReactNode][])
      : []),
  ];
  return (
    <header className="mb-6 border-b border-line pb-4">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="text-sm font-semibold tracking-wide text-muted uppercase">Preparation record</p>
          <h1 className="text-3xl font-bold tracking-tight">{title}</h1>
          <p className="mt-2 flex flex-wrap items-center gap-3">
            <span className="text-lg font-semibold">Version {version.number}</span>
            <span data-testid="record-status">
              <RecordStatusBadge status={version.status} />
            </span>
          </p>
        </div>
        {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
      </div>
      <dl className="mt-4 grid grid-cols-2 gap-x-6 gap-y-2 sm:grid-cols-3 lg:grid-cols-6">
        {facts.map(([term, value]) => (
          <div key={term}>
            <dt className="text-xs font-semibold tracking-wide text-muted uppercase">{term}</dt>
            <dd>{value}</dd>
          </div>
        ))}
      </dl>
    </header>
  );
}
