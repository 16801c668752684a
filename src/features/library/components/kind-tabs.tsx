import { Link } from 'react-router';
import type { EquipmentKind } from '../../../../shared/contracts/library';
import { paths, type EquipmentStatusFilter } from '../../../config/paths';
import { KIND_TABS } from '../utils/equipment-kinds';

/** One link per kind; the open kind is marked as the current page, and the status filter travels along. */
export function KindTabs({ current, status }: { current: EquipmentKind; status: EquipmentStatusFilter }) {
  return (
    <nav aria-label="Kinds of item" className="mb-6 border-b border-line">
      <ul className="-mb-px flex flex-wrap gap-1">
        {KIND_TABS.map((tab) => {
          const active = tab.kind === current;
          return (
            <li key={tab.kind}>
              <Link
                to={paths.app.library.href({ kind: tab.kind, status: status === 'active' ? undefined : status })}
                aria-current={active ? 'page' : undefined}
                className={`block rounded-t-md border px-4 py-2 font-semibold no-underline ${
                  active
                    ? 'border-line border-b-surface bg-surface text-ink'
                    : 'border-transparent text-muted hover:text-ink'
                }`}
              >
                {tab.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
