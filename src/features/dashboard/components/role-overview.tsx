import { ROLE_LABELS, ROLES, type Role } from '../../../../shared/contracts/roles';
import { Link } from 'react-router';
import { Badge } from '../../../components/ui/badge';
import { paths } from '../../../config/paths';

/** What each role will find here as Dilutrace grows, said plainly (DESIGN.md §2). */
const COMING_FOR_ROLE: Record<Role, { summary: string; items: string[] }> = {
  analyst: {
    summary: 'Plan how a standard is made and see what limits its uncertainty.',
    items: [
      'Plan a preparation — weighing, stock, dilution steps — and see its uncertainty budget as you type',
      'Compare routes to the same target concentration and pick the one with the lowest expanded uncertainty',
      'Submit a budget for review and print the bench sheet',
    ],
  },
  qa: {
    summary: 'Keep the equipment the budgets rest on, and decide what is approved.',
    items: [
      'The tolerance library: balances, flasks, pipettes and reference materials with their certificates — available now under Library',
      'Lab policy: coverage probability, glassware distribution, temperature range, minimum-weight rule — available now under Lab policy',
      'The review queue: approve and sign budgets, or return them with comments — available now under Review queue',
    ],
  },
  auditor: {
    summary: 'Read what was approved, and how it got there.',
    items: [
      'Approved preparation records, read-only, with their fingerprint check — available now under Approved records',
      'The audit trail: who changed what, and when — available now under Audit trail',
      'Signed PDF records and stored snapshots to download, from each approved record',
    ],
  },
  admin: {
    summary: 'Look after the lab itself and the people in it.',
    items: ['Members and their roles — available now under Members', 'Invitations by e-mail — captured in the Outbox for now'],
  },
};

/** Where each role's daily work starts. */
const SHORTCUTS: Record<Role, { label: string; href: string }[]> = {
  analyst: [],
  qa: [
    { label: 'Open the review queue', href: paths.app.reviewQueue.href() },
    { label: 'Audit trail', href: paths.app.audit.href() },
  ],
  auditor: [
    { label: 'Open the approved records', href: paths.app.records.href() },
    { label: 'Audit trail', href: paths.app.audit.href() },
  ],
  admin: [],
};

export function RoleOverview({ roles }: { roles: readonly Role[] }) {
  const held = ROLES.filter((role) => roles.includes(role));
  return (
    <div className="grid gap-6 md:grid-cols-2">
      {held.map((role) => (
        <section key={role} aria-labelledby={`role-${role}`} className="rounded-lg border border-line bg-surface p-6">
          <div className="mb-2 flex items-center justify-between gap-2">
            <h2 id={`role-${role}`} className="text-xl font-bold">
              {ROLE_LABELS[role]}
            </h2>
            {role === 'admin' || role === 'qa' || role === 'auditor' ? (
              <Badge tone="ok">Available</Badge>
            ) : (
              <Badge tone="accent">Coming</Badge>
            )}
          </div>
          <p className="mb-3 text-ink">{COMING_FOR_ROLE[role].summary}</p>
          <ul className="list-disc space-y-1 pl-5 text-muted">
            {COMING_FOR_ROLE[role].items.map((item) => (
              <li key={item}>{item}</li>
            ))}
          </ul>
          {SHORTCUTS[role].length > 0 ? (
            <p className="mt-4 flex flex-wrap gap-4">
              {SHORTCUTS[role].map((shortcut) => (
                <Link key={shortcut.href} to={shortcut.href} className="font-semibold">
                  {shortcut.label} →
                </Link>
              ))}
            </p>
          ) : null}
        </section>
      ))}
    </div>
  );
}
