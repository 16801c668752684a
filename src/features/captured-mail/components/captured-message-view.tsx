import type { CapturedMessage } from '../../../../shared/contracts/operator';
import { formatDateTime } from '../../../lib/format-date';
import { splitLinks } from '../utils/split-links';

/** One captured message: its envelope and its plain text with clickable links. */
export function CapturedMessageView({ message }: { message: CapturedMessage }) {
  return (
    <article aria-labelledby="captured-message-subject" className="rounded-lg border border-line bg-surface p-6">
      <h2 id="captured-message-subject" className="mb-3 text-xl font-bold">
        {message.subject}
      </h2>
      <dl className="mb-4 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 border-b border-line pb-4 text-sm">
        <dt className="text-muted">From</dt>
        <dd className="break-all">{message.from}</dd>
        <dt className="text-muted">To</dt>
        <dd className="break-all">{message.to}</dd>
        <dt className="text-muted">Captured</dt>
        <dd>
          <time dateTime={message.createdAt}>{formatDateTime(message.createdAt)}</time>
        </dd>
      </dl>
      <div className="font-sans whitespace-pre-wrap break-words">
        {splitLinks(message.text).map((piece, index) =>
          piece.kind === 'link' ? (
            <a key={index} href={piece.href} className="break-all">
              {piece.href}
            </a>
          ) : (
            <span key={index}>{piece.text}</span>
          ),
        )}
      </div>
    </article>
  );
}
