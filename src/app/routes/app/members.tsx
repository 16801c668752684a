import type { QueryClient } from '@tanstack/react-query';
import { ROLE_LABELS } from '../../../../shared/contracts/roles';
import { NotPermitted } from '../../../components/errors/not-permitted';
import { Card } from '../../../components/ui/card';
import { PageHeader } from '../../../components/ui/page-header';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { invitationsQueryOptions, useInvitations } from '../../../features/members/api/get-invitations';
import { membersQueryOptions, useMembers } from '../../../features/members/api/get-members';
import { InviteMemberForm } from '../../../features/members/components/invite-member-form';
import { MembersTable } from '../../../features/members/components/members-table';
import { PendingInvitations } from '../../../features/members/components/pending-invitations';
import { activeMembership, activeRoles, can } from '../../../lib/authorization';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (me?.activeLabId && can(activeRoles(me), 'manageMembers')) {
    await Promise.all([
      queryClient.ensureQueryData(membersQueryOptions(me.activeLabId)),
      queryClient.ensureQueryData(invitationsQueryOptions(me.activeLabId)),
    ]);
  }
  return null;
};

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  if (!membership || !can(membership.roles, 'manageMembers')) {
    return (
      <>
        <title>Members · Dilutrace</title>
        <NotPermitted title="Members" neededRole={ROLE_LABELS.admin} />
      </>
    );
  }
  return <MembersPage labId={membership.id} labName={membership.name} currentUserId={me.user.id} />;
}

function MembersPage({ labId, labName, currentUserId }: { labId: number; labName: string; currentUserId: number }) {
  const members = useMembers(labId);
  const invitations = useInvitations(labId);
  return (
    <>
      <title>Members · Dilutrace</title>
      <PageHeader
        title="Members"
        description={`Who works in ${labName}, and what each person may do. Role changes are saved as you tick them.`}
        actions={
          <a
            href="#invite"
            className="rounded-md border border-line-strong bg-surface px-4 py-2 font-semibold text-ink no-underline hover:bg-paper"
          >
            Invite a member
          </a>
        }
      />
      <section aria-labelledby="members-heading" className="mb-10">
        <h2 id="members-heading" className="mb-3 text-xl font-bold">
          {members.length} {members.length === 1 ? 'member' : 'members'}
        </h2>
        <MembersTable labId={labId} labName={labName} members={members} currentUserId={currentUserId} />
      </section>
      <div className="grid items-start gap-6 md:grid-cols-2">
        <div id="invite" tabIndex={-1}>
          <Card title="Invite a member">
            <InviteMemberForm labId={labId} />
          </Card>
        </div>
        <Card title="Pending invitations">
          <PendingInvitations labId={labId} invitations={invitations} />
        </Card>
      </div>
    </>
  );
}
