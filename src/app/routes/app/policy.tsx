import type { QueryClient } from '@tanstack/react-query';
import { Alert } from '../../../components/ui/alert';
import { PageHeader } from '../../../components/ui/page-header';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { labPolicyQueryOptions, useLabPolicy } from '../../../lib/api/lab-policy';
import { PolicyForm } from '../../../features/policy/components/policy-form';
import { PolicySummary } from '../../../features/policy/components/policy-summary';
import { activeMembership, can } from '../../../lib/authorization';
import { formatDateTime } from '../../../lib/format-date';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (me?.activeLabId) await queryClient.ensureQueryData(labPolicyQueryOptions(me.activeLabId));
  return null;
};

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  if (!membership) {
    return (
      <>
        <title>Lab policy · Dilutrace</title>
        <PageHeader title="Lab policy" />
        <Alert tone="info" title="No lab yet">
          The policy belongs to a lab. A lab administrator can invite you by e-mail.
        </Alert>
      </>
    );
  }
  // Only QA sets the policy (the server's rule); everyone else reads it.
  return <PolicyPage labId={membership.id} labName={membership.name} editable={can(membership.roles, 'setPolicy')} />;
}

function PolicyPage({ labId, labName, editable }: { labId: number; labName: string; editable: boolean }) {
  const { updatedAt, updatedBy, ...policy } = useLabPolicy(labId);
  const updated = updatedAt
    ? `Last changed by ${updatedBy ?? 'a former member'} on ${formatDateTime(updatedAt)}.`
    : 'The defaults apply; nobody has changed the policy yet.';
  return (
    <>
      <title>Lab policy · Dilutrace</title>
      <PageHeader
        title="Lab policy"
        description={`How every budget in ${labName} states its uncertainty. ${editable ? 'A change applies to budgets computed after it; stored budgets keep theirs.' : 'Quality assurance sets it.'}`}
      />
      <p className="mb-6 text-sm text-muted">{updated}</p>
      {editable ? <PolicyForm labId={labId} policy={policy} /> : <PolicySummary policy={policy} />}
    </>
  );
}
