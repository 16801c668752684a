import { useState } from 'react';
import { ROLE_LABELS, ROLES, type Role } from '../../../../shared/contracts/roles';
import type { Member } from '../../../../shared/contracts/members';
import { Checkbox } from '../../../components/ui/checkbox';
import { isApiError } from '../../../lib/api-error';
import { useUpdateMember } from '../api/update-member';

/** Short names that fit a table cell; the full name is the checkbox's tooltip. */
const SHORT_ROLE_LABELS: Record<Role, string> = { admin: 'Admin', qa: 'QA', analyst: 'Analyst', auditor: 'Auditor' };

/**
 * One checkbox per role; each change is saved at once and shown at once, and put back
 * if the server refuses it. The last remaining role cannot be cleared.
 */
export function MemberRolesCell({ labId, member }: { labId: number; member: Member }) {
  const updateMember = useUpdateMember();
  const [savingRoles, setSavingRoles] = useState<Role[] | null>(null);
  const shownRoles = savingRoles ?? member.roles;

  const toggle = (role: Role, checked: boolean) => {
    const roles = ROLES.filter((each) => (each === role ? checked : shownRoles.includes(each)));
    setSavingRoles(roles);
    updateMember.mutate({ labId, userId: member.userId, change: { roles } }, { onSettled: () => setSavingRoles(null) });
  };

  return (
    <fieldset aria-busy={updateMember.isPending || undefined}>
      <legend className="sr-only">Roles of {member.name}</legend>
      <div className="flex flex-wrap gap-x-4 gap-y-1 whitespace-nowrap">
        {ROLES.map((role) => {
          const checked = shownRoles.includes(role);
          const onlyRole = checked && shownRoles.length === 1;
          return (
            <Checkbox
              key={role}
              label={SHORT_ROLE_LABELS[role]}
              checked={checked}
              disabled={updateMember.isPending || onlyRole}
              title={onlyRole ? `${ROLE_LABELS[role]} — a member keeps at least one role.` : ROLE_LABELS[role]}
              onChange={(event) => toggle(role, event.target.checked)}
            />
          );
        })}
      </div>
      {updateMember.isError ? (
        <p role="alert" className="mt-1 text-sm font-semibold text-danger">
          {isApiError(updateMember.error) ? updateMember.error.message : 'The roles could not be saved.'}
        </p>
      ) : null}
    </fieldset>
  );
}
