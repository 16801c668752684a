import type { Me } from '../../shared/contracts/auth';
import type { Role } from '../../shared/contracts/roles';
import type { AuditRepository } from '../audit/audit-repository';
import { notFound, validationError } from '../lib/errors';
import type { Mailer } from '../mail/mailer';
import { passwordResetMessage } from '../mail/messages';
import { DUMMY_HASH, hashPassword, needsRehash, verifyPassword } from './password';
import type { PasswordResetsRepository } from './password-resets-repository';
import type { DatabaseSessionStore } from './session-store';
import { hashToken, newToken } from './tokens';
import type { UsersRepository } from './users-repository';
import type { SessionUser } from './authorize';
import { isoAfter } from '../lib/clock';
import type { Transact } from '../db/transaction';

const RESET_LIFETIME_MS = 60 * 60 * 1000;

export function authService(deps: {
  transact: Transact;
  users: UsersRepository;
  resets: PasswordResetsRepository;
  audit: AuditRepository;
  mailer: Mailer;
  sessions: DatabaseSessionStore;
  now: () => Date;
  publicUrl: (path: string) => string;
}) {
  const { transact, users, resets, audit, mailer, now } = deps;

  return {
    /** Checks e-mail and password; an unknown e-mail costs the same time as a wrong password. */
    async verifyCredentials(email: string, password: string): Promise<SessionUser | null> {
      const user = await users.findByEmail(email);
      const ok = await verifyPassword(password, user?.password_hash ?? DUMMY_HASH);
      if (!user || !ok || !user.active) {
        // Filed under every lab the account belongs to (each may see its member's failures), never
        // under one of them chosen by order; an unknown address is an instance-level event.
        const labIds = user ? [...new Set((await users.memberships(user.id)).map((m) => m.lab_id))] : [];
        for (const labId of labIds.length > 0 ? labIds : [null]) {
          await audit.record({
            labId,
            actorUserId: user?.id ?? null,
            action: 'auth.sign_in_failed',
            entityType: 'user',
            entityId: user?.id ?? null,
            summary:
              user && ok && !user.active
                ? `Sign-in refused for disabled account ${email}`
                : `Failed sign-in for ${email}`,
          });
        }
        return null;
      }
      if (needsRehash(user.password_hash))
        await users.replacePasswordHash(user.id, user.password_hash, await hashPassword(password));
      return { id: user.id, email: user.email, name: user.name };
    },

    async findActiveUser(id: number): Promise<SessionUser | null> {
      const user = await users.findById(id);
      return user && user.active ? { id: user.id, email: user.email, name: user.name } : null;
    },

    /** The signed-in user with their labs and roles; the active lab falls back to the first lab. */
    async me(user: SessionUser, requestedLabId: number | undefined, csrfToken: string): Promise<Me> {
      const rows = await users.memberships(user.id);
      const labs = new Map<number, { id: number; name: string; roles: Role[] }>();
      for (const row of rows) {
        const lab = labs.get(row.lab_id) ?? { id: row.lab_id, name: row.lab_name, roles: [] };
        lab.roles.push(row.role);
        labs.set(row.lab_id, lab);
      }
      const list = [...labs.values()];
      const activeLabId =
        requestedLabId !== undefined && labs.has(requestedLabId) ? requestedLabId : (list[0]?.id ?? null);
      return { user, labs: list, activeLabId, operator: await users.isOperator(user.id), csrfToken };
    },

    async recordSignIn(user: SessionUser, labId: number | null): Promise<void> {
      await audit.record({
        labId,
        actorUserId: user.id,
        action: 'auth.sign_in',
        entityType: 'user',
        entityId: user.id,
        summary: `${user.email} signed in`,
      });
    },

    /** Sends a reset link when the address belongs to an active account; says nothing either way. */
    async requestPasswordReset(email: string): Promise<void> {
      const user = await users.findByEmail(email);
      if (!user || !user.active) return;
      const { token, tokenHash } = newToken();
      const created = now();
      await resets.insert({
        user_id: user.id,
        token_hash: tokenHash,
        created_at: created.toISOString(),
        expires_at: isoAfter(created, RESET_LIFETIME_MS),
      });
      // Account mail is filed by recipient only: no lab's delivery log lists it (lab id null).
      await audit.record({
        labId: null,
        actorUserId: user.id,
        action: 'auth.password_reset_requested',
        entityType: 'user',
        entityId: user.id,
        summary: `Password reset requested for ${user.email}`,
      });
      const message = passwordResetMessage({ name: user.name, link: deps.publicUrl(`/reset-password/${token}`) });
      await mailer.send({ to: user.email, labId: null, ...message });
    },

    /** Sets a new password from a reset link; the link works once, for one hour, and ends other sessions. */
    async completePasswordReset(token: string, password: string): Promise<void> {
      const reset = await resets.findByTokenHash(hashToken(token));
      if (!reset || reset.used_at || reset.expires_at <= now().toISOString()) {
        throw validationError('This reset link has expired or was already used. Ask for a new one.');
      }
      const user = await users.findById(reset.user_id);
      if (!user || !user.active) throw notFound('The account');
      const passwordHash = await hashPassword(password);
      await transact(async (trx) => {
        // Consumed by one conditional update: of simultaneous uses of one link, exactly one gets a row.
        if ((await resets.consume(reset.id, now().toISOString(), trx)) !== 1) {
          throw validationError('This reset link has expired or was already used. Ask for a new one.');
        }
        await users.setPassword(user.id, passwordHash, trx);
      });
      await deps.sessions.destroyForUser(user.id);
      await audit.record({
        labId: null,
        actorUserId: user.id,
        action: 'auth.password_reset',
        entityType: 'user',
        entityId: user.id,
        summary: `Password reset for ${user.email}`,
      });
    },
  };
}
export type AuthService = ReturnType<typeof authService>;
