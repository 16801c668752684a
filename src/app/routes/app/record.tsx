import { resultStatement } from '../../../../shared/uncertainty';
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Link, useNavigate, useParams, useRouteError, type LoaderFunctionArgs } from 'react-router';
import type { PreparationDetail, VersionDetail } from '../../../../shared/contracts/preparations';
import type { Role } from '../../../../shared/contracts/roles';
import { snapshotStepNamer } from '../../../../shared/contracts/step-kinds';
import { Alert } from '../../../components/ui/alert';
import { paths } from '../../../config/paths';
import { auditKeys } from '../../../features/audit/api/audit-keys';
import { auditEventsQueryOptions, preparationHistoryQuery } from '../../../features/audit/api/get-audit-events';
import { RecordAuditHistory } from '../../../features/audit/components/record-audit-history';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { recordsKeys } from '../../../features/records/api/records-keys';
import { BenchReadings } from '../../../features/records/components/bench-readings';
import { BudgetSummary } from '../../../features/records/components/budget-summary';
import { EquipmentUsed } from '../../../features/records/components/equipment-used';
import { HazardCaution } from '../../../components/hazard-caution';
import { MonteCarloVerdict } from '../../../features/records/components/monte-carlo-verdict';
import { RecordDownloads } from '../../../features/records/components/record-downloads';
import { RecordHeader } from '../../../features/records/components/record-header';
import { RecordedWarnings } from '../../../features/records/components/recorded-warnings';
import { ResultStatementPanel } from '../../../features/records/components/result-statement-panel';
import { ReturnNotice } from '../../../features/records/components/return-notice';
import { ReviewTrail } from '../../../features/records/components/review-trail';
import { SnapshotHash } from '../../../features/records/components/snapshot-hash';
import { StartNewVersionButton } from '../../../features/records/components/start-new-version-button';
import { VersionSwitcher } from '../../../features/records/components/version-switcher';
import { ApproveButton } from '../../../features/reviews/components/approve-button';
import { ReturnButton } from '../../../features/reviews/components/return-button';
import { SubmitForReviewButton } from '../../../features/reviews/components/submit-for-review-button';
import { WithdrawFromReviewButton } from '../../../features/reviews/components/withdraw-from-review-button';
import { isApiError } from '../../../lib/api-error';
import {
  preparationQueryOptions,
  usePreparation,
  usePreparationChanged,
  useVersion,
  versionQueryOptions,
} from '../../../lib/api/preparation';
import { activeMembership, activeRoles, can } from '../../../lib/authorization';
import { idFromParam } from '../../../lib/route-params';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    const preparationId = idFromParam(params.preparationId);
    const versionNumber = idFromParam(params.versionNumber);
    if (me?.activeLabId && preparationId && versionNumber) {
      const labId = me.activeLabId;
      // fetchQuery: a record changed by someone else since it was last read is read again before showing.
      await Promise.all([
        queryClient.fetchQuery({ ...preparationQueryOptions(labId, preparationId), staleTime: 0 }),
        queryClient.fetchQuery(versionQueryOptions(labId, preparationId, versionNumber)),
        can(activeRoles(me), 'readAuditTrail')
          ? queryClient.fetchQuery(auditEventsQueryOptions(labId, preparationHistoryQuery(preparationId)))
          : null,
      ]);
    }
    return null;
  };

export function ErrorBoundary() {
  const error = useRouteError();
  return (
    <>
      <title>Record · Dilutrace</title>
      <h1 className="mb-6 text-3xl font-bold">Preparation record</h1>
      <Alert tone={isApiError(error) && error.status === 404 ? 'info' : 'danger'} title="This record cannot be shown">
        <p>{isApiError(error) ? error.message : 'Something went wrong while reading the record.'}</p>
        <p className="mt-2">
          <Link to={paths.app.records.href()}>Go to the approved records</Link>
        </p>
      </Alert>
    </>
  );
}

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  const params = useParams();
  const preparationId = idFromParam(params.preparationId);
  const versionNumber = idFromParam(params.versionNumber);
  if (!membership || !preparationId || !versionNumber) {
    return (
      <>
        <title>Record · Dilutrace</title>
        <Alert tone="info" title="No such record">
          Open a record from the approved records or the review queue.
        </Alert>
      </>
    );
  }
  return (
    <RecordPage
      labId={membership.id}
      preparationId={preparationId}
      versionNumber={versionNumber}
      roles={membership.roles}
    />
  );
}

type RecordPageProps = {
  labId: number;
  preparationId: number;
  versionNumber: number;
  roles: readonly Role[];
};

function RecordPage({ labId, preparationId, versionNumber, roles }: RecordPageProps) {
  const preparation = usePreparation(labId, preparationId);
  const version = useVersion(labId, preparationId, versionNumber);
  const snapshot = version.snapshot;
  const stepName = snapshot ? snapshotStepNamer(snapshot) : (key: string) => key;
  const reference = { labId, preparationId, versionNumber };

  return (
    <>
      <title>{`${version.approvedAs?.title ?? preparation.title} · v${version.number} · Dilutrace`}</title>
      <p className="mb-2">
        <BackLink
          approved={version.status === 'approved'}
          reviewing={version.allowedActions.review || version.allowedActions.reviewRefusal !== null}
        />
      </p>
      <RecordHeader
        preparation={preparation}
        version={version}
        actions={
          <>
            <Link
              to={paths.app.preparation.href(preparationId)}
              className="rounded-md border border-line-strong bg-surface px-4 py-2 font-semibold text-ink no-underline hover:bg-paper"
            >
              Open in the planner
            </Link>
            <RecordActions labId={labId} preparation={preparation} version={version} />
          </>
        }
      />
      <VersionSwitcher
        versions={preparation.versions}
        current={version.number}
        hrefOf={(number) => paths.app.record.href(preparationId, number)}
      />
      <div className="flex flex-col gap-6">
        <ReturnNotice version={version} />
        {snapshot ? (
          <HazardCaution
            title="Caution: hazardous materials"
            entries={snapshot.items.map((item) => ({ key: item.revisionId, code: item.code, notes: item.hazardNotes }))}
          />
        ) : null}
        {snapshot ? (
          <ResultStatementPanel snapshot={snapshot} />
        ) : (
          <Alert tone="info" title="Not computed">
            {version.problem
              ? `The plan cannot be computed yet: ${version.problem.message}`
              : 'This version has no computed budget yet.'}{' '}
            Open it in the planner to fix it.
          </Alert>
        )}
        {snapshot ? <RecordedWarnings warnings={snapshot.warnings} /> : null}
        <div className="grid items-start gap-6 lg:grid-cols-[1fr_22rem]">
          <div className="flex min-w-0 flex-col gap-8">
            {snapshot ? <BudgetSummary budget={snapshot.budget} stepName={stepName} /> : null}
            {snapshot && version.readings ? (
              <BenchReadings readings={version.readings} stepName={stepName} plan={snapshot.plan} />
            ) : null}
            {snapshot ? <EquipmentUsed items={snapshot.items} /> : null}
            <ReviewTrail reviews={version.reviews} />
          </div>
          <div className="flex flex-col gap-6">
            {snapshot ? (
              <MonteCarloVerdict
                monteCarlo={snapshot.monteCarlo}
                validation={snapshot.validation}
                unit={snapshot.budget.unit}
                statesMonteCarlo={resultStatement(snapshot).method === 'monteCarlo'}
              />
            ) : null}
            {version.snapshotSha256 ? <SnapshotHash {...reference} sha256={version.snapshotSha256} /> : null}
            {snapshot ? <RecordDownloads {...reference} approved={version.status === 'approved'} /> : null}
          </div>
        </div>
        {can(roles, 'readAuditTrail') ? <RecordAuditHistory labId={labId} preparationId={preparationId} /> : null}
      </div>
    </>
  );
}

/** Back to where such a record is usually opened from: the approved records, the review queue or the preparations. */
function BackLink({ approved, reviewing }: { approved: boolean; reviewing: boolean }) {
  if (approved) return <Link to={paths.app.records.href()}>← Approved records</Link>;
  if (reviewing) return <Link to={paths.app.reviewQueue.href()}>← Review queue</Link>;
  return <Link to={paths.app.preparations.href()}>← Preparations</Link>;
}

type RecordActionsProps = {
  labId: number;
  preparation: PreparationDetail;
  version: VersionDetail;
};

/** Only the actions the server allows the viewer (`allowedActions`); an auditor gets none. */
function RecordActions({ labId, preparation, version }: RecordActionsProps) {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const preparationChanged = usePreparationChanged(labId);
  const reference = { labId, preparationId: preparation.id, versionNumber: version.number };
  // A review action changes the version's status and trail, the approved records and the audit trail.
  const onReviewed = async (detail: PreparationDetail) => {
    await Promise.all([
      preparationChanged(detail),
      queryClient.invalidateQueries({ queryKey: recordsKeys.approvedLists(labId) }),
      queryClient.invalidateQueries({ queryKey: auditKeys.lab(labId) }),
    ]);
  };
  const allowed = version.allowedActions;
  const actions: ReactNode[] = [];

  if (allowed.submit) {
    actions.push(<SubmitForReviewButton key="submit" version={reference} onReviewed={onReviewed} />);
  }
  if (allowed.withdraw) {
    actions.push(<WithdrawFromReviewButton key="withdraw" version={reference} onReviewed={onReviewed} />);
  }
  if (allowed.reviewRefusal) {
    actions.push(
      <p key="own" className="max-w-xs text-sm text-muted">
        {allowed.reviewRefusal}
      </p>,
    );
  }
  if (allowed.review) {
    actions.push(
      <ReturnButton key="return" version={reference} onReviewed={onReviewed} />,
      <ApproveButton key="approve" version={reference} onReviewed={onReviewed} />,
    );
  }
  if (allowed.startNewVersion) {
    actions.push(
      <StartNewVersionButton
        key="new"
        labId={labId}
        preparationId={preparation.id}
        onStarted={() => navigate(paths.app.preparation.href(preparation.id))}
      />,
    );
  }
  return <>{actions}</>;
}
