import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { PageLoading } from '@/components/page-loading';
import { ProblemCallout } from '@/components/problem-callout';
import { paths } from '@/config/paths';
import { useSession } from '@/features/auth/api/get-session';

// Everything below this route needs a signed-in person; anyone else is sent to sign in and brought back.
export function RequireSession() {
  const session = useSession();
  const location = useLocation();

  if (session.isPending) return <PageLoading />;
  if (session.isError) {
    return (
      <div className="ll-guard-error">
        <ProblemCallout error={session.error} fallback="The console could not reach the API. Reload the page to try again." />
      </div>
    );
  }
  if (session.data === null) {
    const here = `${location.pathname}${location.search}`;
    const next = here === paths.home ? '' : `?next=${encodeURIComponent(here)}`;
    return <Navigate to={`${paths.signIn}${next}`} replace />;
  }
  return <Outlet />;
}
