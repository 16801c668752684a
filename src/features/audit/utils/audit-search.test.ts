import { describe, expect, it } from 'vitest';
import { AUDIT_PAGE_SIZE, auditQueryFromSearch, auditSearchOf } from './audit-search';

describe('audit filters in the address', () => {
  it('reads the filters and the page offset', () => {
    const query = auditQueryFromSearch(
      new URLSearchParams('actor=Tasker&action=preparation.&from=2026-03-01&to=2026-03-31&offset=50'),
    );
    expect(query).toEqual({
      actor: 'Tasker',
      action: 'preparation.',
      from: '2026-03-01',
      to: '2026-03-31',
      offset: 50,
      limit: AUDIT_PAGE_SIZE,
    });
  });

  it('drops a filter the API schema refuses instead of failing the page', () => {
    expect(auditQueryFromSearch(new URLSearchParams('from=03/01/2026&actor=Vance'))).toEqual({
      actor: 'Vance',
      offset: 0,
      limit: AUDIT_PAGE_SIZE,
    });
    // A start after the end is refused on `from` (the schema's refinement), so only the end stays.
    expect(auditQueryFromSearch(new URLSearchParams('from=2026-04-02&to=2026-04-01'))).toEqual({
      to: '2026-04-01',
      offset: 0,
      limit: AUDIT_PAGE_SIZE,
    });
  });

  it('writes back only what is set, and no offset on the first page', () => {
    expect(auditSearchOf({ action: 'auth.', actor: '', offset: 0 })).toEqual({
      actor: undefined,
      action: 'auth.',
      entityType: undefined,
      entityId: undefined,
      from: undefined,
      to: undefined,
      offset: undefined,
    });
    expect(auditSearchOf({ offset: 100 }).offset).toBe(100);
  });
});
