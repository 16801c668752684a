import { Router } from 'express';
import type { Authorize, LabContext } from '../auth/authorize';
import type { DeliveryLogService } from './delivery-log-service';

/**
 * A lab's mail delivery log for its administrators (GET /api/labs/:labId/delivery-log): to, subject
 * and time of the mail about this lab. Bodies, links and tokens stay with the instance operator.
 */
export function deliveryLogRouter(deps: { deliveryLog: DeliveryLogService; authorize: Authorize }) {
  const router = Router({ mergeParams: true });
  router.get('/delivery-log', deps.authorize.lab('readDeliveryLog'), async (req, res) => {
    res.json(await deps.deliveryLog.entries((req.lab as LabContext).id));
  });
  return router;
}
