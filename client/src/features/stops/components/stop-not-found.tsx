import { Button, Card, Stack, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-error';
import { ListLoadFailed } from './stop-list-states';

/** A stop that does not exist, or is not one of yours, answers 404 either way. */
export function StopLoadFailed({ error, onRetry }: { error: Error; onRetry: () => void }) {
  if (error instanceof ApiError && error.status === 404) {
    return (
      <Card withBorder padding="xl" radius="lg">
        <Stack align="center" gap="sm" ta="center">
          <Text fw={600}>This stop was not found.</Text>
          <Text size="sm" c="dimmed">
            It may have been removed, or it is not on your route.
          </Text>
          <Button component={Link} to={paths.stops.list.getHref()} variant="light">
            Back to the stops
          </Button>
        </Stack>
      </Card>
    );
  }
  return <ListLoadFailed title="The stop could not be loaded" message={error.message} onRetry={onRetry} />;
}
