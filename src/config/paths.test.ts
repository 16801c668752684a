import { describe, expect, it } from 'vitest';
import { paths, safeRedirectPath } from './paths';

describe('paths', () => {
  it('carries the page to return to through sign-in', () => {
    expect(paths.auth.signIn.href('/members')).toBe('/sign-in?redirectTo=%2Fmembers');
    expect(paths.auth.signIn.href('/')).toBe('/sign-in');
    expect(paths.auth.signIn.href()).toBe('/sign-in');
  });

  it('builds the links the server mails out', () => {
    expect(paths.auth.invitation.href('abc_DEF-123')).toBe('/invitation/abc_DEF-123');
    expect(paths.auth.resetPassword.href('abc_DEF-123')).toBe('/reset-password/abc_DEF-123');
  });
});

describe('library paths', () => {
  it('keeps the kind tab and status filter in the address', () => {
    expect(paths.app.library.href()).toBe('/library');
    expect(paths.app.library.href({ kind: 'glass-pipette', status: 'retired' })).toBe(
      '/library?kind=glass-pipette&status=retired',
    );
    expect(paths.app.libraryNew.href('flask')).toBe('/library/new?kind=flask');
    expect(paths.app.libraryItem.href(12)).toBe('/library/12');
    expect(paths.app.libraryItem.href(12, 1)).toBe('/library/12?revision=1');
    expect(paths.app.libraryItemEdit.href(12)).toBe('/library/12/edit');
  });
});

describe('preparation paths', () => {
  it('keeps list filters, the original of a variant and the compared ids in the address', () => {
    expect(paths.app.preparations.href({ status: 'draft', analyst: 4, material: undefined })).toBe(
      '/preparations?status=draft&analyst=4',
    );
    expect(paths.app.preparation.href(7)).toBe('/preparations/7');
    expect(paths.app.preparation.href(8, 7)).toBe('/preparations/8?variantOf=7');
    expect(paths.app.benchSheet.href(7)).toBe('/preparations/7/bench-sheet');
    expect(paths.app.compare.href([7, 8])).toBe('/compare?ids=7,8');
  });
});

describe('record, review and audit paths', () => {
  it('puts the version in the record address and the search and filters in the query string', () => {
    expect(paths.app.record.href(7, 2)).toBe('/records/7/v/2');
    expect(paths.app.records.href()).toBe('/records');
    expect(paths.app.records.href('Pb nitrate')).toBe('/records?q=Pb+nitrate');
    expect(paths.app.reviewQueue.href()).toBe('/review');
    expect(paths.app.audit.href({ action: 'preparation.approved', actor: undefined, offset: 50 })).toBe(
      '/audit?action=preparation.approved&offset=50',
    );
  });
});

describe('safeRedirectPath', () => {
  it('keeps paths inside the app', () => {
    expect(safeRedirectPath('/captured-mail?message=3')).toBe('/captured-mail?message=3');
  });

  it('refuses other origins and falls back to the dashboard', () => {
    for (const candidate of [
      '//evil.example/x',
      '/\\evil.example',
      'https://evil.example',
      'members',
      '',
      null,
      undefined,
    ]) {
      expect(safeRedirectPath(candidate)).toBe('/');
    }
  });
});
