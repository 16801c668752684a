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
