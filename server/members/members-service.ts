import {
  invitationJoinNewSchema,
  type Invitation,
  type InvitationPreview,
  type Member,
  type MemberUpdate,
} from '../../shared/contracts/members';
import type { Role } from '../../shared/contracts/roles';
import type { AuditRepository } from '../audit/audit-repository';
import type { SessionUser } from '../auth/authorize';
import { hashPassword } from '../auth/password';
import { hashToken, newToken } from '../auth/tokens';
import type { UsersRepository } from '../auth/users-repository';
import { isUniqueViolation } from '../db/unique-violation';
import type { LabsRepository, MemberRow } from '../labs/labs-repository';
import { conflict, forbidden, notFound, unauthenticated } from '../lib/errors';
import { fieldsRefused, toFieldIssues } from '../lib/validate';
import type { Mailer } from '../mail/mailer';
import { invitationMessage } from '../mail/messages';
import type { InvitationRow, InvitationsRepository } from './invitations-repository';
import { isoAfter } from '../lib/clock';
import type { Transact } from '../db/transaction';

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
  revokedAt: row.revoked_at,
});

const invitationUsed = () =>
  conflict('invitation_used', 'This invitation has just been accepted. Sign in to continue.');

export function membersService(deps: {
  transact: Transact;
  users: UsersRepository;
  invitations: InvitationsRepository;
  labs: LabsRepository;
  audit: AuditRepository;
  mailer: Mailer;
  now: () => Date;
  publicUrl: (path: string) => string;
}) {
  const { transact, users, invitations, labs, audit, mailer, now } = deps;

  async function openInvitation(token: string): Promise<InvitationRow> {
    const row = await invitations.findByTokenHash(hashToken(token));
    if (!row || row.accepted_at || row.revoked_at || row.expires_at <= now().toISOString()) {
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

    listInvitations: async (labId: number): Promise<Invitation[]> =>
      (await invitations.listForLab(labId)).map(toInvitation),

    async invite(
      labId: number,
      actor: SessionUser,
      input: { email: string; name: string; role: Role },
    ): Promise<Invitation> {
      const lab = await labs.findById(labId);
      if (!lab) throw notFound('The lab');
      const existing = await users.findByEmail(input.email);
      if (existing && (await labs.rolesOf(existing.id, labId)).length > 0) {
        throw conflict(
          'already_member',
          `${input.email} is already a member of this lab. Change their roles in the member list instead.`,
        );
      }
      const { token, tokenHash } = newToken();
      const created = now();
      const expiresAt = isoAfter(created, INVITATION_LIFETIME_MS);
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
        existingAccount: existing !== undefined,
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

    /**
     * Joins the lab with the invited role. An e-mail that already has an account accepts signed in
     * as that account (the link never checks a password); a new e-mail sets its name and password.
     * The invitation is claimed by a conditional update, so of concurrent accepts one wins and the
     * others get a conflict.
     */
    async accept(
      token: string,
      signedIn: SessionUser | undefined,
      input: { name?: string; password?: string },
    ): Promise<SessionUser> {
      const row = await openInvitation(token);
      const existing = await users.findByEmail(row.email);
      const at = now().toISOString();
      let userId: number;
      if (existing) {
        if (!signedIn)
          throw unauthenticated(
            `You already have a Dilutrace account. Sign in as ${row.email} to accept this invitation.`,
          );
        if (signedIn.email.toLowerCase() !== row.email.toLowerCase()) {
          throw forbidden(`This invitation is for ${row.email}. Sign out, then sign in as ${row.email} to accept it.`);
        }
        userId = existing.id;
        await transact(async (trx) => {
          if (!(await invitations.claim(row.id, at, trx))) throw invitationUsed();
          await invitations.setAcceptedUser(row.id, userId, trx);
          await labs.addRole(userId, row.lab_id, row.role, at, trx);
        });
      } else {
        const parsed = invitationJoinNewSchema.safeParse(input);
        if (!parsed.success) {
          const issues = toFieldIssues(parsed.error);
          throw fieldsRefused(issues);
        }
        const passwordHash = await hashPassword(parsed.data.password);
        userId = await transact(async (trx) => {
          if (!(await invitations.claim(row.id, at, trx))) throw invitationUsed();
          const id = await users.insert({ email: row.email, name: parsed.data.name, passwordHash, createdAt: at }, trx);
          await invitations.setAcceptedUser(row.id, id, trx);
          await labs.addRole(id, row.lab_id, row.role, at, trx);
          return id;
        }).catch((error: unknown) => {
          // Another lab's invitation to the same e-mail made the account a moment ago: this one stays open.
          if (isUniqueViolation(error, 'users', 'email')) {
            throw conflict(
              'account_exists',
              `An account for ${row.email} was just created. Sign in as ${row.email} to accept this invitation.`,
            );
          }
          throw error;
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

    /** The lab an invitation (by its token) is for, once accepted: the session switches to it. */
    labOf: async (token: string): Promise<number | undefined> =>
      (await invitations.findByTokenHash(hashToken(token)))?.lab_id,

    async revokeInvitation(labId: number, actor: SessionUser, invitationId: number): Promise<Invitation> {
      const row = await invitations.findById(invitationId);
      if (!row || row.lab_id !== labId) throw notFound('The invitation');
      if (!(await invitations.revoke(invitationId, labId, actor.id, now().toISOString()))) {
        throw conflict('invitation_closed', 'This invitation was already accepted or revoked.');
      }
      await audit.record({
        labId,
        actorUserId: actor.id,
        action: 'member.invitation_revoked',
        entityType: 'invitation',
        entityId: invitationId,
        summary: `${actor.name} revoked the invitation of ${row.email} as ${row.role}`,
      });
      return toInvitation((await invitations.findById(invitationId)) as InvitationRow);
    },

    /** Changes a member's roles in this lab; the lab always keeps at least one active admin. */
    async update(labId: number, actor: SessionUser, userId: number, change: MemberUpdate): Promise<Member> {
      const before = await member(labId, userId);
      await transact(async (trx) => {
        await labs.setRoles(userId, labId, [...new Set(change.roles)], now().toISOString(), trx);
        if ((await labs.countActiveAdmins(labId, trx)) === 0) throw lastAdmin();
      });
      const after = await member(labId, userId);
      await audit.record({
        labId,
        actorUserId: actor.id,
        action: 'member.roles_changed',
        entityType: 'user',
        entityId: userId,
        summary: `${actor.name} changed the roles of ${before.email}: ${before.roles.join(', ')} → ${after.roles.join(', ')}`,
        before: { roles: before.roles },
        after: { roles: after.roles },
      });
      return after;
    },

    /**
     * Ends a person's membership of this lab. Their account, their other labs and what they did
     * here (records, audit trail) stay; their sessions lose this lab at the next request.
     */
    async remove(labId: number, actor: SessionUser, userId: number): Promise<void> {
      const before = await member(labId, userId);
      await transact(async (trx) => {
        await labs.removeMember(userId, labId, trx);
        if ((await labs.countActiveAdmins(labId, trx)) === 0) throw lastAdmin();
      });
      await audit.record({
        labId,
        actorUserId: actor.id,
        action: 'member.removed',
        entityType: 'user',
        entityId: userId,
        summary: `${actor.name} removed ${before.email} (${before.roles.join(', ')}) from the lab`,
        before: { roles: before.roles },
      });
    },
  };
}
const lastAdmin = () =>
  conflict('last_admin', 'The lab needs at least one active administrator. Make someone else admin first.');
export type MembersService = ReturnType<typeof membersService>;
