import type { EquipmentKind } from '../../shared/contracts/library';

/** The library list's status filter, as the API's `status` query takes it. */
export type EquipmentStatusFilter = 'active' | 'retired' | 'all';

/** `path` with the defined values of `query` as its search string. */
function withQuery(path: string, query: Record<string, string | number | undefined>): string {
  const search = new URLSearchParams();
  for (const [name, value] of Object.entries(query)) if (value !== undefined) search.set(name, String(value));
  const text = search.toString();
  return text ? `${path}?${text}` : path;
}

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
    reviewQueue: {
      path: '/review',
      href: () => '/review',
    },
    records: {
      path: '/records',
      /** The approved records, optionally searched (title, analyte, analyst or material). */
      href: (search?: string) => withQuery('/records', { q: search || undefined }),
    },
    record: {
      path: '/records/:preparationId/v/:versionNumber',
      href: (preparationId: number, versionNumber: number) => `/records/${preparationId}/v/${versionNumber}`,
    },
    audit: {
      path: '/audit',
      /** The audit trail with its filters and page in the address. */
      href: (filter: Record<string, string | number | undefined> = {}) => withQuery('/audit', filter),
    },
    members: {
      path: '/members',
      href: () => '/members',
    },
    library: {
      path: '/library',
      /** Opens one kind's tab, optionally with a status filter other than "active". */
      href: (options: { kind?: EquipmentKind; status?: EquipmentStatusFilter } = {}) => withQuery('/library', options),
    },
    libraryNew: {
      path: '/library/new',
      href: (kind: EquipmentKind) => withQuery('/library/new', { kind }),
    },
    libraryImport: {
      path: '/library/import',
      href: (kind?: EquipmentKind) => withQuery('/library/import', { kind }),
    },
    libraryItem: {
      path: '/library/:itemId',
      /** `revision` opens one earlier revision's data in the history. */
      href: (itemId: number, revision?: number) => withQuery(`/library/${itemId}`, { revision }),
    },
    libraryItemEdit: {
      path: '/library/:itemId/edit',
      href: (itemId: number) => `/library/${itemId}/edit`,
    },
    policy: {
      path: '/policy',
      href: () => '/policy',
    },
    deliveryLog: {
      path: '/delivery-log',
      href: () => '/delivery-log',
    },
    accounts: {
      path: '/accounts',
      href: () => '/accounts',
    },
    capturedMail: {
      path: '/captured-mail',
      /** `messageId` opens one captured message beside the list. */
      href: (messageId?: number) =>
        messageId === undefined ? '/captured-mail' : `/captured-mail?message=${messageId}`,
    },
    preparations: {
      path: '/preparations',
      /** The list, with its filters in the address. */
      href: (filter: Record<string, string | number | undefined> = {}) => withQuery('/preparations', filter),
    },
    preparationNew: {
      path: '/preparations/new',
      href: () => '/preparations/new',
    },
    preparation: {
      path: '/preparations/:preparationId',
      /** `variantOf` names the preparation this one was duplicated from, for "compare with the original". */
      href: (preparationId: number, variantOf?: number) => withQuery(`/preparations/${preparationId}`, { variantOf }),
    },
    benchSheet: {
      path: '/preparations/:preparationId/bench-sheet',
      href: (preparationId: number) => `/preparations/${preparationId}/bench-sheet`,
    },
    compare: {
      path: '/compare',
      /** Two to four preparations side by side. */
      href: (preparationIds: readonly number[]) => `/compare?ids=${preparationIds.join(',')}`,
    },
    routeFinder: {
      path: '/route-finder',
      href: () => '/route-finder',
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
