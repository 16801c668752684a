import type { QueryClient } from '@tanstack/react-query';
import { Link, useSearchParams } from 'react-router';
import { ROLE_LABELS } from '../../../../shared/contracts/roles';
import { NotPermitted } from '../../../components/errors/not-permitted';
import { Card } from '../../../components/ui/card';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { csvColumnsQueryOptions, csvTemplateUrl, useCsvColumns } from '../../../features/library/api/get-csv-columns';
import { CsvColumnList } from '../../../features/library/components/csv-column-list';
import { CsvImportForm } from '../../../features/library/components/csv-import-form';
import { KIND_TABS, kindFromSearch } from '../../../features/library/utils/equipment-kinds';
import { activeMembership, activeRoles, can } from '../../../lib/authorization';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (me?.activeLabId && can(activeRoles(me), 'keepLibrary'))
    await queryClient.ensureQueryData(csvColumnsQueryOptions(me.activeLabId));
  return null;
};

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  if (!membership || !can(membership.roles, 'keepLibrary')) {
    return (
      <>
        <title>Import CSV · Dilutrace</title>
        <NotPermitted title="Import CSV" neededRole={ROLE_LABELS.qa} />
      </>
    );
  }
  return <ImportPage labId={membership.id} />;
}

function ImportPage({ labId }: { labId: number }) {
  const [searchParams] = useSearchParams();
  const kind = kindFromSearch(searchParams.get('kind'));
  const columns = useCsvColumns(labId)[kind];
  const tab = KIND_TABS.find((each) => each.kind === kind) ?? KIND_TABS[0];
  return (
    <>
      <title>{`Import ${tab.label.toLowerCase()} · Dilutrace`}</title>
      <p className="mb-2">
        <Link to={paths.app.library.href({ kind })}>← Back to the library</Link>
      </p>
      <PageHeader
        title={`Import ${tab.label.toLowerCase()} from CSV`}
        description="One row per item. A row whose ID is new adds an item; a row with an existing ID makes a new revision of it. The file is checked first and imported only when every row is correct."
      />
      <div className="grid items-start gap-6 lg:grid-cols-[1fr_24rem]">
        <CsvImportForm key={kind} labId={labId} kind={kind} />
        <Card title={`Columns for ${tab.label.toLowerCase()}`}>
          <p className="mb-3 text-sm">
            The first line names the columns; their order is free. Numbers take a decimal point (a decimal comma only
            inside a quoted cell); dates are YYYY-MM-DD.{' '}
            <a href={csvTemplateUrl(labId, kind)} download>
              Download an empty template
            </a>
            .
          </p>
          <CsvColumnList columns={columns} />
        </Card>
      </div>
    </>
  );
}
