import { Alert, Button, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { PageLoader } from '@/components/page-loader';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-error';
import { usePasswordToken } from '../api/get-password-token';
import { AuthLayout } from '../components/auth-layout';
import { LinkExpired } from '../components/link-expired';
import { SetPasswordForm } from '../components/set-password-form';

/** One page for both an invitation and a reset: the link's token says whose password this is. */
export function SetPasswordRoute() {
  const [params] = useSearchParams();
  const token = params.get('token')?.trim() ?? '';
  const lookup = usePasswordToken(token);
  const navigate = useNavigate();
  const [expired, setExpired] = useState(false);

  const linkGone = !token || expired || (lookup.error instanceof ApiError && lookup.error.status === 404);
  if (linkGone) {
    return (
      <AuthLayout title="Set a password">
        <LinkExpired />
      </AuthLayout>
    );
  }

  if (lookup.isPending) return <PageLoader label="Checking your link" />;

  if (lookup.isError) {
    return (
      <AuthLayout title="Set a password">
        <Stack gap="md">
          <Alert color="red" title="The link could not be checked">
            {lookup.error.message}
          </Alert>
          <Button onClick={() => void lookup.refetch()}>Try again</Button>
        </Stack>
      </AuthLayout>
    );
  }

  const { purpose, name, email } = lookup.data;
  return (
    <AuthLayout
      title={purpose === 'invite' ? 'Welcome to Keenroute' : 'Choose a new password'}
      description={
        <>
          Setting a password for{' '}
          <Text span fw={600} c="var(--mantine-color-text)">
            {name}
          </Text>{' '}
          ({email}).
        </>
      }
    >
      <SetPasswordForm
        token={token}
        email={email}
        onDone={() => void navigate(paths.home.getHref(), { replace: true })}
        onLinkExpired={() => setExpired(true)}
      />
    </AuthLayout>
  );
}
