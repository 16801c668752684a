import { Router, type Request } from 'express';
import { z } from 'zod';
import { idParam } from '../../shared/contracts/auth';
import {
  computeRequestSchema,
  preparationListQuerySchema,
  readingsRequestSchema,
  preparationWriteSchema,
  routeFinderRequestSchema,
  titleSchema,
} from '../../shared/contracts/preparations';
import { labActor, type Authorize, type LabContext } from '../auth/authorize';
import { clientSignal } from '../lib/client-signal';
import { valid, validate } from '../lib/validate';
import type { PreparationsService } from './preparations-service';
import type { routeFinderService } from './route-finder-service';

const prepParams = z.object({ labId: idParam, preparationId: idParam });
const versionParams = z.object({ labId: idParam, preparationId: idParam, number: idParam });
const duplicateSchema = z.object({ title: titleSchema.optional() });

/** Preparations of a lab: every member reads; analysts plan, save, version and duplicate. */
export function preparationsRouter(deps: {
  preparations: PreparationsService;
  routes: ReturnType<typeof routeFinderService>;
  authorize: Authorize;
}) {
  const { preparations, routes, authorize } = deps;
  const router = Router({ mergeParams: true });
  const read = authorize.lab('member');
  const plan = authorize.lab('planPreparations');
  const lab = (req: Request) => (req.lab as LabContext).id;

  router.get('/preparations', read, validate({ query: preparationListQuerySchema }), async (req, res) => {
    const { query } = valid(req, { query: preparationListQuerySchema });
    res.json(await preparations.list(lab(req), query));
  });

  router.post('/preparations', plan, validate({ body: preparationWriteSchema }), async (req, res) => {
    const { body } = valid(req, { body: preparationWriteSchema });
    res.status(201).json(await preparations.create(lab(req), labActor(req), body, clientSignal(res)));
  });

  router.get('/preparations/:preparationId', read, validate({ params: prepParams }), async (req, res) => {
    const { params } = valid(req, { params: prepParams });
    res.json(await preparations.detail(lab(req), params.preparationId, labActor(req)));
  });

  router.get(
    '/preparations/:preparationId/versions/:number',
    read,
    validate({ params: versionParams }),
    async (req, res) => {
      const { params } = valid(req, { params: versionParams });
      res.json(await preparations.version(lab(req), params.preparationId, params.number, labActor(req)));
    },
  );

  router.put(
    '/preparations/:preparationId/versions/:number',
    plan,
    validate({ params: versionParams, body: preparationWriteSchema }),
    async (req, res) => {
      const { params, body } = valid(req, { params: versionParams, body: preparationWriteSchema });
      res.json(
        await preparations.saveDraft(
          lab(req),
          labActor(req),
          params.preparationId,
          params.number,
          body,
          clientSignal(res),
        ),
      );
    },
  );

  router.post(
    '/preparations/:preparationId/versions/:number/readings',
    plan,
    validate({ params: versionParams, body: readingsRequestSchema }),
    async (req, res) => {
      const { params, body } = valid(req, { params: versionParams, body: readingsRequestSchema });
      res.json(
        await preparations.recordReadings(
          lab(req),
          labActor(req),
          params.preparationId,
          params.number,
          body,
          clientSignal(res),
        ),
      );
    },
  );

  router.post('/preparations/:preparationId/versions', plan, validate({ params: prepParams }), async (req, res) => {
    const { params } = valid(req, { params: prepParams });
    res
      .status(201)
      .json(await preparations.newVersion(lab(req), labActor(req), params.preparationId, clientSignal(res)));
  });

  router.post(
    '/preparations/:preparationId/duplicate',
    plan,
    validate({ params: prepParams, body: duplicateSchema }),
    async (req, res) => {
      const { params, body } = valid(req, { params: prepParams, body: duplicateSchema });
      res
        .status(201)
        .json(
          await preparations.duplicate(lab(req), labActor(req), params.preparationId, body.title, clientSignal(res)),
        );
    },
  );

  router.post(
    '/compute',
    authorize.lab('computeBudgets'),
    validate({ body: computeRequestSchema }),
    async (req, res) => {
      const { body } = valid(req, { body: computeRequestSchema });
      res.json(await preparations.computeOnly(lab(req), body, clientSignal(res)));
    },
  );

  router.post(
    '/route-finder',
    authorize.lab('findRoutes'),
    validate({ body: routeFinderRequestSchema }),
    async (req, res) => {
      const { body } = valid(req, { body: routeFinderRequestSchema });
      res.json(await routes.find(lab(req), body, clientSignal(res)));
    },
  );

  return router;
}
