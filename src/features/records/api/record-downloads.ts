/** Download addresses of one version: the PDF record (watermarked DRAFT unless approved) and the stored snapshot. */
export const recordPdfUrl = (labId: number, preparationId: number, versionNumber: number) =>
  `/api/labs/${labId}/preparations/${preparationId}/versions/${versionNumber}/record.pdf`;

export const snapshotJsonUrl = (labId: number, preparationId: number, versionNumber: number) =>
  `/api/labs/${labId}/preparations/${preparationId}/versions/${versionNumber}/snapshot.json`;
