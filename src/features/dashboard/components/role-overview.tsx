import { ROLE_LABELS, ROLES, type Role } from '../../../../shared/contracts/roles';
import { Link } from 'react-router';
import { paths } from '../../../config/paths';

/** What each role does in Dilutrace, said plainly. */
const WORK_OF_ROLE: Record<Role, { summary: string; items: string[] }> = {
  analyst: {
    summary: 'Plan how a standard is made and see what limits its uncertainty.',
    items: [
      'Plan a preparation — weighing, stock, dilution steps — and see its uncertainty budget as you type',
      'Duplicate a plan into variants and compare them, or let the route finder rank routes to a target',
      'Print the bench sheet, record the masses actually weighed, and submit the record for review',
    ],
  },
  qa: {
    summary: 'Keep the equipment the budgets rest on, and decide what is approved.',
    items: [
      'The tolerance library: balances, flasks, pipettes and reference materials with their certificates',
      'Lab policy: coverage probability, glassware distribution, temperature range, minimum-weight rule',
      'The review queue: approve and sign budgets, or return them with comments',
    ],
  },
  auditor: {
    summary: 'Read what was approved, and how it got there.',
    items: [
      'Approved preparation records, read-only, with their fingerprint check',
      'Signed PDF records and stored snapshots to download, from each approved record',
      'The audit trail: who changed what, and when',
    ],
  },
  admin: {
    summary: 'Look after the lab itself and the people in it.',
    items: [
      'Members and their roles; remove someone who has left the lab',
      'Invitations by e-mail, and the delivery log of mail Dilutrace has sent about the lab',
    ],
  },
};

/** Where each role's daily work starts. */
const SHORTCUTS: Record<Role, { label: string; href: string }[]> = {
  analyst: [
    { label: 'New preparation', href: paths.app.preparationNew.href() },
    { label: 'Preparations', href: paths.app.preparations.href() },
    { label: 'Route finder', href: paths.app.routeFinder.href() },
  ],
  qa: [
    { label: 'Open the review queue', href: paths.app.reviewQueue.href() },
    { label: 'Library', href: paths.app.library.href() },
    { label: 'Audit trail', href: paths.app.audit.href() },
  ],
  auditor: [
    { label: 'Open the approved records', href: paths.app.records.href() },
    { label: 'Audit trail', href: paths.app.audit.href() },
  ],
  admin: [
    { label: 'Members', href: paths.app.members.href() },
    { label: 'Delivery log', href: paths.app.deliveryLog.href() },
  ],
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
          </div>
          <p className="mb-3 text-ink">{WORK_OF_ROLE[role].summary}</p>
          <ul className="list-disc space-y-1 pl-5 text-muted">
            {WORK_OF_ROLE[role].items.map((item) => (
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
