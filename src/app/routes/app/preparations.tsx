import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { preparationStatusSchema } from '../../../../shared/contracts/preparations';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { meQueryOptions, useSignedInMe } from '../../../features/auth/api/get-me';
import { activeEquipmentQueryOptions, useActiveEquipment } from '../../../lib/api/lab-equipment';
import { preparationsQueryOptions, usePreparations } from '../../../features/preparations/api/get-preparations';
import type { PreparationListFilter } from '../../../../shared/contracts/preparations';
import { PreparationsFilters } from '../../../features/preparations/components/preparations-filters';
import { PreparationsTable } from '../../../features/preparations/components/preparations-table';
import { activeMembership, can } from '../../../lib/authorization';

/** The list filters read from the address (unknown values are ignored). */
function filterFrom(search: URLSearchParams): PreparationListFilter {
  const status = preparationStatusSchema.safeParse(search.get('status'));
  const analyst = Number(search.get('analyst'));
  const date = (name: string) =>
    /^\d{4}-\d{2}-\d{2}$/.test(search.get(name) ?? '') ? (search.get(name) as string) : undefined;
  return {
    status: status.success ? status.data : undefined,
    analyst: Number.isInteger(analyst) && analyst > 0 ? analyst : undefined,
    material: search.get('material') || undefined,
    from: date('from'),
    to: date('to'),
    q: search.get('q') || undefined,
  };
}

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (me?.activeLabId) {
      const filter = filterFrom(new URL(request.url).searchParams);
      await Promise.all([
        queryClient.ensureQueryData(preparationsQueryOptions(me.activeLabId, filter)),
        queryClient.ensureQueryData(preparationsQueryOptions(me.activeLabId, {})),
        queryClient.ensureQueryData(activeEquipmentQueryOptions(me.activeLabId)),
      ]);
    }
    return null;
  };

export function Component() {
  const me = useSignedInMe();
  const membership = activeMembership(me);
  if (!membership) {
    return (
      <>
        <title>Preparations · Dilutrace</title>
        <PageHeader title="Preparations" />
        <Alert tone="info" title="No lab yet">
          Preparations belong to a lab. A lab administrator can invite you by e-mail.
        </Alert>
      </>
    );
  }
  return <PreparationsPage labId={membership.id} planner={can(membership.roles, 'planPreparations')} />;
}

function PreparationsPage({ labId, planner }: { labId: number; planner: boolean }) {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const filter = filterFrom(searchParams);
  const preparations = usePreparations(labId, filter);
  const everyone = usePreparations(labId, {});
  const library = useActiveEquipment(labId);
  const [selected, setSelected] = useState<number[]>([]);

  const analysts = [...new Map(everyone.map((row) => [row.createdById, row.createdBy])).entries()].map(
    ([id, name]) => ({ id, name }),
  );
  const materialCodes = [
    ...new Set([
      ...library.filter((item) => item.kind.endsWith('-material')).map((item) => item.code),
      ...everyone.flatMap((row) => (row.materialCode ? [row.materialCode] : [])),
    ]),
  ].sort();
  const toggle = (id: number) =>
    setSelected((current) => (current.includes(id) ? current.filter((each) => each !== id) : [...current, id]));

  return (
    <>
      <title>Preparations · Dilutrace</title>
      <PageHeader
        title="Preparations"
        description="Every planned solution of the lab with its latest version. Open one to see its budget; tick two to four to compare them."
        actions={
          planner ? (
            <Link
              to={paths.app.preparationNew.href()}
              className="rounded-md border border-ink bg-ink px-4 py-2 font-semibold text-paper no-underline hover:bg-ink-soft"
            >
              New preparation
            </Link>
          ) : null
        }
      />
      <PreparationsFilters
        filter={filter}
        analysts={analysts}
        materialCodes={materialCodes}
        onChange={(next) => navigate(paths.app.preparations.href(next), { replace: true })}
      />
      <div className="mb-3 flex flex-wrap items-center gap-3">
        <Button
          variant="secondary"
          disabled={selected.length < 2}
          onClick={() => navigate(paths.app.compare.href(selected))}
        >
          Compare selected ({selected.length})
        </Button>
        <span className="text-sm text-muted">
          {selected.length < 2 ? 'Tick two to four preparations to compare them.' : null}
        </span>
      </div>
      <PreparationsTable
        preparations={preparations}
        hrefOf={(id) => paths.app.preparation.href(id)}
        selected={selected}
        onToggle={toggle}
      />
      <p className="mt-2 text-sm text-muted">
        {preparations.length} of {everyone.length} preparations.
      </p>
    </>
  );
}
