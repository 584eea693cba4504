import { Alert, Button, Stack, Text } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { ApiError } from '@/lib/api-error';

interface RecordFailedProps {
  /** "customer", "shear" */
  what: string;
  error: Error;
  onRetry: () => void;
  back?: { to: string; label: string };
}

/** One record's page when it cannot be shown: not there (or not yours), or the server failed. */
export function RecordLoadFailed({ what, error, onRetry, back }: RecordFailedProps) {
  const missing = error instanceof ApiError && error.status === 404;
  return (
    <Alert
      color={missing ? 'gray' : 'red'}
      icon={<IconAlertTriangle size={20} />}
      title={missing ? `This ${what} was not found` : `The ${what} could not be loaded`}
      maw={640}
    >
      <Stack gap="sm" align="flex-start">
        <Text size="sm">{missing ? `The link may be old, or the ${what} is not one you can see.` : error.message}</Text>
        {missing ? null : (
          <Button variant="white" color="red" onClick={onRetry}>
            Try again
          </Button>
        )}
        {back ? (
          <Button component={Link} to={back.to} variant="subtle">
            {back.label}
          </Button>
        ) : null}
      </Stack>
    </Alert>
  );
}
