import { isRouteErrorResponse, Link, useRouteError } from 'react-router';
import { isApiError } from '../../lib/api-error';
import { AuthLayout } from '../layouts/auth-layout';

/** The last resort for an error no page handled: says what failed and offers a way on. */
export function RouteErrorBoundary() {
  const error = useRouteError();
  const message = isApiError(error)
    ? error.message
    : isRouteErrorResponse(error)
      ? `${error.status} ${error.statusText}`
      : 'An unexpected error stopped this page.';
  return (
    <AuthLayout title="This page could not be shown">
      <title>Problem · Dilutrace</title>
      <p className="mb-4">{message}</p>
      <p>
        <Link to="/">Go to the dashboard</Link> or <a href={window.location.href}>reload the page</a>.
      </p>
    </AuthLayout>
  );
}
