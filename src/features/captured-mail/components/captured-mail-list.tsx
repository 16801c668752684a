import { Link } from 'react-router';
import type { CapturedMessage } from '../../../../shared/contracts/operator';
import { paths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format-date';

/** The captured messages, newest first; the open one is marked as the current item. */
export function CapturedMailList({
  messages,
  openMessageId,
}: {
  messages: CapturedMessage[];
  openMessageId: number | null;
}) {
  if (messages.length === 0) return <p className="text-muted">No mail has been captured yet.</p>;
  return (
    <ul
      aria-label="Captured mail"
      className="self-start divide-y divide-line overflow-hidden rounded-lg border border-line bg-surface"
    >
      {messages.map((message) => {
        const open = message.id === openMessageId;
        return (
          <li key={message.id}>
            <Link
              to={paths.app.capturedMail.href(message.id)}
              aria-current={open ? 'true' : undefined}
              className={`block px-4 py-3 no-underline hover:bg-paper ${open ? 'border-l-4 border-accent bg-accent-tint' : 'border-l-4 border-transparent'}`}
            >
              <span className="block font-semibold text-ink">{message.subject}</span>
              <span className="block text-sm break-all text-muted">To {message.to}</span>
              <time dateTime={message.createdAt} className="block text-sm text-muted">
                {formatDateTime(message.createdAt)}
              </time>
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
