import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useLocation, useNavigate, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import type { EquipmentItem, LabPolicy } from '../../../../shared/contracts/library';
import type { PreparationDetail } from '../../../../shared/contracts/preparations';
import { snapshotStepNamer } from '../../../../shared/contracts/step-kinds';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { paths } from '../../../config/paths';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { useDuplicatePreparation } from '../../../features/preparations/api/duplicate-preparation';
import { activeEquipmentQueryOptions, useActiveEquipment } from '../../../lib/api/lab-equipment';
import { labPolicyQueryOptions, useLabPolicy } from '../../../lib/api/lab-policy';
import { saveDraft } from '../../../features/preparations/api/save-draft';
import { Workspace, writeOf } from '../../../features/preparations/components/workspace';
import { WorkspaceHeader } from '../../../features/preparations/components/workspace-header';
import { draftFromPlan, type PlanDraft } from '../../../features/preparations/utils/plan-draft';
import { BenchReadings } from '../../../features/records/components/bench-readings';
import { StartNewVersionButton } from '../../../features/records/components/start-new-version-button';
import { preparationQueryOptions, usePreparation, usePreparationChanged } from '../../../lib/api/preparation';
import { activeMembership, can } from '../../../lib/authorization';
import { idFromParam } from '../../../lib/route-params';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    const id = idFromParam(params.preparationId);
    if (me?.activeLabId && id) {
      await Promise.all([
        queryClient.ensureQueryData(preparationQueryOptions(me.activeLabId, id)),
        queryClient.ensureQueryData(activeEquipmentQueryOptions(me.activeLabId)),
        queryClient.ensureQueryData(labPolicyQueryOptions(me.activeLabId)),
      ]);
    }
    return null;
  };

/**
 * What the new-preparation page hands over when its first save created this preparation: the draft as typed
 * meanwhile. Used only while the server still holds that first save (history state survives a reload).
 */
type HandOver = { preparationId: number; updatedAt: string; draft: PlanDraft; savedKey: string };

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  const id = idFromParam(useParams().preparationId);
  if (!membership || !id) {
    return (
      <>
        <title>Preparation · Dilutrace</title>
        <Alert tone="info" title="No such preparation">
          Open a preparation from the list of your lab’s preparations.
        </Alert>
      </>
    );
  }
  return (
    <PreparationPage labId={membership.id} preparationId={id} planner={can(membership.roles, 'planPreparations')} />
  );
}

function PreparationPage({
  labId,
  preparationId,
  planner,
}: {
  labId: number;
  preparationId: number;
  planner: boolean;
}) {
  const detail = usePreparation(labId, preparationId);
  const library = useActiveEquipment(labId);
  const policy = useLabPolicy(labId, { live: true });
  // A new version or another preparation starts the workspace afresh from the server's plan.
  return (
    <PreparationWorkspace
      key={`${detail.id}-${detail.current.number}-${detail.current.status}`}
      labId={labId}
      detail={detail}
      library={library}
      policy={policy}
      planner={planner}
    />
  );
}

type PreparationWorkspaceProps = {
  labId: number;
  detail: PreparationDetail;
  library: EquipmentItem[];
  policy: LabPolicy;
  planner: boolean;
};

function PreparationWorkspace({ labId, detail, library, policy, planner }: PreparationWorkspaceProps) {
  const location = useLocation();
  const navigate = useNavigate();
  const preparationChanged = usePreparationChanged(labId);
  const [searchParams] = useSearchParams();
  const variantOf = idFromParam(searchParams.get('variantOf') ?? undefined);
  const duplicate = useDuplicatePreparation(labId, detail.id);
  const version = detail.current;
  const allowed = version.allowedActions;
  const editable = allowed.edit;

  // The workspace reads the plan once, when it opens; from then on it owns the draft.
  const [{ initialDraft, savedKey }] = useState(() => {
    const handOver = location.state as HandOver | null;
    if (handOver?.preparationId === detail.id && handOver.updatedAt === version.updatedAt)
      return { initialDraft: handOver.draft, savedKey: handOver.savedKey };
    const fromServer = draftFromPlan(version.plan, {
      title: detail.title,
      overrides: version.overrides,
      seed: version.seed,
    });
    const libraryById = new Map(library.map((item) => [String(item.id), item]));
    return { initialDraft: fromServer, savedKey: JSON.stringify(writeOf(fromServer, libraryById).write) };
  });
  const stored = !editable && version.snapshot ? version.snapshot : null;

  const note = duplicate.error ? (
    <Alert tone="danger">{duplicate.error.message}</Alert>
  ) : version.status === 'prepared' ? (
    <Alert tone="info" title={`Version ${version.number} has been prepared`}>
      <p>
        The masses weighed at the bench are recorded and the result below is computed on them, so the plan no longer
        changes.
        {allowed.recordReadings ? ' Until it is submitted for review you can still correct the readings.' : ''}
      </p>
      {allowed.recordReadings ? (
        <p className="mt-1 flex flex-wrap gap-x-4">
          <Link to={paths.app.benchSheet.href(detail.id)}>Correct the readings on the bench sheet</Link>
          <Link to={paths.app.record.href(detail.id, version.number)}>Submit it for review from the record page</Link>
        </p>
      ) : null}
    </Alert>
  ) : allowed.withdraw ? (
    <Alert tone="info" title={`Version ${version.number} is waiting for review`}>
      The plan cannot change while it waits for review.{' '}
      <Link to={paths.app.record.href(detail.id, version.number)}>Withdraw it from review on the record page</Link> to
      correct it before QA decides.
    </Alert>
  ) : !editable ? (
    <Alert tone="info">
      {!version.editable
        ? `Version ${version.number} is ${version.status} and cannot change.${allowed.startNewVersion ? ' Start a new version to change the plan.' : ''}`
        : planner
          ? `Only ${detail.createdBy} can change this draft. Duplicate it to make your own variant.`
          : 'You can read this preparation; analysts plan and change preparations.'}
    </Alert>
  ) : null;
  const readings =
    version.readings && version.snapshot ? (
      <BenchReadings
        readings={version.readings}
        stepName={snapshotStepNamer(version.snapshot)}
        plan={version.snapshot.plan}
      />
    ) : null;

  return (
    <>
      <title>{`${detail.title} · Dilutrace`}</title>
      <Workspace
        initialDraft={initialDraft}
        savedKey={savedKey}
        library={library}
        policy={policy}
        editable={editable}
        stored={stored}
        readings={readings}
        save={(write) => saveDraft(labId, detail.id, version.number, write)}
        onSaved={(saved) => {
          // Whoever opens this preparation next (the list, the bench sheet, this page again) reads what was saved.
          void preparationChanged(saved);
        }}
        header={(saveLine, draft) => (
          <WorkspaceHeader
            title={draft.title.trim() || detail.title}
            status={version.status}
            versionNumber={version.number}
            saveLine={saveLine}
            note={note}
            actions={
              <>
                {variantOf ? (
                  <Link
                    to={paths.app.compare.href([variantOf, detail.id])}
                    className="rounded-md border border-line-strong bg-surface px-4 py-2 font-semibold text-ink no-underline hover:bg-paper"
                  >
                    Compare with the original
                  </Link>
                ) : null}
                <Link
                  to={paths.app.benchSheet.href(detail.id)}
                  className="rounded-md border border-line-strong bg-surface px-4 py-2 font-semibold text-ink no-underline hover:bg-paper"
                >
                  Bench sheet
                </Link>
                {planner ? (
                  <Button
                    variant="secondary"
                    pending={duplicate.isPending}
                    pendingLabel="Duplicating…"
                    onClick={() =>
                      duplicate.mutate(undefined, {
                        onSuccess: (copy) => navigate(paths.app.preparation.href(copy.id, detail.id)),
                      })
                    }
                  >
                    Duplicate as a variant
                  </Button>
                ) : null}
                {allowed.startNewVersion ? <StartNewVersionButton labId={labId} preparationId={detail.id} /> : null}
              </>
            }
          />
        )}
      />
    </>
  );
}
