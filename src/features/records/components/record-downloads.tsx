import { recordPdfUrl, snapshotJsonUrl } from '../api/record-downloads';

type RecordDownloadsProps = { labId: number; preparationId: number; versionNumber: number; approved: boolean };

const LINK = 'rounded-md border px-4 py-2 font-semibold no-underline whitespace-nowrap';

/** The PDF record (signed when approved, watermarked DRAFT otherwise) and the stored snapshot as JSON. */
export function RecordDownloads({ labId, preparationId, versionNumber, approved }: RecordDownloadsProps) {
  return (
    <section aria-labelledby="downloads-heading" className="rounded-lg border border-line bg-surface p-6">
      <h2 id="downloads-heading" className="mb-3 text-lg font-bold">
        Downloads
      </h2>
      <div className="flex flex-wrap gap-2">
        <a
          href={recordPdfUrl(labId, preparationId, versionNumber)}
          download
          className={`${LINK} border-ink bg-ink text-paper hover:bg-ink-soft`}
        >
          {approved ? 'Download signed PDF' : 'Download draft PDF'}
        </a>
        <a
          href={snapshotJsonUrl(labId, preparationId, versionNumber)}
          download
          className={`${LINK} border-line-strong bg-surface text-ink hover:bg-paper`}
        >
          Download snapshot JSON
        </a>
      </div>
      {approved ? null : (
        <p className="mt-2 text-sm text-muted">Until it is approved, the PDF carries a DRAFT watermark.</p>
      )}
    </section>
  );
}
