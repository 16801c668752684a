import type { QueryClient } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { ROLE_LABELS } from '../../../../shared/contracts/roles';
import { NotPermitted } from '../../../components/errors/not-permitted';
import { Alert } from '../../../components/ui/alert';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { equipmentItemQueryOptions, useEquipmentItem } from '../../../lib/api/lab-equipment';
import { equipmentTemplatesQueryOptions } from '../../../features/library/api/get-equipment-templates';
import { EquipmentForm } from '../../../features/library/components/equipment-form';
import { singularOf } from '../../../features/library/utils/equipment-kinds';
import { activeMembership, activeRoles, can } from '../../../lib/authorization';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    const itemId = Number(params.itemId);
    if (me?.activeLabId && can(activeRoles(me), 'keepLibrary') && Number.isInteger(itemId)) {
      await Promise.all([
        queryClient.ensureQueryData(equipmentItemQueryOptions(me.activeLabId, itemId)),
        queryClient.ensureQueryData(equipmentTemplatesQueryOptions(me.activeLabId)),
      ]);
    }
    return null;
  };

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  const itemId = Number(useParams().itemId);
  if (!membership || !can(membership.roles, 'keepLibrary')) {
    return (
      <>
        <title>Edit item · Dilutrace</title>
        <NotPermitted title="Edit item" neededRole={ROLE_LABELS.qa} />
      </>
    );
  }
  return <EditPage labId={membership.id} itemId={itemId} />;
}

function EditPage({ labId, itemId }: { labId: number; itemId: number }) {
  const item = useEquipmentItem(labId, itemId);
  return (
    <>
      <title>{`Edit ${item.code} · Dilutrace`}</title>
      <p className="mb-2">
        <Link to={paths.app.libraryItem.href(item.id)}>← Back to {item.code}</Link>
      </p>
      <PageHeader
        title={`Edit ${item.code}`}
        description={`Saving makes revision ${item.current.number + 1} of this ${singularOf(item.kind)}; revision ${item.current.number} and the budgets that used it stay as they were.`}
      />
      {item.status === 'retired' ? (
        <Alert tone="info" title="Retired">
          {item.code} is retired; its record can be read but not changed.
        </Alert>
      ) : (
        <EquipmentForm labId={labId} kind={item.kind} item={item} />
      )}
    </>
  );
}
