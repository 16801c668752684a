/** Every client route: its router `path` and an `href()` that builds a link to it. */
export const paths = {
  auth: {
    signIn: {
      path: '/sign-in',
      /** `redirectTo` is a path inside the app to return to after signing in. */
      href: (redirectTo?: string | null) =>
        redirectTo && redirectTo !== '/' ? `/sign-in?redirectTo=${encodeURIComponent(redirectTo)}` : '/sign-in',
    },
    forgotPassword: {
      path: '/forgot-password',
      href: () => '/forgot-password',
    },
    resetPassword: {
      path: '/reset-password/:token',
      href: (token: string) => `/reset-password/${encodeURIComponent(token)}`,
    },
    invitation: {
      path: '/invitation/:token',
      href: (token: string) => `/invitation/${encodeURIComponent(token)}`,
    },
  },
  app: {
    dashboard: {
      path: '/',
      href: () => '/',
    },
    members: {
      path: '/members',
      href: () => '/members',
    },
    outbox: {
      path: '/outbox',
      /** `messageId` opens one captured message beside the list. */
      href: (messageId?: number) => (messageId === undefined ? '/outbox' : `/outbox?message=${messageId}`),
    },
  },
} as const;

/**
 * Keeps a post-sign-in redirect inside this app: only same-origin paths such as
 * `/members` pass; anything else (`//evil.example`, `https://…`) falls back to the dashboard.
 */
export function safeRedirectPath(candidate: string | null | undefined): string {
  if (!candidate || !candidate.startsWith('/') || candidate.startsWith('//') || candidate.startsWith('/\\')) {
    return paths.app.dashboard.href();
  }
  return candidate;
}
