import { describe, expect, it } from 'vitest';
import { navigationFor } from './navigation';

const labels = (roles: Parameters<typeof navigationFor>[0]) => navigationFor(roles).map((item) => item.label);

describe('navigationFor', () => {
  it('gives an administrator the member page, the delivery log, the approved records and the audit trail', () => {
    expect(labels(['admin'])).toEqual([
      'Dashboard',
      'Preparations',
      'Library',
      'Lab policy',
      'Approved records',
      'Audit trail',
      'Members',
      'Delivery log',
    ]);
  });

  it('gives the accounts and the captured mail to the instance operator alone, whatever their lab roles', () => {
    expect(labels(['admin'])).not.toContain('Captured mail');
    expect(labels(['admin'])).not.toContain('Accounts');
    expect(navigationFor(['admin'], true).map((item) => item.label)).toContain('Captured mail');
    expect(navigationFor([], true).map((item) => item.label)).toEqual(['Dashboard', 'Accounts', 'Captured mail']);
  });

  it('gives analysts, QA and auditors the preparations, the library and the lab policy (read-only unless QA)', () => {
    expect(labels(['analyst'])).toEqual([
      'Dashboard',
      'Preparations',
      'Route finder',
      'Library',
      'Lab policy',
      'Approved records',
    ]);
    expect(labels(['qa'])).toEqual([
      'Dashboard',
      'Preparations',
      'Route finder',
      'Library',
      'Lab policy',
      'Review queue',
      'Approved records',
      'Audit trail',
    ]);
    expect(labels(['auditor'])).toEqual([
      'Dashboard',
      'Preparations',
      'Library',
      'Lab policy',
      'Approved records',
      'Audit trail',
    ]);
  });

  it('gives the review queue to QA alone, and the audit trail to auditors, QA and administrators', () => {
    expect(labels(['analyst'])).not.toContain('Review queue');
    expect(labels(['auditor'])).not.toContain('Review queue');
    expect(labels(['analyst'])).not.toContain('Audit trail');
  });

  it('takes the union of several roles without repeating an entry', () => {
    expect(labels(['analyst', 'admin', 'qa'])).toEqual([
      'Dashboard',
      'Preparations',
      'Route finder',
      'Library',
      'Lab policy',
      'Review queue',
      'Approved records',
      'Audit trail',
      'Members',
      'Delivery log',
    ]);
  });

  it('shows only the dashboard to someone with no role in the active lab (there is no library to read)', () => {
    expect(labels([])).toEqual(['Dashboard']);
  });
});
