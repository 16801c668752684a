import { createHash, randomUUID } from 'node:crypto';
import { mkdir, readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { fileTypeFromBuffer } from 'file-type';
import type { Certificate } from '../../shared/contracts/library';
import type { AuditRepository } from '../audit/audit-repository';
import type { SessionUser } from '../auth/authorize';
import { AppError, conflict, notFound, validationError } from '../lib/errors';
import { certificateDisplayName, pdfHoldsJavaScript } from './certificate-file';
import type { LibraryRepository } from './library-repository';
import { toCertificate } from './library-service';

/** Largest certificate accepted (scanned certificates are rarely above a few MB). */
export const CERTIFICATE_MAX_BYTES = 10 * 1024 * 1024;
const ACCEPTED: Record<string, string> = { 'application/pdf': 'pdf', 'image/png': 'png', 'image/jpeg': 'jpg' };

/**
 * Certificates are stored outside the web root under a generated name; the type is taken from
 * the file's first bytes, never from its name or the browser's claim. The uploader's name is kept
 * only for display, cleaned and ending in the sniffed type's extension. A PDF that can run
 * JavaScript is stored but flagged (and the flag audited).
 */
export function certificatesService(deps: {
  library: LibraryRepository;
  audit: AuditRepository;
  directory: string;
  now: () => Date;
}) {
  const { library, audit, directory, now } = deps;

  return {
    async upload(
      labId: number,
      actor: SessionUser,
      itemId: number,
      revisionNumber: number,
      file: { originalname: string; buffer: Buffer } | undefined,
    ): Promise<Certificate> {
      if (!file || file.buffer.length === 0)
        throw validationError('Choose a certificate file (PDF, PNG or JPEG) to upload.', [
          { path: 'file', message: 'No file was sent.' },
        ]);
      const item = await library.item(labId, itemId);
      if (!item) throw notFound('The item');
      if (item.status === 'retired')
        throw conflict(
          'item_retired',
          `${item.code} is retired, so it takes no new certificates. Attach the certificate to the item that replaced it.`,
        );
      const revision = (await library.revisionsOf(itemId)).find((r) => r.number === revisionNumber);
      if (!revision) throw notFound(`Revision ${revisionNumber} of ${item.code}`);
      const detected = await fileTypeFromBuffer(file.buffer);
      const extension = detected ? ACCEPTED[detected.mime] : undefined;
      if (!detected || !extension) {
        throw new AppError(
          'validation',
          'unsupported_file_type',
          'A certificate must be a PDF, PNG or JPEG file; this file is none of those, whatever its name says.',
          [
            {
              path: 'file',
              message: detected ? `The file is ${detected.mime}.` : 'The file type could not be recognised.',
            },
          ],
        );
      }
      await mkdir(directory, { recursive: true });
      const storedName = `${randomUUID()}.${extension}`;
      await writeFile(join(directory, storedName), file.buffer, { flag: 'wx', mode: 0o600 });
      const sha256 = createHash('sha256').update(file.buffer).digest('hex');
      const originalName = certificateDisplayName(file.originalname, extension);
      const containsScript = detected.mime === 'application/pdf' && pdfHoldsJavaScript(file.buffer);
      const id = await library.insertCertificate({
        lab_id: labId,
        item_id: itemId,
        revision_id: revision.id,
        original_name: originalName,
        stored_name: storedName,
        media_type: detected.mime,
        size_bytes: file.buffer.length,
        sha256,
        contains_script: containsScript,
        uploaded_by: actor.id,
        uploaded_at: now().toISOString(),
      });
      await audit.record({
        labId,
        actorUserId: actor.id,
        action: 'library.certificate_uploaded',
        entityType: 'equipment',
        entityId: itemId,
        summary: `${actor.name} attached ${originalName} to ${item.code} revision ${revisionNumber}`,
        after: { certificateId: id, sha256, containsScript },
      });
      if (containsScript) {
        await audit.record({
          labId,
          actorUserId: actor.id,
          action: 'library.certificate_flagged',
          entityType: 'equipment',
          entityId: itemId,
          summary: `${originalName} on ${item.code} revision ${revisionNumber} holds JavaScript; open it only in a viewer with scripts turned off`,
          after: { certificateId: id, sha256 },
        });
      }
      return toCertificate((await library.certificate(labId, id))!);
    },

    async read(labId: number, certificateId: number): Promise<{ certificate: Certificate; content: Buffer }> {
      const row = await library.certificate(labId, certificateId);
      if (!row) throw notFound('The certificate');
      return { certificate: toCertificate(row), content: await readFile(join(directory, row.stored_name)) };
    },
  };
}
export type CertificatesService = ReturnType<typeof certificatesService>;
