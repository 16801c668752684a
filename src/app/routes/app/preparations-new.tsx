import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate } from 'react-router';
import { ROLE_LABELS } from '../../../../shared/contracts/roles';
import { NotPermitted } from '../../../components/errors/not-permitted';
import { paths } from '../../../config/paths';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { useCreatePreparation } from '../../../features/preparations/api/create-preparation';
import { activeEquipmentQueryOptions, useActiveEquipment } from '../../../lib/api/lab-equipment';
import { labPolicyQueryOptions, useLabPolicy } from '../../../lib/api/lab-policy';
import { Workspace } from '../../../features/preparations/components/workspace';
import { WorkspaceHeader } from '../../../features/preparations/components/workspace-header';
import { emptyDraft } from '../../../features/preparations/utils/plan-draft';
import { activeMembership, can } from '../../../lib/authorization';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (me?.activeLabId) {
    await Promise.all([
      queryClient.ensureQueryData(activeEquipmentQueryOptions(me.activeLabId)),
      queryClient.ensureQueryData(labPolicyQueryOptions(me.activeLabId)),
    ]);
  }
  return null;
};

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  if (!membership || !can(membership.roles, 'planPreparations')) {
    return (
      <>
        <title>New preparation · Dilutrace</title>
        <NotPermitted title="New preparation" neededRole={ROLE_LABELS.analyst} />
      </>
    );
  }
  return <NewPreparation labId={membership.id} />;
}

/** A new plan: nothing is stored until it has a title and a material; the first autosave creates it and opens its own page. */
function NewPreparation({ labId }: { labId: number }) {
  const library = useActiveEquipment(labId);
  const policy = useLabPolicy(labId);
  const create = useCreatePreparation(labId);
  const navigate = useNavigate();
  const [initialDraft] = useState(() => emptyDraft());
  return (
    <>
      <title>New preparation · Dilutrace</title>
      <Workspace
        initialDraft={initialDraft}
        savedKey={null}
        library={library}
        policy={policy}
        editable
        stored={null}
        save={(write) => create.mutateAsync(write)}
        onSaved={(detail, draft, savedKey) =>
          navigate(paths.app.preparation.href(detail.id), {
            replace: true,
            state: { preparationId: detail.id, updatedAt: detail.current.updatedAt, draft, savedKey },
          })
        }
        header={(saveLine, draft) => (
          <WorkspaceHeader
            title={draft.title.trim() || 'New preparation'}
            status={null}
            versionNumber={null}
            saveLine={saveLine}
            actions={null}
          />
        )}
      />
    </>
  );
}
