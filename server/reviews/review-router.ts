import { Router, type Request } from 'express';
import { z } from 'zod';
import { idParam } from '../../shared/contracts/auth';
import {
  approveRequestSchema,
  returnRequestSchema,
  submitRequestSchema,
  withdrawRequestSchema,
} from '../../shared/contracts/reviews';
import type { AttemptLimits } from '../auth/attempt-limits';
import { labActor, type Authorize, type LabContext, type SessionUser } from '../auth/authorize';
import { valid, validate } from '../lib/validate';
import type { PreparationsService } from '../preparations/preparations-service';
import type { ReviewService } from './review-service';

const versionParams = z.object({ labId: idParam, preparationId: idParam, number: idParam });
const searchQuery = z.object({ q: z.string().trim().max(200).optional() });

/** Submit or withdraw (analyst), approve or return (QA), the review queue, approved records and hash verification. */
export function reviewRouter(deps: {
  reviews: ReviewService;
  preparations: PreparationsService;
  authorize: Authorize;
  limits: AttemptLimits;
}) {
  const { reviews, preparations, authorize } = deps;
  const router = Router({ mergeParams: true });
  const lab = (req: Request) => (req.lab as LabContext).id;
  const actor = (req: Request) => req.user as SessionUser;
  const base = '/preparations/:preparationId/versions/:number';

  router.post(
    `${base}/submit`,
    authorize.lab('planPreparations'),
    validate({ params: versionParams, body: submitRequestSchema }),
    async (req, res) => {
      const { params, body } = valid(req, { params: versionParams, body: submitRequestSchema });
      await reviews.submit(lab(req), actor(req), params.preparationId, params.number, body.comment);
      res.json(await preparations.detail(lab(req), params.preparationId, labActor(req)));
    },
  );

  router.post(
    `${base}/withdraw`,
    authorize.lab('planPreparations'),
    validate({ params: versionParams, body: withdrawRequestSchema }),
    async (req, res) => {
      const { params, body } = valid(req, { params: versionParams, body: withdrawRequestSchema });
      await reviews.withdraw(lab(req), actor(req), params.preparationId, params.number, body.comment);
      res.json(await preparations.detail(lab(req), params.preparationId, labActor(req)));
    },
  );

  const signature = deps.limits.guard('approval', (req) => req.user?.email);
  router.post(
    `${base}/approve`,
    authorize.lab('reviewRecords'),
    validate({ params: versionParams, body: approveRequestSchema }),
    signature,
    async (req, res) => {
      const { params, body } = valid(req, { params: versionParams, body: approveRequestSchema });
      await reviews.decide(lab(req), actor(req), params.preparationId, params.number, { kind: 'approved', ...body });
      res.json(await preparations.detail(lab(req), params.preparationId, labActor(req)));
    },
  );

  router.post(
    `${base}/return`,
    authorize.lab('reviewRecords'),
    validate({ params: versionParams, body: returnRequestSchema }),
    async (req, res) => {
      const { params, body } = valid(req, { params: versionParams, body: returnRequestSchema });
      await reviews.decide(lab(req), actor(req), params.preparationId, params.number, {
        kind: 'returned',
        comment: body.comment,
      });
      res.json(await preparations.detail(lab(req), params.preparationId, labActor(req)));
    },
  );

  router.get(`${base}/verify`, authorize.lab('member'), validate({ params: versionParams }), async (req, res) => {
    const { params } = valid(req, { params: versionParams });
    res.json(await reviews.verify(lab(req), params.preparationId, params.number));
  });

  router.get(
    `${base}/snapshot.json`,
    authorize.lab('member'),
    validate({ params: versionParams }),
    async (req, res) => {
      const { params } = valid(req, { params: versionParams });
      res
        .attachment(`dilutrace-preparation-${params.preparationId}-v${params.number}-snapshot.json`)
        .json(await preparations.snapshotDownload(lab(req), params.preparationId, params.number));
    },
  );

  router.get('/review-queue', authorize.lab('reviewRecords'), async (req, res) => {
    res.json(await reviews.queue(lab(req)));
  });

  router.get('/approved-records', authorize.lab('member'), validate({ query: searchQuery }), async (req, res) => {
    const { query } = valid(req, { query: searchQuery });
    res.json(await reviews.approvedRecords(lab(req), query.q));
  });

  return router;
}
