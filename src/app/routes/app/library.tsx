import type { QueryClient } from '@tanstack/react-query';
import { Link, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { csvExportUrl } from '../../../features/library/api/get-csv-columns';
import { equipmentListQueryOptions, useEquipmentList } from '../../../lib/api/lab-equipment';
import { EquipmentTable } from '../../../features/library/components/equipment-table';
import { KindTabs } from '../../../features/library/components/kind-tabs';
import { StatusFilter, statusFromSearch } from '../../../features/library/components/status-filter';
import { KIND_TABS, kindFromSearch } from '../../../features/library/utils/equipment-kinds';
import { activeMembership, can } from '../../../lib/authorization';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    const search = new URL(request.url).searchParams;
    if (me?.activeLabId) {
      // fetchQuery, not ensureQueryData: a list marked stale by a change elsewhere is read again before showing.
      await queryClient.fetchQuery(
        equipmentListQueryOptions(me.activeLabId, {
          kind: kindFromSearch(search.get('kind')),
          status: statusFromSearch(search.get('status')),
        }),
      );
    }
    return null;
  };

const ACTION_LINK = 'rounded-md border px-4 py-2 font-semibold no-underline whitespace-nowrap';

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  if (!membership) {
    return (
      <>
        <title>Library · Dilutrace</title>
        <PageHeader title="Tolerance library" />
        <Alert tone="info" title="No lab yet">
          The library belongs to a lab. A lab administrator can invite you by e-mail.
        </Alert>
      </>
    );
  }
  return <LibraryPage labId={membership.id} keeper={can(membership.roles, 'keepLibrary')} />;
}

function LibraryPage({ labId, keeper }: { labId: number; keeper: boolean }) {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const kind = kindFromSearch(searchParams.get('kind'));
  const status = statusFromSearch(searchParams.get('status'));
  const items = useEquipmentList(labId, { kind, status });
  const tab = KIND_TABS.find((each) => each.kind === kind) ?? KIND_TABS[0];
  const plural = tab.label.toLowerCase();
  const caption = { active: `${plural} in use`, retired: `retired ${plural}`, all: plural }[status];

  return (
    <>
      <title>{`${tab.label} · Library · Dilutrace`}</title>
      <PageHeader
        title="Tolerance library"
        description={
          keeper
            ? 'The balances, glassware, pipettes and reference materials budgets rest on. Every change makes a new revision; budgets keep the revision they used.'
            : 'The balances, glassware, pipettes and reference materials budgets rest on. Quality assurance keeps this library; you can read every item and its history.'
        }
      />
      <KindTabs current={kind} status={status} />
      <EquipmentTable
        key={`${kind}-${status}`}
        kind={kind}
        caption={caption}
        items={items}
        toolbar={
          <>
            <StatusFilter
              value={status}
              onChange={(next) =>
                navigate(paths.app.library.href({ kind, status: next === 'active' ? undefined : next }))
              }
            />
            <div className="ml-auto flex flex-wrap gap-2">
              {keeper ? (
                <>
                  <Link
                    to={paths.app.libraryNew.href(kind)}
                    className={`${ACTION_LINK} border-ink bg-ink text-paper hover:bg-ink-soft`}
                  >
                    Add {tab.singular}
                  </Link>
                  <Link
                    to={paths.app.libraryImport.href(kind)}
                    className={`${ACTION_LINK} border-line-strong bg-surface text-ink hover:bg-paper`}
                  >
                    Import CSV
                  </Link>
                </>
              ) : null}
              <a
                href={csvExportUrl(labId, kind)}
                download
                className={`${ACTION_LINK} border-line-strong bg-surface text-ink hover:bg-paper`}
              >
                Export CSV
              </a>
            </div>
          </>
        }
      />
    </>
  );
}
