import { Link } from 'react-router';
import type { VersionSummary } from '../../../../shared/contracts/preparations';

const STATUS_WORDS: Record<VersionSummary['status'], string> = {
  draft: 'draft',
  prepared: 'prepared (readings recorded)',
  submitted: 'waiting for review',
  approved: 'approved',
  returned: 'returned',
};

type VersionSwitcherProps = { versions: VersionSummary[]; current: number; hrefOf: (versionNumber: number) => string };

/** Links to every version of the preparation, the open one marked; nothing when there is only one. */
export function VersionSwitcher({ versions, current, hrefOf }: VersionSwitcherProps) {
  if (versions.length < 2) return null;
  const ordered = [...versions].sort((a, b) => b.number - a.number);
  return (
    <nav aria-label="Versions" className="mb-6">
      <ul className="flex flex-wrap gap-2">
        {ordered.map((version) => {
          const open = version.number === current;
          return (
            <li key={version.number}>
              <Link
                to={hrefOf(version.number)}
                aria-current={open ? 'page' : undefined}
                className={`block rounded-md border px-3 py-1 text-sm no-underline ${open ? 'border-ink bg-ink font-semibold text-paper' : 'border-line-strong bg-surface text-ink hover:bg-paper'}`}
              >
                Version {version.number} · {STATUS_WORDS[version.status]}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
