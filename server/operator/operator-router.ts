import { Router } from 'express';
import { z } from 'zod';
import { idParam } from '../../shared/contracts/auth';
import { capturedMailQuerySchema } from '../../shared/contracts/operator';
import type { Authorize, SessionUser } from '../auth/authorize';
import { valid, validate } from '../lib/validate';
import type { OperatorService } from './operator-service';

const accountParams = z.object({ userId: idParam });

/** /api/operator/...: the instance operator's accounts and captured mail (authorize.operator on each). */
export function operatorRouter(deps: { operator: OperatorService; authorize: Authorize }) {
  const { operator, authorize } = deps;
  const router = Router();
  const actor = (user: unknown) => {
    const { id, name } = user as SessionUser;
    return { id, name };
  };

  router.get('/accounts', authorize.operator, async (_req, res) => {
    res.json(await operator.listAccounts());
  });

  router.post(
    '/accounts/:userId/disable',
    authorize.operator,
    validate({ params: accountParams }),
    async (req, res) => {
      const { params } = valid(req, { params: accountParams });
      res.json(await operator.disable(actor(req.user), { id: params.userId }));
    },
  );

  router.post('/accounts/:userId/enable', authorize.operator, validate({ params: accountParams }), async (req, res) => {
    const { params } = valid(req, { params: accountParams });
    res.json(await operator.enable(actor(req.user), { id: params.userId }));
  });

  router.get('/mail', authorize.operator, validate({ query: capturedMailQuerySchema }), async (req, res) => {
    const { query } = valid(req, { query: capturedMailQuerySchema });
    res.json(await operator.capturedMail(query.to));
  });

  return router;
}
