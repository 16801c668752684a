import { formatUtc } from '../utils/format-utc';

const localFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'medium' });

/** The time in UTC (as the audit trail states it), with the reader's local time on hover. */
export function AuditTime({ at }: { at: string }) {
  const date = new Date(at);
  const local = Number.isNaN(date.getTime()) ? undefined : `Local time: ${localFormat.format(date)}`;
  return (
    <time dateTime={at} title={local} className="whitespace-nowrap">
      {formatUtc(at)}
    </time>
  );
}
