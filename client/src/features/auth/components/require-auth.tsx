import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { PageLoader } from '@/components/page-loader';
import { paths } from '@/config/paths';
import { useSession } from '@/lib/session';

/** Signed-out visitors go to sign in, and come back here afterwards. */
export function RequireAuth() {
  const state = useSession();
  const location = useLocation();
  if (state.status === 'restoring') return <PageLoader label="Checking your session" />;
  if (state.status === 'signed-out') {
    // After a deliberate sign-out the next person starts fresh rather than on the last page.
    const returnTo =
      state.reason === 'signed-out' ? undefined : `${location.pathname}${location.search}${location.hash}`;
    return <Navigate to={paths.auth.signIn.getHref(returnTo)} replace />;
  }
  return <Outlet />;
}
