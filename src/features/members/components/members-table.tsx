import { createColumnHelper, tableFeatures, useTable } from '@tanstack/react-table';
import { useMemo } from 'react';
import type { Member } from '../../../../shared/contracts/members';
import { Badge } from '../../../components/ui/badge';
import { formatDate } from '../../../lib/format-date';
import { RemoveMemberCell } from './remove-member-cell';
import { MemberRolesCell } from './member-roles-cell';

const features = tableFeatures({});
const column = createColumnHelper<typeof features, Member>();

type MembersTableProps = { labId: number; labName: string; members: Member[]; currentUserId: number };

export function MembersTable({ labId, labName, members, currentUserId }: MembersTableProps) {
  const columns = useMemo(
    () =>
      column.columns([
        column.accessor('name', {
          header: 'Name',
          cell: (info) => (
            <div>
              <div className="font-semibold">{info.getValue()}</div>
              <div className="text-sm break-all text-muted">{info.row.original.email}</div>
            </div>
          ),
        }),
        column.accessor('roles', {
          header: 'Roles',
          cell: (info) => <MemberRolesCell labId={labId} member={info.row.original} />,
        }),
        column.accessor('active', {
          header: 'Status',
          // The account's status everywhere: only the instance operator disables an account.
          cell: (info) =>
            info.getValue() ? <Badge tone="ok">Active</Badge> : <Badge tone="caution">Account disabled</Badge>,
        }),
        column.accessor('joinedAt', {
          header: 'Joined',
          cell: (info) => (
            <time dateTime={info.getValue()} className="whitespace-nowrap">
              {formatDate(info.getValue())}
            </time>
          ),
        }),
        column.display({
          id: 'removal',
          header: () => <span className="sr-only">Membership</span>,
          cell: (info) => (
            <RemoveMemberCell
              labId={labId}
              labName={labName}
              member={info.row.original}
              isCurrentUser={info.row.original.userId === currentUserId}
            />
          ),
        }),
      ]),
    [labId, labName, currentUserId],
  );
  const table = useTable({ features, columns, data: members, getRowId: (member) => String(member.userId) });

  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-surface">
      <table className="w-full text-left">
        <caption className="sr-only">Members of {labName}</caption>
        <thead className="border-b border-line bg-paper text-sm text-muted">
          {table.getHeaderGroups().map((headerGroup) => (
            <tr key={headerGroup.id}>
              {headerGroup.headers.map((header) => (
                <th key={header.id} scope="col" className="px-4 py-3 font-semibold">
                  {header.isPlaceholder ? null : <table.FlexRender header={header} />}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-line last:border-b-0 align-top">
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className="px-4 py-3">
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
