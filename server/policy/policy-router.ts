import { Router } from 'express';
import { labPolicySchema } from '../../shared/contracts/library';
import type { Authorize, LabContext, SessionUser } from '../auth/authorize';
import { valid, validate } from '../lib/validate';
import type { PolicyService } from './policy-service';

/** GET/PUT /api/labs/:labId/policy: every member reads it; QA sets it. */
export function policyRouter(deps: { policy: PolicyService; authorize: Authorize }) {
  const router = Router({ mergeParams: true });
  router.get('/policy', deps.authorize.lab('member'), async (req, res) => {
    res.json(await deps.policy.read((req.lab as LabContext).id));
  });
  router.put('/policy', deps.authorize.lab('setPolicy'), validate({ body: labPolicySchema }), async (req, res) => {
    const { body } = valid(req, { body: labPolicySchema });
    res.json(await deps.policy.update((req.lab as LabContext).id, req.user as SessionUser, body));
  });
  return router;
}
