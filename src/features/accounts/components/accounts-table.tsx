import type { OperatorAccount } from '../../../../shared/contracts/operator';
import { Badge } from '../../../components/ui/badge';
import { AccountStatusCell } from './account-status-cell';

/** Every account on the instance: who, which labs, whether it may sign in. */
export function AccountsTable({ accounts, currentUserId }: { accounts: OperatorAccount[]; currentUserId: number }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-surface">
      <table className="w-full text-left">
        <caption className="sr-only">Accounts on this Dilutrace instance</caption>
        <thead className="border-b border-line bg-paper text-sm text-muted">
          <tr>
            <th scope="col" className="px-4 py-3 font-semibold">
              Name
            </th>
            <th scope="col" className="px-4 py-3 font-semibold">
              Labs
            </th>
            <th scope="col" className="px-4 py-3 font-semibold">
              Status
            </th>
            <th scope="col" className="px-4 py-3 font-semibold">
              <span className="sr-only">Change</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {accounts.map((account) => (
            <tr key={account.id} className="border-b border-line last:border-b-0 align-top">
              <td className="px-4 py-3">
                <div className="font-semibold">{account.name}</div>
                <div className="text-sm break-all text-muted">{account.email}</div>
              </td>
              <td className="px-4 py-3">
                {account.labs.length > 0 ? account.labs.join(', ') : <span className="text-muted">No lab</span>}
              </td>
              <td className="px-4 py-3">
                <span className="flex flex-wrap gap-2">
                  {account.active ? <Badge tone="ok">Active</Badge> : <Badge tone="caution">Disabled</Badge>}
                  {account.operator ? <Badge tone="accent">Operator</Badge> : null}
                </span>
              </td>
              <td className="px-4 py-3">
                <AccountStatusCell account={account} isCurrentUser={account.id === currentUserId} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
