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
    expect(paths.app.library.href({ kind: 'glass-pipette', status: 'retired' })).toBe('/library?kind=glass-pipette&status=retired');
    expect(paths.app.libraryNew.href('flask')).toBe('/library/new?kind=flask');
    expect(paths.app.libraryItem.href(12)).toBe('/library/12');
    expect(paths.app.libraryItem.href(12, 1)).toBe('/library/12?revision=1');
    expect(paths.app.libraryItemEdit.href(12)).toBe('/library/12/edit');
  });
});

describe('safeRedirectPath', () => {
  it('keeps paths inside the app', () => {
    expect(safeRedirectPath('/outbox?message=3')).toBe('/outbox?message=3');
  });

  it('refuses other origins and falls back to the dashboard', () => {
    for (const candidate of ['//evil.example/x', '/\\evil.example', 'https://evil.example', 'members', '', null, undefined]) {
      expect(safeRedirectPath(candidate)).toBe('/');
    }
  });
});
