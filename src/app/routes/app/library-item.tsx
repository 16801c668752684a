import type { QueryClient } from '@tanstack/react-query';
import { Link, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { Card } from '../../../components/ui/card';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { equipmentItemQueryOptions, useEquipmentItem } from '../../../lib/api/lab-equipment';
import { CertificateList } from '../../../features/library/components/certificate-list';
import { CertificateUpload } from '../../../features/library/components/certificate-upload';
import { HazardCaution } from '../../../components/hazard-caution';
import { ItemDataList } from '../../../features/library/components/item-data-list';
import { ItemStatusBadges } from '../../../features/library/components/item-status-badges';
import { MinimumWeightNote } from '../../../features/library/components/minimum-weight-note';
import { RetireItemButton } from '../../../features/library/components/retire-item-button';
import { RevisionHistory } from '../../../features/library/components/revision-history';
import { singularOf } from '../../../features/library/utils/equipment-kinds';
import { activeMembership, can } from '../../../lib/authorization';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    const itemId = Number(params.itemId);
    if (me?.activeLabId && Number.isInteger(itemId))
      await queryClient.fetchQuery(equipmentItemQueryOptions(me.activeLabId, itemId));
    return null;
  };

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  const itemId = Number(useParams().itemId);
  if (!membership) {
    return (
      <Alert tone="info" title="No lab yet">
        The library belongs to a lab. A lab administrator can invite you by e-mail.
      </Alert>
    );
  }
  return <ItemPage labId={membership.id} itemId={itemId} keeper={can(membership.roles, 'keepLibrary')} />;
}

function ItemPage({ labId, itemId, keeper }: { labId: number; itemId: number; keeper: boolean }) {
  const item = useEquipmentItem(labId, itemId);
  const [searchParams] = useSearchParams();
  const openRevision = Number(searchParams.get('revision')) || null;
  const data = item.current.data;
  const hazardNotes = typeof data.hazardNotes === 'string' ? data.hazardNotes.trim() : '';
  const heading = [data.name, data.description].find(
    (value): value is string => typeof value === 'string' && value !== '',
  );
  const active = item.status === 'active';

  return (
    <>
      <title>{`${item.code} · Library · Dilutrace`}</title>
      <p className="mb-2">
        <Link to={paths.app.library.href({ kind: item.kind })}>← Back to the library</Link>
      </p>
      <PageHeader
        title={item.code}
        description={`${singularOf(item.kind)[0].toUpperCase()}${singularOf(item.kind).slice(1)}${heading ? ` · ${heading}` : ''}`}
        actions={
          keeper && active ? (
            <>
              <Link
                to={paths.app.libraryItemEdit.href(item.id)}
                className="rounded-md border border-ink bg-ink px-4 py-2 font-semibold text-paper no-underline hover:bg-ink-soft"
              >
                Edit
              </Link>
              <RetireItemButton labId={labId} item={item} />
            </>
          ) : undefined
        }
      />
      <div className="mb-6 flex flex-col gap-3">
        <ItemStatusBadges item={item} />
        {item.flags.length > 0 ? (
          <ul className="list-disc pl-5">
            {item.flags.map((flag) => (
              <li key={flag}>{flag}</li>
            ))}
          </ul>
        ) : null}
        <HazardCaution title="Caution: hazardous material" entries={[{ key: 0, notes: hazardNotes }]} />
      </div>
      <div className="mb-10 grid items-start gap-6 lg:grid-cols-[1fr_22rem]">
        <Card title={`Current data · revision ${item.current.number}`}>
          {item.minimumWeightG !== null ? (
            <div className="mb-4">
              <MinimumWeightNote minimumWeightG={item.minimumWeightG} />
            </div>
          ) : null}
          <ItemDataList kind={item.kind} data={data} />
        </Card>
        <Card title="Certificates">
          <CertificateList labId={labId} certificates={item.certificates} />
          {keeper && active ? (
            <CertificateUpload labId={labId} itemId={item.id} revisionNumber={item.current.number} />
          ) : null}
        </Card>
      </div>
      <RevisionHistory itemId={item.id} kind={item.kind} revisions={item.revisions} openNumber={openRevision} />
    </>
  );
}
