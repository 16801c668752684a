import { describe, expect, it } from 'vitest';
import { navigationFor } from './navigation';

const labels = (roles: Parameters<typeof navigationFor>[0]) => navigationFor(roles).map((item) => item.label);

describe('navigationFor', () => {
  it('gives an administrator the member and outbox pages', () => {
    expect(labels(['admin'])).toEqual(['Dashboard', 'Members', 'Outbox']);
  });

  it('gives analysts, QA and auditors the dashboard only, for now', () => {
    expect(labels(['analyst'])).toEqual(['Dashboard']);
    expect(labels(['qa'])).toEqual(['Dashboard']);
    expect(labels(['auditor'])).toEqual(['Dashboard']);
  });

  it('takes the union of several roles without repeating an entry', () => {
    expect(labels(['analyst', 'admin', 'qa'])).toEqual(['Dashboard', 'Members', 'Outbox']);
  });

  it('still shows the dashboard to someone with no role in the active lab', () => {
    expect(labels([])).toEqual(['Dashboard']);
  });
});
