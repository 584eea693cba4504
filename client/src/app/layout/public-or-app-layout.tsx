import { Outlet } from 'react-router-dom';
import { PageLoader } from '@/components/page-loader';
import { useSession } from '@/lib/session';
import { AppLayout } from './app-layout';

/** Pages open to everyone (Book a drop-off): inside the app shell when signed in, on their own when not. */
export function PublicOrAppLayout() {
  const state = useSession();
  if (state.status === 'restoring') return <PageLoader label="Checking your session" />;
  return state.status === 'signed-in' ? <AppLayout /> : <Outlet />;
}
