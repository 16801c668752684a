import { useMutation, useQueryClient } from '@tanstack/react-query';
import { certificateSchema, type Certificate } from '../../../../shared/contracts/library';
import { api } from '../../../lib/api-client';
import { equipmentKeys } from '../../../lib/api/lab-equipment';

type UploadCertificateInput = { labId: number; itemId: number; revisionNumber: number; file: File };

/** Attaches a PDF, PNG or JPEG (≤ 10 MB; the server checks the bytes, not the name) to one revision. */
export function uploadCertificate({
  labId,
  itemId,
  revisionNumber,
  file,
}: UploadCertificateInput): Promise<Certificate> {
  const form = new FormData();
  form.append('file', file);
  return api.postForm(
    `/api/labs/${labId}/equipment/${itemId}/revisions/${revisionNumber}/certificates`,
    form,
    certificateSchema,
  );
}

export function useUploadCertificate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadCertificate,
    onSuccess: (_certificate, { labId, itemId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: equipmentKeys.detail(labId, itemId) }),
        queryClient.invalidateQueries({ queryKey: equipmentKeys.lists(labId) }),
      ]),
  });
}

/** The download address of a stored certificate (served as an attachment). */
export const certificateDownloadUrl = (labId: number, certificateId: number) =>
  `/api/labs/${labId}/certificates/${certificateId}`;
