import { Router, type Request } from 'express';
import type { Passport } from 'passport';
import {
  activeLabRequestSchema,
  loginRequestSchema,
  passwordResetCompleteSchema,
  passwordResetRequestSchema,
  tokenParamsSchema,
} from '../../shared/contracts/auth';
import { AppError, forbidden, unauthenticated } from '../lib/errors';
import type { BackgroundWork } from '../lib/background';
import { valid, validate } from '../lib/validate';
import type { AttemptLimits } from './attempt-limits';
import type { AuthService } from './auth-service';
import type { Authorize, SessionUser } from './authorize';
import { csrfToken, type CsrfProtection } from './csrf';

function logIn(req: Request, user: SessionUser): Promise<void> {
  return new Promise((resolve, reject) => req.login(user, (error) => (error ? reject(error) : resolve())));
}

export function authRouter(deps: {
  auth: AuthService;
  passport: InstanceType<typeof Passport>;
  authorize: Authorize;
  limits: AttemptLimits;
  csrf: CsrfProtection;
  background: BackgroundWork;
}) {
  const { auth, passport, authorize, limits } = deps;
  const router = Router();
  const me = (req: Request) => auth.me(req.user as SessionUser, req.session.activeLabId, csrfToken(req));

  router.get('/csrf', (req, res) => {
    res.json({ csrfToken: deps.csrf.tokenFor(req, res) });
  });

  router.post(
    '/login',
    validate({ body: loginRequestSchema }),
    limits.guard('sign_in', (req) => valid(req, { body: loginRequestSchema }).body.email),
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
    validate({ body: passwordResetRequestSchema }),
    limits.guard('reset_request', (req) => valid(req, { body: passwordResetRequestSchema }).body.email),
    async (req, res) => {
      const { body } = valid(req, { body: passwordResetRequestSchema });
      // Answer first, then look the address up and mail: known and unknown addresses take the same time.
      res
        .status(202)
        .json({ message: 'If an account uses that address, a reset link is on its way. It works for one hour.' });
      deps.background.run('Password reset request', () => auth.requestPasswordReset(body.email));
    },
  );

  router.post(
    '/password-reset/:token',
    validate({ params: tokenParamsSchema, body: passwordResetCompleteSchema }),
    limits.guard('reset_link'),
    async (req, res) => {
      const { params, body } = valid(req, { params: tokenParamsSchema, body: passwordResetCompleteSchema });
      await auth.completePasswordReset(params.token, body.password);
      res.status(204).end();
    },
  );

  return router;
}
