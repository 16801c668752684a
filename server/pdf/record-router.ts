import { Router, type Request } from 'express';
import { z } from 'zod';
import { idParam } from '../../shared/contracts/auth';
import { labActor, type Authorize, type LabContext } from '../auth/authorize';
import type { LabsService } from '../labs/labs-service';
import type { Clock } from '../lib/clock';
import { validationError } from '../lib/errors';
import { valid, validate } from '../lib/validate';
import type { PreparationsService } from '../preparations/preparations-service';
import { renderRecordPdf } from './record-pdf';

const versionParams = z.object({ labId: idParam, preparationId: idParam, number: idParam });

/** GET …/versions/:number/record.pdf — the signed record (or a watermarked draft) for any lab member. */
export function recordRouter(deps: {
  preparations: PreparationsService;
  labs: LabsService;
  authorize: Authorize;
  clock: Clock;
}) {
  const router = Router({ mergeParams: true });
  router.get(
    '/preparations/:preparationId/versions/:number/record.pdf',
    deps.authorize.lab('member'),
    validate({ params: versionParams }),
    async (req: Request, res) => {
      const { params } = valid(req, { params: versionParams });
      const labId = (req.lab as LabContext).id;
      const preparation = await deps.preparations.detail(labId, params.preparationId, labActor(req));
      const version = await deps.preparations.version(labId, params.preparationId, params.number, labActor(req));
      if (!version.snapshot)
        throw validationError('This version has no computed budget yet, so there is no record to print.');
      // An approved version prints what it was signed under, not what later versions renamed.
      const frozen = version.approvedAs;
      const labName = frozen?.labName ?? (await deps.labs.name(labId));
      const shown = frozen ? { ...preparation, title: frozen.title } : preparation;
      const pdf = await renderRecordPdf({
        labName,
        preparation: shown,
        version,
        generatedAt: deps.clock.now().toISOString(),
      });
      const name = `dilutrace-${params.preparationId}-v${params.number}${version.status === 'approved' ? '' : '-draft'}.pdf`;
      res.set('X-Content-Type-Options', 'nosniff').attachment(name).type('application/pdf').send(pdf);
    },
  );
  return router;
}
