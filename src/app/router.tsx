import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter } from 'react-router';
import { RouteErrorBoundary } from '../components/errors/route-error-boundary';
import { LoadingLine } from '../components/ui/loading-line';
import { paths } from '../config/paths';
import { toLazyRoute } from './route-module';

/** The route table; each page is its own chunk, loaded when first visited. */
export function createAppRouter(queryClient: QueryClient) {
  const convert = toLazyRoute(queryClient);
  return createBrowserRouter([
    {
      ErrorBoundary: RouteErrorBoundary,
      HydrateFallback: () => <LoadingLine label="Opening Dilutrace…" />,
      children: [
        { path: paths.auth.signIn.path, lazy: () => import('./routes/sign-in').then(convert) },
        { path: paths.auth.forgotPassword.path, lazy: () => import('./routes/forgot-password').then(convert) },
        { path: paths.auth.resetPassword.path, lazy: () => import('./routes/reset-password').then(convert) },
        { path: paths.auth.invitation.path, lazy: () => import('./routes/invitation').then(convert) },
        {
          path: paths.app.dashboard.path,
          lazy: () => import('./routes/app/root').then(convert),
          children: [
            { index: true, lazy: () => import('./routes/app/dashboard').then(convert) },
            { path: paths.app.reviewQueue.path, lazy: () => import('./routes/app/review-queue').then(convert) },
            { path: paths.app.records.path, lazy: () => import('./routes/app/records').then(convert) },
            { path: paths.app.record.path, lazy: () => import('./routes/app/record').then(convert) },
            { path: paths.app.audit.path, lazy: () => import('./routes/app/audit').then(convert) },
            { path: paths.app.library.path, lazy: () => import('./routes/app/library').then(convert) },
            { path: paths.app.libraryNew.path, lazy: () => import('./routes/app/library-new').then(convert) },
            { path: paths.app.libraryImport.path, lazy: () => import('./routes/app/library-import').then(convert) },
            { path: paths.app.libraryItem.path, lazy: () => import('./routes/app/library-item').then(convert) },
            {
              path: paths.app.libraryItemEdit.path,
              lazy: () => import('./routes/app/library-item-edit').then(convert),
            },
            { path: paths.app.policy.path, lazy: () => import('./routes/app/policy').then(convert) },
            { path: paths.app.members.path, lazy: () => import('./routes/app/members').then(convert) },
            { path: paths.app.deliveryLog.path, lazy: () => import('./routes/app/delivery-log').then(convert) },
            { path: paths.app.accounts.path, lazy: () => import('./routes/app/accounts').then(convert) },
            { path: paths.app.capturedMail.path, lazy: () => import('./routes/app/captured-mail').then(convert) },
            { path: paths.app.preparations.path, lazy: () => import('./routes/app/preparations').then(convert) },
            { path: paths.app.preparationNew.path, lazy: () => import('./routes/app/preparations-new').then(convert) },
            {
              path: paths.app.preparation.path,
              lazy: () => import('./routes/app/preparations-workspace').then(convert),
            },
            { path: paths.app.compare.path, lazy: () => import('./routes/app/compare').then(convert) },
            { path: paths.app.routeFinder.path, lazy: () => import('./routes/app/route-finder').then(convert) },
            { path: paths.app.benchSheet.path, lazy: () => import('./routes/app/bench-sheet').then(convert) },
          ],
        },
        { path: '*', lazy: () => import('./routes/not-found').then(convert) },
      ],
    },
  ]);
}
