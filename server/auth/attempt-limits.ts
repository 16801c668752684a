import { createHash } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator } from 'express-rate-limit';
import {
  RateLimiterPostgres,
  RateLimiterRes,
  RateLimiterSQLite,
  type RateLimiterAbstract,
} from 'rate-limiter-flexible';
import { normaliseEmail } from '../../shared/contracts/auth';
import type { AuditRepository } from '../audit/audit-repository';
import { isPostgres, type Db } from '../db/connection';
import type { BackgroundWork } from '../lib/background';
import { AppError } from '../lib/errors';

/**
 * The one place that limits attempts at secrets: sign-in, the approval signature, reset links,
 * invitation links, and reset requests. Counters live in the `auth_attempts` table through
 * rate-limiter-flexible's SQLite or PostgreSQL store, so every instance on one database shares them.
 *
 * A password check is counted before it runs (atomically, so concurrent guesses cannot slip past)
 * and refunded when it succeeds: only failures use up the limits. It is counted three ways: per
 * e-mail address (every check of one account shares a counter), per client address (spraying
 * across accounts), and on the whole instance. Reset requests are counted per e-mail address and
 * per client address, successful or not. The first refusal of each counter is an audit event.
 */

export const ATTEMPTS_TABLE = 'auth_attempts';
const WINDOW_SECONDS = 15 * 60;

export interface AttemptLimitSettings {
  /** Failed password checks per e-mail address in 15 minutes (DILUTRACE_SIGNIN_LIMIT). */
  perAccount: number;
  /** Failed password checks from one client address in 15 minutes, whatever the e-mail. */
  perClient: number;
  /** Failed password checks on the whole instance in 15 minutes. */
  perInstance: number;
  /** Reset requests per e-mail address in 15 minutes. */
  resetRequestsPerAccount: number;
  /** Reset requests from one client address in 15 minutes. */
  resetRequestsPerClient: number;
}

export const DEFAULT_ATTEMPT_LIMITS: AttemptLimitSettings = {
  perAccount: 10,
  perClient: 100,
  perInstance: 1000,
  resetRequestsPerAccount: 5,
  resetRequestsPerClient: 30,
};

/** What is being tried; each kind has its own refusal. */
export type AttemptKind = 'sign_in' | 'approval' | 'reset_link' | 'invitation' | 'reset_request';

const REFUSALS: Record<AttemptKind, string> = {
  sign_in: 'Too many sign-in attempts. Wait 15 minutes, then try again.',
  approval: 'Too many wrong passwords. Signing is locked for 15 minutes; then try again.',
  reset_link: 'Too many attempts with reset links. Wait 15 minutes, then try again.',
  invitation: 'Too many attempts with invitation links. Wait 15 minutes, then try again.',
  reset_request: 'Too many reset requests. Wait 15 minutes, then try again.',
};

interface Counter {
  limiter: RateLimiterAbstract;
  key: string;
  /** Says whose attempts were locked, for the audit trail. */
  who: string;
}

function databaseLimiter(db: Db, keyPrefix: string, points: number): RateLimiterAbstract {
  const options = {
    storeClient: db,
    storeType: 'knex',
    tableName: ATTEMPTS_TABLE,
    tableCreated: true, // by migration 20261203020000_auth_attempts
    clearExpiredByTimeout: false, // prune() does it
    keyPrefix,
    points,
    duration: WINDOW_SECONDS,
    blockDuration: WINDOW_SECONDS,
  };
  return isPostgres(db) ? new RateLimiterPostgres(options) : new RateLimiterSQLite(options);
}

/** The address as a counter key: its SHA-256, so the table holds no e-mail addresses. */
const accountKey = (email: string) => createHash('sha256').update(normaliseEmail(email)).digest('hex');
/** The client's address; IPv6 by its /56 network, as one client usually holds the whole block. */
const clientKey = (req: Request) => ipKeyGenerator(req.ip ?? 'unknown');

export function attemptLimits(deps: {
  db: Db;
  audit: AuditRepository;
  settings?: Partial<AttemptLimitSettings>;
  background: BackgroundWork;
}) {
  const settings = { ...DEFAULT_ATTEMPT_LIMITS, ...deps.settings };
  const account = databaseLimiter(deps.db, 'password-account', settings.perAccount);
  const client = databaseLimiter(deps.db, 'password-client', settings.perClient);
  const instance = databaseLimiter(deps.db, 'password-instance', settings.perInstance);
  const resetAccount = databaseLimiter(deps.db, 'reset-account', settings.resetRequestsPerAccount);
  const resetClient = databaseLimiter(deps.db, 'reset-client', settings.resetRequestsPerClient);

  function countersFor(kind: AttemptKind, req: Request, email: string | undefined): Counter[] {
    const address = clientKey(req);
    if (kind === 'reset_request') {
      return [
        ...(email
          ? [{ limiter: resetAccount, key: accountKey(email), who: `reset requests for ${normaliseEmail(email)}` }]
          : []),
        { limiter: resetClient, key: address, who: `reset requests from client address ${address}` },
      ];
    }
    return [
      { limiter: instance, key: 'all', who: 'password checks on this instance' },
      { limiter: client, key: address, who: `password checks from client address ${address}` },
      ...(email
        ? [{ limiter: account, key: accountKey(email), who: `password checks for ${normaliseEmail(email)}` }]
        : []),
    ];
  }

  const refund = (counters: Counter[]) => Promise.all(counters.map((c) => c.limiter.reward(c.key, 1)));

  async function lockedOut(kind: AttemptKind, req: Request, counter: Counter): Promise<void> {
    await deps.audit.record({
      labId: req.lab?.id ?? null,
      actorUserId: req.user?.id ?? null,
      action: 'auth.locked_out',
      entityType: 'attempt_limit',
      entityId: kind,
      summary: `Locked for 15 minutes: ${counter.who} (more than ${counter.limiter.points} in 15 minutes)`,
    });
  }

  /**
   * Middleware in front of a check of a secret. `emailOf` names the account tried (read after
   * validation, so normalised); without it only the client and instance limits apply. A refusal is
   * 429 with Retry-After and the same answer whether or not the account exists.
   */
  function guard(kind: AttemptKind, emailOf?: (req: Request) => string | undefined): RequestHandler {
    return async (req, res, next) => {
      const counters = countersFor(kind, req, emailOf?.(req));
      const taken: Counter[] = [];
      for (const counter of counters) {
        try {
          await counter.limiter.consume(counter.key, 1);
          taken.push(counter);
        } catch (refusal) {
          if (!(refusal instanceof RateLimiterRes)) throw refusal;
          if (kind !== 'reset_request') await refund(taken);
          // Exactly one request sees the counter pass its limit (the upsert is atomic): that one is the lock-out.
          if (refusal.consumedPoints === counter.limiter.points + 1) await lockedOut(kind, req, counter);
          res.set('Retry-After', String(Math.max(1, Math.ceil(refusal.msBeforeNext / 1000))));
          throw new AppError('rate_limited', 'rate_limited', REFUSALS[kind]);
        }
      }
      if (kind !== 'reset_request') {
        res.on('finish', () => {
          if (res.statusCode < 400) deps.background.run('Refunding an attempt', () => refund(taken));
        });
      }
      next();
    };
  }

  return {
    guard,
    /** Deletes counters that expired more than an hour ago. */
    prune: (now = Date.now()) =>
      deps
        .db(ATTEMPTS_TABLE)
        .where('expire', '<', now - 60 * 60 * 1000)
        .delete(),
  };
}
export type AttemptLimits = ReturnType<typeof attemptLimits>;
