import type { DeliveryLogEntry } from '../../../../shared/contracts/members';
import { formatDateTime } from '../../../lib/format-date';

/** Mail sent about the lab: to whom, what and when. Bodies and their links stay with the recipients. */
export function DeliveryLogTable({ labName, entries }: { labName: string; entries: DeliveryLogEntry[] }) {
  if (entries.length === 0) return <p className="text-muted">No mail has been sent about this lab yet.</p>;
  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-surface">
      <table className="w-full text-left">
        <caption className="sr-only">Mail sent about {labName}</caption>
        <thead className="border-b border-line bg-paper text-sm text-muted">
          <tr>
            <th scope="col" className="px-4 py-3 font-semibold">
              Sent
            </th>
            <th scope="col" className="px-4 py-3 font-semibold">
              To
            </th>
            <th scope="col" className="px-4 py-3 font-semibold">
              Subject
            </th>
          </tr>
        </thead>
        <tbody>
          {entries.map((entry) => (
            <tr key={entry.id} className="border-b border-line last:border-b-0 align-top">
              <td className="px-4 py-3 whitespace-nowrap">
                <time dateTime={entry.createdAt}>{formatDateTime(entry.createdAt)}</time>
              </td>
              <td className="px-4 py-3 break-all">{entry.to}</td>
              <td className="px-4 py-3">{entry.subject}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
