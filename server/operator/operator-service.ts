import type { CapturedMessage, OperatorAccount } from '../../shared/contracts/operator';
import type { AuditRepository } from '../audit/audit-repository';
import type { DatabaseSessionStore } from '../auth/session-store';
import type { UserRow, UsersRepository } from '../auth/users-repository';
import { conflict, notFound } from '../lib/errors';
import type { OutboxRepository } from '../mail/outbox-repository';

/** Who acts: a signed-in operator through the API, or someone at the command line (no account). */
export type OperatorActor = { id: number; name: string } | 'command line';

/**
 * What only the instance operator does, outside every lab's roles: switch an account off (and on)
 * everywhere, make another account operator, read the captured mail. Each action is an audit event
 * with no lab (instance-level).
 */
export function operatorService(deps: {
  users: UsersRepository;
  outbox: OutboxRepository;
  audit: AuditRepository;
  sessions: DatabaseSessionStore;
}) {
  const { users, outbox, audit } = deps;

  async function account(find: { id: number } | { email: string }): Promise<UserRow> {
    const user = 'id' in find ? await users.findById(find.id) : await users.findByEmail(find.email.trim());
    if (!user) throw notFound('The account');
    return user;
  }

  async function toAccount(user: UserRow): Promise<OperatorAccount> {
    const labs = (await users.memberships(user.id)).map((m) => m.lab_name);
    return {
      id: user.id,
      email: user.email,
      name: user.name,
      active: Boolean(user.active),
      operator: Boolean(user.operator),
      labs: [...new Set(labs)],
    };
  }

  async function record(
    actor: OperatorActor,
    action: string,
    user: UserRow,
    summary: string,
    before: object,
    after: object,
  ) {
    const who = actor === 'command line' ? 'The operator at the command line' : actor.name;
    await audit.record({
      labId: null,
      actorUserId: actor === 'command line' ? null : actor.id,
      action,
      entityType: 'user',
      entityId: user.id,
      summary: `${who} ${summary}`,
      before,
      after,
    });
  }

  return {
    async listAccounts(): Promise<OperatorAccount[]> {
      const labs = await users.labNamesByUser();
      return (await users.list()).map((user) => ({
        id: user.id,
        email: user.email,
        name: user.name,
        active: Boolean(user.active),
        operator: Boolean(user.operator),
        labs: labs.get(user.id) ?? [],
      }));
    },

    /** Disables an account everywhere and ends its sessions; its memberships and records stay. */
    async disable(actor: OperatorActor, find: { id: number } | { email: string }): Promise<OperatorAccount> {
      const user = await account(find);
      if (actor !== 'command line' && actor.id === user.id) {
        throw conflict(
          'own_account',
          'You cannot disable your own account here. Use the command line, or ask another operator.',
        );
      }
      await users.setActive(user.id, false);
      await deps.sessions.destroyForUser(user.id);
      await record(
        actor,
        'account.disabled',
        user,
        `disabled the account ${user.email} everywhere`,
        { active: Boolean(user.active) },
        { active: false },
      );
      return toAccount(await account({ id: user.id }));
    },

    async enable(actor: OperatorActor, find: { id: number } | { email: string }): Promise<OperatorAccount> {
      const user = await account(find);
      await users.setActive(user.id, true);
      await record(
        actor,
        'account.enabled',
        user,
        `enabled the account ${user.email}`,
        { active: Boolean(user.active) },
        { active: true },
      );
      return toAccount(await account({ id: user.id }));
    },

    /** Makes an account an instance operator too (command line only). */
    async grant(actor: OperatorActor, find: { email: string }): Promise<OperatorAccount> {
      const user = await account(find);
      await users.setOperator(user.id, true);
      await record(
        actor,
        'operator.granted',
        user,
        `made ${user.email} an instance operator`,
        { operator: Boolean(user.operator) },
        { operator: true },
      );
      return toAccount(await account({ id: user.id }));
    },

    async revoke(actor: OperatorActor, find: { email: string }): Promise<OperatorAccount> {
      const user = await account(find);
      await users.setOperator(user.id, false);
      await record(
        actor,
        'operator.revoked',
        user,
        `ended the operator rights of ${user.email}`,
        { operator: Boolean(user.operator) },
        { operator: false },
      );
      return toAccount(await account({ id: user.id }));
    },

    /** The captured mail with bodies (newest 200), optionally for one recipient. */
    async capturedMail(to?: string): Promise<CapturedMessage[]> {
      return (await outbox.captured(to)).map((row) => ({
        id: row.id,
        to: row.to_address,
        from: row.from_address,
        subject: row.subject,
        text: row.text_body,
        html: row.html_body,
        createdAt: row.created_at,
      }));
    },
  };
}
export type OperatorService = ReturnType<typeof operatorService>;
