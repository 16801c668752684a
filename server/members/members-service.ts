import { invitationJoinNewSchema, type Invitation, type InvitationPreview, type Member, type MemberUpdate } from '../../shared/contracts/members';
import type { Role } from '../../shared/contracts/roles';
import type { AuditRepository } from '../audit/audit-repository';
import type { SessionUser } from '../auth/authorize';
import { hashPassword, verifyPassword } from '../auth/password';
import type { DatabaseSessionStore } from '../auth/session-store';
import { hashToken, newToken } from '../auth/tokens';
import type { UsersRepository } from '../auth/users-repository';
import type { Db } from '../db/connection';
import type { LabsRepository, MemberRow } from '../labs/labs-repository';
import { conflict, notFound, validationError } from '../lib/errors';
import { toFieldIssues } from '../lib/validate';
import type { Mailer } from '../mail/mailer';
import { invitationMessage } from '../mail/messages';
import { invitationsRepository, type InvitationRow } from './invitations-repository';

const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

function groupMembers(rows: MemberRow[]): Member[] {
  const members = new Map<number, Member>();
  for (const row of rows) {
    const member = members.get(row.user_id) ?? {
      userId: row.user_id,
      email: row.email,
      name: row.name,
      roles: [],
      active: Boolean(row.active),
      joinedAt: row.created_at,
    };
    member.roles.push(row.role);
    if (row.created_at < member.joinedAt) member.joinedAt = row.created_at;
    members.set(row.user_id, member);
  }
  return [...members.values()];
}

const toInvitation = (row: InvitationRow): Invitation => ({
  id: row.id,
  email: row.email,
  name: row.name,
  role: row.role,
  invitedBy: row.invited_by_name ?? '',
  createdAt: row.created_at,
  expiresAt: row.expires_at,
  acceptedAt: row.accepted_at,
});

export function membersService(deps: {
  db: Db;
  users: UsersRepository;
  labs: LabsRepository;
  audit: AuditRepository;
  mailer: Mailer;
  sessions: DatabaseSessionStore;
  now: () => Date;
  publicUrl: (path: string) => string;
}) {
  const { db, users, labs, audit, mailer, now } = deps;
  const invitations = invitationsRepository(db);

  async function openInvitation(token: string): Promise<InvitationRow> {
    const row = await invitations.findByTokenHash(hashToken(token));
    if (!row || row.accepted_at || row.expires_at <= now().toISOString()) {
      throw notFound('This invitation (it may have expired or been used already)');
    }
    return row;
  }

  async function member(labId: number, userId: number): Promise<Member> {
    const found = groupMembers(await labs.members(labId)).find((m) => m.userId === userId);
    if (!found) throw notFound('The member');
    return found;
  }

  return {
    list: async (labId: number): Promise<Member[]> => groupMembers(await labs.members(labId)),

    listInvitations: async (labId: number): Promise<Invitation[]> => (await invitations.listForLab(labId)).map(toInvitation),

    async invite(labId: number, actor: SessionUser, input: { email: string; name: string; role: Role }): Promise<Invitation> {
      const lab = await labs.findById(labId);
      if (!lab) throw notFound('The lab');
      const existing = await users.findByEmail(input.email);
      if (existing && (await labs.rolesOf(existing.id, labId)).length > 0) {
        throw conflict('already_member', `${input.email} is already a member of this lab. Change their roles in the member list instead.`);
      }
      const { token, tokenHash } = newToken();
      const created = now();
      const expiresAt = new Date(created.getTime() + INVITATION_LIFETIME_MS).toISOString();
      const id = await invitations.insert({
        lab_id: labId,
        email: input.email,
        name: input.name,
        role: input.role,
        token_hash: tokenHash,
        invited_by: actor.id,
        created_at: created.toISOString(),
        expires_at: expiresAt,
      });
      await audit.record({
        labId,
        actorUserId: actor.id,
        action: 'member.invited',
        entityType: 'invitation',
        entityId: id,
        summary: `${actor.name} invited ${input.email} as ${input.role}`,
        after: { email: input.email, role: input.role },
      });
      const message = invitationMessage({
        name: input.name,
        labName: lab.name,
        role: input.role,
        invitedBy: actor.name,
        link: deps.publicUrl(`/invitation/${token}`),
        expiresAt,
      });
      await mailer.send({ to: input.email, labId, ...message });
      const row = await invitations.findById(id);
      return toInvitation(row as InvitationRow);
    },

    async preview(token: string): Promise<InvitationPreview> {
      const row = await openInvitation(token);
      const lab = await labs.findById(row.lab_id);
      return {
        email: row.email,
        name: row.name,
        labName: lab?.name ?? '',
        role: row.role,
        existingAccount: Boolean(await users.findByEmail(row.email)),
      };
    },

    /** Joins the lab with the invited role: creates the account, or confirms an existing one by its password. */
    async accept(token: string, input: { name?: string; password: string }): Promise<SessionUser> {
      const row = await openInvitation(token);
      const existing = await users.findByEmail(row.email);
      const at = now().toISOString();
      let userId: number;
      if (existing) {
        if (!existing.active) throw validationError('This account is deactivated. Ask the lab administrator to reactivate it.');
        if (!(await verifyPassword(input.password, existing.password_hash))) {
          throw validationError('You already have a Dilutrace account: enter its current password to join this lab.', [
            { path: 'password', message: 'This is not the password of your existing account.' },
          ]);
        }
        userId = existing.id;
        await db.transaction(async (trx) => {
          await labs.addRole(userId, row.lab_id, row.role, at, trx);
          await invitations.markAccepted(row.id, userId, at, trx);
        });
      } else {
        const parsed = invitationJoinNewSchema.safeParse(input);
        if (!parsed.success) {
          const issues = toFieldIssues(parsed.error);
          throw validationError(`${issues[0].path}: ${issues[0].message}`, issues);
        }
        const passwordHash = await hashPassword(parsed.data.password);
        userId = await db.transaction(async (trx) => {
          const id = await users.insert({ email: row.email, name: parsed.data.name, passwordHash, createdAt: at }, trx);
          await labs.addRole(id, row.lab_id, row.role, at, trx);
          await invitations.markAccepted(row.id, id, at, trx);
          return id;
        });
      }
      await audit.record({
        labId: row.lab_id,
        actorUserId: userId,
        action: 'member.joined',
        entityType: 'user',
        entityId: userId,
        summary: `${row.email} accepted the invitation as ${row.role}`,
      });
      const user = await users.findById(userId);
      return { id: userId, email: row.email, name: user?.name ?? '' };
    },

    /** Changes roles or deactivates; the lab always keeps at least one active admin. */
    async update(labId: number, actor: SessionUser, userId: number, change: MemberUpdate): Promise<Member> {
      const before = await member(labId, userId);
      await db.transaction(async (trx) => {
        if (change.roles) await labs.setRoles(userId, labId, [...new Set(change.roles)], now().toISOString(), trx);
        if (change.active !== undefined) await users.setActive(userId, change.active, trx);
        if ((await labs.countActiveAdmins(labId, trx)) === 0) {
          throw conflict('last_admin', 'The lab needs at least one active administrator. Make someone else admin first.');
        }
      });
      const after = await member(labId, userId);
      if (change.active === false) await deps.sessions.destroyForUser(userId);
      await audit.record({
        labId,
        actorUserId: actor.id,
        action: change.active === false ? 'member.deactivated' : change.active === true && !before.active ? 'member.reactivated' : 'member.roles_changed',
        entityType: 'user',
        entityId: userId,
        summary: `${actor.name} changed ${before.email}: roles ${before.roles.join(', ')} → ${after.roles.join(', ')}, ${before.active ? 'active' : 'inactive'} → ${after.active ? 'active' : 'inactive'}`,
        before: { roles: before.roles, active: before.active },
        after: { roles: after.roles, active: after.active },
      });
      return after;
    },
  };
}
export type MembersService = ReturnType<typeof membersService>;
