import { Router, type Request } from 'express';
import { idParam, tokenParamsSchema } from '../../shared/contracts/auth';
import { invitationAcceptSchema, invitationCreateSchema, memberUpdateSchema } from '../../shared/contracts/members';
import { z } from 'zod';
import type { AttemptLimits } from '../auth/attempt-limits';
import type { AuthService } from '../auth/auth-service';
import type { Authorize, SessionUser } from '../auth/authorize';
import { csrfToken } from '../auth/csrf';
import { valid, validate } from '../lib/validate';
import type { MembersService } from './members-service';

const memberParams = z.object({ labId: idParam, userId: idParam });
const invitationParams = z.object({ labId: idParam, invitationId: idParam });

/** Routes under /api/labs/:labId for the lab's administrator. */
export function labMembersRouter(deps: { members: MembersService; authorize: Authorize }) {
  const { members, authorize } = deps;
  const router = Router({ mergeParams: true });
  const admin = authorize.lab('manageMembers');
  const labId = (req: Request) => (req.lab as { id: number }).id;

  router.get('/members', admin, async (req, res) => {
    res.json(await members.list(labId(req)));
  });

  router.patch(
    '/members/:userId',
    admin,
    validate({ params: memberParams, body: memberUpdateSchema }),
    async (req, res) => {
      const { params, body } = valid(req, { params: memberParams, body: memberUpdateSchema });
      res.json(await members.update(labId(req), req.user as SessionUser, params.userId, body));
    },
  );

  router.delete('/members/:userId', admin, validate({ params: memberParams }), async (req, res) => {
    const { params } = valid(req, { params: memberParams });
    await members.remove(labId(req), req.user as SessionUser, params.userId);
    res.status(204).end();
  });

  router.get('/invitations', admin, async (req, res) => {
    res.json(await members.listInvitations(labId(req)));
  });

  router.post('/invitations', admin, validate({ body: invitationCreateSchema }), async (req, res) => {
    const { body } = valid(req, { body: invitationCreateSchema });
    res.status(201).json(await members.invite(labId(req), req.user as SessionUser, body));
  });

  router.post('/invitations/:invitationId/revoke', admin, validate({ params: invitationParams }), async (req, res) => {
    const { params } = valid(req, { params: invitationParams });
    res.json(await members.revokeInvitation(labId(req), req.user as SessionUser, params.invitationId));
  });

  return router;
}

/**
 * The public invitation link: preview, then accept. A new e-mail's accept signs the new account in;
 * an existing account accepts from its own session and switches to the lab it joined.
 */
export function invitationsRouter(deps: { members: MembersService; auth: AuthService; limits: AttemptLimits }) {
  const { members, auth } = deps;
  const router = Router();

  router.get('/:token', validate({ params: tokenParamsSchema }), async (req, res) => {
    const { params } = valid(req, { params: tokenParamsSchema });
    res.json(await members.preview(params.token));
  });

  router.post(
    '/:token/accept',
    deps.limits.guard('invitation'),
    validate({ params: tokenParamsSchema, body: invitationAcceptSchema }),
    async (req, res) => {
      const { params, body } = valid(req, { params: tokenParamsSchema, body: invitationAcceptSchema });
      const signedIn = req.user as SessionUser | undefined;
      const user = await members.accept(params.token, signedIn, body);
      if (signedIn?.id !== user.id) {
        await new Promise<void>((resolve, reject) => req.login(user, (error) => (error ? reject(error) : resolve())));
      }
      const me = await auth.me(user, await members.labOf(params.token), csrfToken(req));
      req.session.activeLabId = me.activeLabId ?? undefined;
      res.json(me);
    },
  );

  return router;
}
