import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import express from 'express';
import session from 'express-session';
import helmet from 'helmet';
import { nonFiniteNumberReplacer } from '../shared/contracts/json-number';
import { auditRepository } from './audit/audit-repository';
import { createComputePool, type Computer } from './compute/compute-pool';
import { auditRouter } from './audit/audit-router';
import { auditService } from './audit/audit-service';
import { auditTrailRepository } from './audit/audit-trail-repository';
import { authRouter } from './auth/auth-router';
import { authService } from './auth/auth-service';
import { createAuthorize } from './auth/authorize';
import { attemptLimits, type AttemptLimitSettings } from './auth/attempt-limits';
import { csrfProtection } from './auth/csrf';
import { createPassport } from './auth/passport';
import { DatabaseSessionStore } from './auth/session-store';
import { usersRepository } from './auth/users-repository';
import { passwordResetsRepository } from './auth/password-resets-repository';
import type { Db } from './db/connection';
import { transactor } from './db/transaction';
import { labsRepository } from './labs/labs-repository';
import { labsService } from './labs/labs-service';
import type { Clock } from './lib/clock';
import { backgroundWork } from './lib/background';
import { limitBodyDepth, requireJsonBody } from './lib/body-guards';
import { apiNotFound, errorHandler } from './lib/error-handler';
import type { Mailer } from './mail/mailer';
import { deliveryLogRouter } from './mail/delivery-log-router';
import { deliveryLogService } from './mail/delivery-log-service';
import { outboxRepository } from './mail/outbox-repository';
import { invitationsRouter, labMembersRouter } from './members/members-router';
import { membersService } from './members/members-service';
import { invitationsRepository } from './members/invitations-repository';
import { operatorRouter } from './operator/operator-router';
import { operatorService } from './operator/operator-service';
import { certificatesService } from './library/certificates-service';
import { importService } from './library/import-service';
import { libraryRepository } from './library/library-repository';
import { libraryRouter } from './library/library-router';
import { libraryService } from './library/library-service';
import { policyRouter } from './policy/policy-router';
import { preparationsRepository } from './preparations/preparations-repository';
import { preparationsRouter } from './preparations/preparations-router';
import { preparationsService } from './preparations/preparations-service';
import { routeFinderService } from './preparations/route-finder-service';
import { recordRouter } from './pdf/record-router';
import { reviewRouter } from './reviews/review-router';
import { reviewService } from './reviews/review-service';
import { reviewsRepository } from './reviews/reviews-repository';
import { policyRepository } from './policy/policy-repository';
import { policyService } from './policy/policy-service';

export interface AppConfig {
  sessionSecret: string;
  /** Base URL put in e-mailed links, e.g. http://127.0.0.1:3000 */
  publicUrl: string;
  production: boolean;
  trustProxy: boolean;
  /** Failed password checks per e-mail address in 15 minutes; 10 unless set (DILUTRACE_SIGNIN_LIMIT). */
  signInLimit?: number;
  /** The other attempt limits (server/auth/attempt-limits.ts); each has a default. */
  attemptLimits?: Partial<AttemptLimitSettings>;
  /** Folder for uploaded certificates, outside the web root. */
  certificateDir: string;
  /** Built client to serve (production); omitted in development and API tests. */
  clientDir?: string;
  log?: (message: string, error?: unknown) => void;
}

export interface AppDeps {
  db: Db;
  mailer: Mailer;
  clock: Clock;
  config: AppConfig;
  /** Where budgets are computed; a pool of worker threads unless a test passes its own. */
  computer?: Computer;
}

const SESSION_MAX_AGE_MS = 12 * 60 * 60 * 1000;

/** Builds the Express app; `server/index.ts` only listens. Tests drive it with supertest. */
export function createApp({ db, mailer, clock, config, computer = createComputePool() }: AppDeps) {
  const log = config.log ?? ((message: string, error?: unknown) => console.error(message, error));
  const now = () => clock.now();
  const publicUrl = (path: string) => `${config.publicUrl.replace(/\/$/, '')}${path}`;

  const transact = transactor(db);
  const users = usersRepository(db);
  const labs = labsRepository(db);
  const audit = auditRepository(db, now);
  // express-session dates its cookies by the real clock, so the store compares with the same one.
  const sessions = new DatabaseSessionStore(db, () => Date.now());
  const auth = authService({
    transact,
    users,
    resets: passwordResetsRepository(db),
    audit,
    mailer,
    sessions,
    now,
    publicUrl,
  });
  const members = membersService({
    transact,
    users,
    invitations: invitationsRepository(db),
    labs,
    audit,
    mailer,
    now,
    publicUrl,
  });
  const outbox = outboxRepository(db);
  const operator = operatorService({ users, outbox, audit, sessions });
  const deliveryLog = deliveryLogService({ outbox });
  const trail = auditService({ trail: auditTrailRepository(db), now });
  const labInfo = labsService({ labs });
  const library = libraryRepository(db);
  const items = libraryService({ transact, library, audit, now });
  const certificates = certificatesService({ library, audit, directory: config.certificateDir, now });
  const imports = importService({ transact, library, items });
  const policy = policyService({ transact, policies: policyRepository(db), audit, now });
  const preparationRows = preparationsRepository(db);
  const preparations = preparationsService({
    transact,
    preparations: preparationRows,
    items,
    policy,
    audit,
    computer,
    now,
  });
  const reviews = reviewService({
    transact,
    preparations: preparationRows,
    reviews: reviewsRepository(db),
    users,
    labs,
    audit,
    mailer,
    now,
    publicUrl,
    log,
  });
  const routes = routeFinderService({ items, policy, computer });
  const background = backgroundWork(log);
  const limits = attemptLimits({
    db,
    audit,
    background,
    settings: { ...(config.signInLimit ? { perAccount: config.signInLimit } : {}), ...config.attemptLimits },
  });
  const pruneAttempts = setInterval(
    () => void limits.prune().catch((error: unknown) => log('Pruning attempt counters failed', error)),
    60 * 60 * 1000,
  ).unref();
  const csrf = csrfProtection({ secret: config.sessionSecret, secureCookie: config.production && config.trustProxy });
  const passport = createPassport(auth);
  const authorize = createAuthorize(labs, users);

  const app = express();
  app.disable('x-powered-by');
  // JSON has no Infinity or NaN: responses write them as the strings the shared schemas decode (json-number.ts).
  app.set('json replacer', nonFiniteNumberReplacer);
  if (config.trustProxy) app.set('trust proxy', 1);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'"],
          connectSrc: ["'self'"],
          workerSrc: ["'self'", 'blob:'],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
          upgradeInsecureRequests: null,
        },
      },
    }),
  );

  const api = express.Router();
  api.use(requireJsonBody);
  api.use(express.json({ limit: '1mb', strict: true }));
  api.use(limitBodyDepth);
  api.use(
    session({
      name: 'dilutrace.sid',
      secret: config.sessionSecret,
      store: sessions,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: config.production && config.trustProxy ? true : false,
        maxAge: SESSION_MAX_AGE_MS,
      },
    }),
  );
  api.use(passport.initialize());
  api.use(passport.session());
  api.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });

  api.get('/health', (_req, res) => {
    res.json({ status: 'ok', time: now().toISOString() });
  });
  api.use(csrf.requireToken);
  api.use('/auth', authRouter({ auth, passport, authorize, limits, csrf, background }));
  api.use('/invitations', invitationsRouter({ members, auth, limits }));
  api.use('/labs/:labId', labMembersRouter({ members, authorize }));
  api.use('/operator', operatorRouter({ operator, authorize }));
  api.use('/labs/:labId', deliveryLogRouter({ deliveryLog, authorize }));
  api.use('/labs/:labId', libraryRouter({ items, certificates, imports, authorize }));
  api.use('/labs/:labId', policyRouter({ policy, authorize }));
  api.use('/labs/:labId', auditRouter({ audit: trail, authorize }));
  api.use('/labs/:labId', preparationsRouter({ preparations, routes, authorize }));
  api.use('/labs/:labId', reviewRouter({ reviews, preparations, authorize, limits }));
  api.use('/labs/:labId', recordRouter({ preparations, labs: labInfo, authorize, clock }));
  api.use(apiNotFound);
  app.use('/api', api);

  if (config.clientDir && existsSync(join(config.clientDir, 'index.html'))) {
    const clientDir = resolve(config.clientDir);
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    // Client routes (no file extension) get the app; a missing asset stays a 404.
    app.get('/{*splat}', (req, res, next) => {
      if (/\.[a-z0-9]+$/i.test(req.path)) return next();
      res.set('Cache-Control', 'no-cache');
      res.sendFile(join(clientDir, 'index.html'));
    });
  }
  app.use(apiNotFound);
  app.use(errorHandler(log));

  const close = async () => {
    clearInterval(pruneAttempts);
    await background.idle();
    await computer.close();
  };
  return { app, sessions, close };
}
