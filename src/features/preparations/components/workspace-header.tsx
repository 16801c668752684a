import type { ReactNode } from 'react';
import type { PreparationStatus } from '../../../../shared/contracts/preparations';
import { StatusBadge } from './status-badge';

type WorkspaceHeaderProps = {
  title: string;
  status: PreparationStatus | null;
  versionNumber: number | null;
  saveLine: ReactNode;
  actions: ReactNode;
  note?: ReactNode;
};

/** The workspace's h1 with the version, its status, the save state and the actions. */
export function WorkspaceHeader({ title, status, versionNumber, saveLine, actions, note }: WorkspaceHeaderProps) {
  return (
    <header className="mb-6 border-b border-line pb-4">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl font-bold tracking-tight">{title}</h1>
          <div className="mt-1 flex flex-wrap items-center gap-3">
            {status ? <StatusBadge status={status} /> : null}
            {versionNumber ? <span className="text-sm text-muted">Version {versionNumber}</span> : null}
            {saveLine}
          </div>
        </div>
        <div className="flex flex-wrap gap-2">{actions}</div>
      </div>
      {note ? <div className="mt-3">{note}</div> : null}
    </header>
  );
}
