import { Router, type Request } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { idParam } from '../../shared/contracts/auth';
import {
  EQUIPMENT_KINDS,
  equipmentCreateSchema,
  equipmentKindSchema,
  equipmentListQuerySchema,
  equipmentReviseSchema,
  equipmentRetireSchema,
  importRequestSchema,
} from '../../shared/contracts/library';
import { GLASSWARE_TEMPLATES, PISTON_TEMPLATES } from '../../shared/contracts/equipment-templates';
import type { Authorize, LabContext, SessionUser } from '../auth/authorize';
import { AppError } from '../lib/errors';
import { valid, validate } from '../lib/validate';
import { CERTIFICATE_MAX_BYTES, type CertificatesService } from './certificates-service';
import { CSV_COLUMNS } from './csv-columns';
import { csvTemplate, libraryToCsv } from './csv-io';
import type { importService } from './import-service';
import type { LibraryService } from './library-service';

const itemParams = z.object({ labId: idParam, itemId: idParam });
const revisionParams = z.object({ labId: idParam, itemId: idParam, number: idParam });
const certificateParams = z.object({ labId: idParam, certificateId: idParam });
const kindQuery = z.object({ kind: equipmentKindSchema });

/** The tolerance library: every member of the lab reads it; QA (and admins) keep it (permission keepLibrary). */
export function libraryRouter(deps: {
  items: LibraryService;
  certificates: CertificatesService;
  imports: ReturnType<typeof importService>;
  authorize: Authorize;
}) {
  const { items, certificates, imports, authorize } = deps;
  const router = Router({ mergeParams: true });
  const read = authorize.lab('member');
  const keep = authorize.lab('keepLibrary');
  const lab = (req: Request) => (req.lab as LabContext).id;
  const actor = (req: Request) => req.user as SessionUser;

  // Browsers send the file name as UTF-8 bytes; multer's default reads them as latin1 and mangles them.
  const upload = multer({
    storage: multer.memoryStorage(),
    defParamCharset: 'utf8',
    limits: { fileSize: CERTIFICATE_MAX_BYTES, files: 1, fields: 5 },
  }).single('file');
  const receiveFile = (req: Request, res: Parameters<typeof upload>[1]) =>
    new Promise<void>((resolve, reject) =>
      upload(req, res, (error: unknown) => {
        if (error instanceof multer.MulterError) {
          reject(
            error.code === 'LIMIT_FILE_SIZE'
              ? new AppError(
                  'too_large',
                  'file_too_large',
                  `The certificate is larger than ${CERTIFICATE_MAX_BYTES / 1024 / 1024} MB.`,
                )
              : new AppError('validation', 'upload_invalid', `The upload was refused: ${error.message}.`),
          );
        } else if (error) {
          // Anything else multer passes on is the form itself failing to parse (busboy: a malformed part header, a cut-off body).
          reject(
            new AppError(
              'validation',
              'upload_invalid',
              'The upload could not be read; choose the file again and retry.',
            ),
          );
        } else resolve();
      }),
    );

  router.get('/equipment-templates', read, (_req, res) => {
    res.json({ glassware: GLASSWARE_TEMPLATES, piston: PISTON_TEMPLATES });
  });

  router.get('/equipment-csv/columns', read, (_req, res) => {
    res.json(
      Object.fromEntries(
        EQUIPMENT_KINDS.map((kind) => [
          kind,
          CSV_COLUMNS[kind].map(({ column, help, type }) => ({ column, help, required: !type.startsWith('optional') })),
        ]),
      ),
    );
  });

  router.get('/equipment-csv/template', read, validate({ query: kindQuery }), (req, res) => {
    const { query } = valid(req, { query: kindQuery });
    res.attachment(`dilutrace-${query.kind}-template.csv`).type('text/csv').send(csvTemplate(query.kind));
  });

  router.get('/equipment-csv/export', read, validate({ query: kindQuery }), async (req, res) => {
    const { query } = valid(req, { query: kindQuery });
    const list = await items.list(lab(req), { kind: query.kind, status: 'active' });
    res.attachment(`dilutrace-${query.kind}-library.csv`).type('text/csv').send(libraryToCsv(query.kind, list));
  });

  router.post('/equipment-csv/import', keep, validate({ body: importRequestSchema }), async (req, res) => {
    const { body } = valid(req, { body: importRequestSchema });
    res.json(await imports.run(lab(req), actor(req), body));
  });

  router.get('/equipment', read, validate({ query: equipmentListQuerySchema }), async (req, res) => {
    const { query } = valid(req, { query: equipmentListQuerySchema });
    res.json(await items.list(lab(req), query));
  });

  router.post('/equipment', keep, validate({ body: equipmentCreateSchema }), async (req, res) => {
    const { body } = valid(req, { body: equipmentCreateSchema });
    const id = await items.create(lab(req), actor(req), body);
    res.status(201).json(await items.detail(lab(req), id));
  });

  router.get('/equipment/:itemId', read, validate({ params: itemParams }), async (req, res) => {
    const { params } = valid(req, { params: itemParams });
    res.json(await items.detail(lab(req), params.itemId));
  });

  router.put(
    '/equipment/:itemId',
    keep,
    validate({ params: itemParams, body: equipmentReviseSchema }),
    async (req, res) => {
      const { params, body } = valid(req, { params: itemParams, body: equipmentReviseSchema });
      await items.revise(lab(req), actor(req), params.itemId, body);
      res.json(await items.detail(lab(req), params.itemId));
    },
  );

  router.post(
    '/equipment/:itemId/retire',
    keep,
    validate({ params: itemParams, body: equipmentRetireSchema }),
    async (req, res) => {
      const { params, body } = valid(req, { params: itemParams, body: equipmentRetireSchema });
      res.json(await items.retire(lab(req), actor(req), params.itemId, body.reason));
    },
  );

  router.get('/equipment/:itemId/revisions/:number', read, validate({ params: revisionParams }), async (req, res) => {
    const { params } = valid(req, { params: revisionParams });
    res.json(await items.revision(lab(req), params.itemId, params.number));
  });

  router.post(
    '/equipment/:itemId/revisions/:number/certificates',
    keep,
    validate({ params: revisionParams }),
    async (req, res) => {
      const { params } = valid(req, { params: revisionParams });
      await receiveFile(req, res);
      res.status(201).json(await certificates.upload(lab(req), actor(req), params.itemId, params.number, req.file));
    },
  );

  router.get('/certificates/:certificateId', read, validate({ params: certificateParams }), async (req, res) => {
    const { params } = valid(req, { params: certificateParams });
    const { certificate, content } = await certificates.read(lab(req), params.certificateId);
    res.set('X-Content-Type-Options', 'nosniff');
    res.set('Content-Security-Policy', "default-src 'none'; sandbox");
    res.attachment(certificate.originalName).type(certificate.mediaType).send(content);
  });

  return router;
}
