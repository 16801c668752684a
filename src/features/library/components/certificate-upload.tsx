import { useRef, useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-error';
import { useUploadCertificate } from '../api/upload-certificate';

/** The server's limit on a certificate file. */
const MAX_BYTES = 10 * 1024 * 1024;

/** Uploads a PDF, PNG or JPEG certificate to the item's current revision. */
export function CertificateUpload({
  labId,
  itemId,
  revisionNumber,
}: {
  labId: number;
  itemId: number;
  revisionNumber: number;
}) {
  const upload = useUploadCertificate();
  const inputRef = useRef<HTMLInputElement>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [uploadedName, setUploadedName] = useState<string | null>(null);

  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    setProblem(null);
    setUploadedName(null);
    const file = inputRef.current?.files?.[0];
    if (!file) return setProblem('Choose a certificate file first.');
    if (file.size > MAX_BYTES) return setProblem('The certificate is larger than 10 MB.');
    upload.mutate(
      { labId, itemId, revisionNumber, file },
      {
        onSuccess: (certificate) => {
          setUploadedName(certificate.originalName);
          if (inputRef.current) inputRef.current.value = '';
        },
        onError: (error) => setProblem(isApiError(error) ? error.message : 'The certificate could not be uploaded.'),
      },
    );
  };

  return (
    <form
      onSubmit={onSubmit}
      className="mt-4 flex flex-col gap-2 border-t border-line pt-4"
      aria-label="Upload a certificate"
    >
      <label htmlFor="certificate-file" className="font-semibold">
        Upload a certificate to revision {revisionNumber}
      </label>
      <input
        id="certificate-file"
        ref={inputRef}
        type="file"
        accept="application/pdf,image/png,image/jpeg,.pdf,.png,.jpg,.jpeg"
        aria-describedby="certificate-file-hint"
        className="text-sm file:mr-3 file:rounded-md file:border file:border-line-strong file:bg-surface file:px-3 file:py-1.5 file:font-semibold file:text-ink hover:file:bg-paper"
      />
      <p id="certificate-file-hint" className="text-sm text-muted">
        PDF, PNG or JPEG, at most 10 MB.
      </p>
      {problem ? <Alert tone="danger">{problem}</Alert> : null}
      {uploadedName ? (
        <Alert tone="ok">
          {uploadedName} is stored with revision {revisionNumber}.
        </Alert>
      ) : null}
      <Button
        type="submit"
        variant="secondary"
        pending={upload.isPending}
        pendingLabel="Uploading…"
        className="self-start"
      >
        Upload
      </Button>
    </form>
  );
}
