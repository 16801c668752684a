import { Router, type Request } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { Passport } from 'passport';
import {
  activeLabRequestSchema,
  loginRequestSchema,
  passwordResetCompleteSchema,
  passwordResetRequestSchema,
  tokenParamsSchema,
} from '../../shared/contracts/auth';
import { AppError, forbidden, unauthenticated } from '../lib/errors';
import { valid, validate } from '../lib/validate';
import type { AuthService } from './auth-service';
import type { Authorize, SessionUser } from './authorize';
import { csrfToken } from './csrf';

const limited = (max: number, message: string) =>
  rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: max,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${String((req.body as { email?: unknown })?.email ?? '').toLowerCase()}`,
    handler: () => {
      throw new AppError('rate_limited', 'rate_limited', message);
    },
  });

function logIn(req: Request, user: SessionUser): Promise<void> {
  return new Promise((resolve, reject) => req.login(user, (error) => (error ? reject(error) : resolve())));
}

export function authRouter(deps: { auth: AuthService; passport: InstanceType<typeof Passport>; authorize: Authorize; signInLimit: number }) {
  const { auth, passport, authorize } = deps;
  const router = Router();
  const me = (req: Request) => auth.me(req.user as SessionUser, req.session.activeLabId, csrfToken(req));

  router.get('/csrf', (req, res) => {
    res.json({ csrfToken: csrfToken(req) });
  });

  router.post(
    '/login',
    limited(deps.signInLimit, 'Too many sign-in attempts. Wait 15 minutes, then try again.'),
    validate({ body: loginRequestSchema }),
    async (req, res) => {
      const { body } = valid(req, { body: loginRequestSchema });
      req.body = body;
      const user = await new Promise<SessionUser | false>((resolve, reject) => {
        passport.authenticate('local', { session: false }, (error: unknown, found: SessionUser | false) =>
          error ? reject(error) : resolve(found),
        )(req, res, () => undefined);
      });
      if (!user) throw new AppError('unauthenticated', 'invalid_credentials', 'The e-mail or password is not right.');
      // passport regenerates the session id here (session fixation), dropping the old CSRF token.
      await logIn(req, user);
      const result = await me(req);
      req.session.activeLabId = result.activeLabId ?? undefined;
      await auth.recordSignIn(user, result.activeLabId);
      res.json(result);
    },
  );

  router.post('/logout', (req, res, next) => {
    req.logout((error) => {
      if (error) return next(error);
      req.session.destroy((destroyError) => {
        if (destroyError) return next(destroyError);
        res.clearCookie('dilutrace.sid');
        res.status(204).end();
      });
    });
  });

  router.get('/me', async (req, res) => {
    if (!req.user) throw unauthenticated();
    res.json(await me(req));
  });

  router.post('/active-lab', authorize.signedIn, validate({ body: activeLabRequestSchema }), async (req, res) => {
    const { body } = valid(req, { body: activeLabRequestSchema });
    const result = await auth.me(req.user as SessionUser, body.labId, csrfToken(req));
    if (result.activeLabId !== body.labId) throw forbidden('You are not a member of that lab.');
    req.session.activeLabId = body.labId;
    res.json(result);
  });

  router.post(
    '/password-reset',
    limited(5, 'Too many reset requests. Wait 15 minutes, then try again.'),
    validate({ body: passwordResetRequestSchema }),
    async (req, res) => {
      const { body } = valid(req, { body: passwordResetRequestSchema });
      await auth.requestPasswordReset(body.email);
      res.status(202).json({ message: 'If an account uses that address, a reset link is on its way. It works for one hour.' });
    },
  );

  router.post(
    '/password-reset/:token',
    validate({ params: tokenParamsSchema, body: passwordResetCompleteSchema }),
    async (req, res) => {
      const { params, body } = valid(req, { params: tokenParamsSchema, body: passwordResetCompleteSchema });
      await auth.completePasswordReset(params.token, body.password);
      res.status(204).end();
    },
  );

  return router;
}
