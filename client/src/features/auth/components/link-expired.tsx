import { Alert, Button, Stack } from '@mantine/core';
import { IconLinkOff } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

export function LinkExpired() {
  return (
    <Stack gap="md">
      <Alert color="brass" icon={<IconLinkOff size={20} />} title="This link no longer works">
        This link has expired or was already used; ask for a new one.
      </Alert>
      <Button component={Link} to={paths.auth.forgotPassword.getHref()}>
        Ask for a new link
      </Button>
      <Button component={Link} to={paths.auth.signIn.getHref()} variant="subtle">
        Sign in instead
      </Button>
    </Stack>
  );
}
