import type { Certificate } from '../../../../shared/contracts/library';
import { formatDateTime } from '../../../lib/format-date';
import { certificateDownloadUrl } from '../api/upload-certificate';

const sizeText = (bytes: number) =>
  bytes < 1024 * 1024 ? `${Math.max(1, Math.round(bytes / 1024))} kB` : `${(bytes / 1024 / 1024).toFixed(1)} MB`;

/** The item's calibration certificates, newest revision first, each with its download link. */
export function CertificateList({ labId, certificates }: { labId: number; certificates: Certificate[] }) {
  if (certificates.length === 0) return <p className="text-muted">No certificate uploaded yet.</p>;
  return (
    <ul className="flex flex-col gap-3">
      {certificates.map((certificate) => (
        <li key={certificate.id}>
          <a
            href={certificateDownloadUrl(labId, certificate.id)}
            download={certificate.originalName}
            className="font-semibold break-all"
          >
            {certificate.originalName}
          </a>
          {certificate.containsScript ? (
            <p className="text-sm font-semibold text-danger" role="note">
              Holds JavaScript: open it only in a PDF viewer with scripts turned off, and check it with whoever issued
              it.
            </p>
          ) : null}
          <div className="text-sm text-muted">
            Revision {certificate.revisionNumber} · {sizeText(certificate.sizeBytes)} · {certificate.uploadedBy},{' '}
            <time dateTime={certificate.uploadedAt}>{formatDateTime(certificate.uploadedAt)}</time>
          </div>
        </li>
      ))}
    </ul>
  );
}
