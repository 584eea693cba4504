import { Alert, Button, Card, Skeleton, Stack, Text } from '@mantine/core';
import { IconAlertTriangle, IconUsersGroup } from '@tabler/icons-react';

export function TeamLoading() {
  return (
    <Stack gap="sm" role="status" aria-label="Loading the team">
      {Array.from({ length: 5 }, (_, index) => (
        <Skeleton key={index} height={48} radius="md" />
      ))}
    </Stack>
  );
}

export function TeamLoadFailed({ message, onRetry }: { message: string; onRetry: () => void }) {
  return (
    <Alert color="red" icon={<IconAlertTriangle size={20} />} title="The team could not be loaded">
      <Stack gap="sm" align="flex-start">
        <Text size="sm">{message}</Text>
        <Button variant="white" color="red" onClick={onRetry}>
          Try again
        </Button>
      </Stack>
    </Alert>
  );
}

export function TeamEmpty({ search, onClear }: { search: string; onClear: () => void }) {
  return (
    <Card withBorder padding="xl" radius="lg">
      <Stack align="center" gap="sm" ta="center">
        <IconUsersGroup size={36} stroke={1.4} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />
        {search ? (
          <>
            <Text fw={600}>No one matches “{search}”.</Text>
            <Button variant="subtle" onClick={onClear}>
              Clear the search
            </Button>
          </>
        ) : (
          <>
            <Text fw={600}>No one on this page.</Text>
            <Button variant="subtle" onClick={onClear}>
              Go to the first page
            </Button>
          </>
        )}
      </Stack>
    </Card>
  );
}
