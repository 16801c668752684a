import { describe, expect, it } from 'vitest';
import type { Me } from '../../shared/contracts/auth';
import { activeMembership, activeRoles, can } from './authorization';

const me: Me = {
  user: { id: 7, email: 'ana@lab.example', name: 'Ana' },
  labs: [
    { id: 1, name: 'North', roles: ['analyst'] },
    { id: 2, name: 'South', roles: ['admin', 'qa'] },
  ],
  activeLabId: 2,
  operator: false,
  csrfToken: 'token',
};

describe('authorization', () => {
  it('reads roles from the active lab only', () => {
    expect(activeMembership(me)?.name).toBe('South');
    expect(activeRoles(me)).toEqual(['admin', 'qa']);
    expect(activeRoles({ ...me, activeLabId: 1 })).toEqual(['analyst']);
  });

  it('has no roles without an active lab, or with an active lab the user is not in', () => {
    expect(activeRoles({ ...me, activeLabId: null })).toEqual([]);
    expect(activeRoles({ ...me, activeLabId: 99 })).toEqual([]);
  });

  it('lets only administrators manage members and read the delivery log', () => {
    expect(can(['admin'], 'manageMembers')).toBe(true);
    expect(can(['qa', 'analyst', 'auditor'], 'manageMembers')).toBe(false);
    expect(can(['auditor'], 'readDeliveryLog')).toBe(false);
  });
});
