import type { QueryClient } from '@tanstack/react-query';
import { Link, useSearchParams } from 'react-router';
import { ROLE_LABELS } from '../../../../shared/contracts/roles';
import { NotPermitted } from '../../../components/errors/not-permitted';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { equipmentTemplatesQueryOptions } from '../../../features/library/api/get-equipment-templates';
import { EquipmentForm } from '../../../features/library/components/equipment-form';
import { kindFromSearch, singularOf } from '../../../features/library/utils/equipment-kinds';
import { activeMembership, activeRoles, can } from '../../../lib/authorization';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (me?.activeLabId && can(activeRoles(me), 'keepLibrary'))
    await queryClient.ensureQueryData(equipmentTemplatesQueryOptions(me.activeLabId));
  return null;
};

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  const [searchParams] = useSearchParams();
  const kind = kindFromSearch(searchParams.get('kind'));
  const title = `Add a ${singularOf(kind)}`;
  if (!membership || !can(membership.roles, 'keepLibrary')) {
    return (
      <>
        <title>{`${title} · Dilutrace`}</title>
        <NotPermitted title={title} neededRole={ROLE_LABELS.qa} />
      </>
    );
  }
  return (
    <>
      <title>{`${title} · Dilutrace`}</title>
      <p className="mb-2">
        <Link to={paths.app.library.href({ kind })}>← Back to the library</Link>
      </p>
      <PageHeader
        title={title}
        description="It becomes revision 1 of the item. Later changes make new revisions; budgets keep the revision they used."
      />
      <EquipmentForm key={kind} labId={membership.id} kind={kind} />
    </>
  );
}
