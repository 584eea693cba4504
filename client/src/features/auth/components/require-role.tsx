import { Button, Container, Stack, Text, Title } from '@mantine/core';
import type { Role } from '@keenroute/shared';
import { Link, Outlet } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ROLE_LABELS } from '@/config/roles';
import { useSignedInUser } from '@/lib/session';

/** Shapes what is shown; the server still refuses the data to the wrong role. */
export function RequireRole({ roles }: { roles: readonly Role[] }) {
  const user = useSignedInUser();
  if (roles.includes(user.role)) return <Outlet />;
  return (
    <Container size="sm" py="xl">
      <Stack gap="md" align="flex-start">
        <Title order={1}>Not part of your role</Title>
        <Text>
          This page is for {roles.map((role) => ROLE_LABELS[role]).join(' and ')}. You are signed in as{' '}
          {ROLE_LABELS[user.role].toLowerCase()}.
        </Text>
        <Button component={Link} to={paths.home.getHref()}>
          Go to Home
        </Button>
      </Stack>
    </Container>
  );
}
