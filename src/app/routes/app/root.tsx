import type { QueryClient } from '@tanstack/react-query';
import { Suspense } from 'react';
import { Navigate, NavLink, Outlet, redirect, useLocation, useNavigation, type LoaderFunctionArgs } from 'react-router';
import { AppLayout } from '../../../components/layouts/app-layout';
import { LoadingLine } from '../../../components/ui/loading-line';
import { paths } from '../../../config/paths';
import { meQueryOptions, useMe } from '../../../features/auth/api/get-me';
import { LabSwitcher } from '../../../features/auth/components/lab-switcher';
import { SignOutButton } from '../../../features/auth/components/sign-out-button';
import { activeMembership, activeRoles } from '../../../lib/authorization';
import { navigationFor } from '../../navigation';

/** Everything under the signed-in shell needs a user: nobody signed in goes to sign-in, and comes back after. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (!me) {
      const url = new URL(request.url);
      throw redirect(paths.auth.signIn.href(url.pathname + url.search));
    }
    return null;
  };

export function Component() {
  const me = useMe();
  const location = useLocation();
  const navigation = useNavigation();
  if (!me) return <Navigate to={paths.auth.signIn.href(location.pathname + location.search)} replace />;

  const membership = activeMembership(me);
  return (
    <AppLayout
      homeHref={paths.app.dashboard.href()}
      busy={navigation.state === 'loading'}
      account={
        <>
          {me.labs.length > 1 ? (
            <LabSwitcher me={me} />
          ) : membership ? (
            <span className="text-sm text-paper/85">{membership.name}</span>
          ) : null}
          <span className="text-sm font-semibold">{me.user.name}</span>
          <SignOutButton />
        </>
      }
      navigation={
        <nav aria-label="Main">
          <ul className="flex gap-1">
            {navigationFor(activeRoles(me), me.operator).map((item) => (
              <li key={item.href}>
                <NavLink
                  to={item.href}
                  end
                  className={({ isActive }) =>
                    `block border-b-4 px-3 py-2 font-semibold no-underline ${isActive ? 'border-accent text-paper' : 'border-transparent text-paper/80 hover:text-paper'}`
                  }
                >
                  {item.label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>
      }
    >
      <Suspense fallback={<LoadingLine />}>
        <Outlet />
      </Suspense>
    </AppLayout>
  );
}
