import { Link } from 'react-router';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { paths } from '../../config/paths';

export function Component() {
  return (
    <AuthLayout
      title="Page not found"
      description="No page lives at this address. The link may be mistyped or out of date."
    >
      <title>Not found · Dilutrace</title>
      <p>
        <Link to={paths.app.dashboard.href()}>Go to the dashboard</Link>
      </p>
    </AuthLayout>
  );
}
