import { Alert, Anchor, Text } from '@mantine/core';
import { IconClockHour4 } from '@tabler/icons-react';
import { Link, Navigate, useSearchParams } from 'react-router-dom';
import { PageLoader } from '@/components/page-loader';
import { paths, safeRedirect } from '@/config/paths';
import { useSession } from '@/lib/session';
import { AuthLayout } from '../components/auth-layout';
import { SignInForm } from '../components/sign-in-form';

export function SignInRoute() {
  const state = useSession();
  const [params] = useSearchParams();
  const redirectTo = safeRedirect(params.get('redirectTo'));

  if (state.status === 'restoring') return <PageLoader label="Checking your session" />;
  if (state.status === 'signed-in') return <Navigate to={redirectTo} replace />;

  return (
    <AuthLayout title="Sign in" description="Use the e-mail address your invitation came to.">
      {state.reason === 'expired' ? (
        <Alert color="brass" icon={<IconClockHour4 size={20} />}>
          Your session ended. Sign in again to carry on where you were.
        </Alert>
      ) : null}
      <SignInForm />
      <Text size="sm" c="dimmed" ta="center">
        Leaving shears at your stop? No account needed:{' '}
        <Anchor component={Link} to={paths.bookings.book.getHref()} fw={600}>
          Book a drop-off
        </Anchor>
      </Text>
    </AuthLayout>
  );
}
