import { Alert, Button, Card, Skeleton, Stack, Text } from '@mantine/core';
import { IconAlertTriangle, IconBuildingStore, IconPlus } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

export function ListLoading({ label }: { label: string }) {
  return (
    <Stack gap="sm" role="status" aria-label={label}>
      {Array.from({ length: 5 }, (_, index) => (
        <Skeleton key={index} height={56} radius="md" />
      ))}
    </Stack>
  );
}

export function ListLoadFailed({ title, message, onRetry }: { title: string; message: string; onRetry: () => void }) {
  return (
    <Alert color="red" icon={<IconAlertTriangle size={20} />} title={title}>
      <Stack gap="sm" align="flex-start">
        <Text size="sm">{message}</Text>
        <Button variant="white" color="red" onClick={onRetry}>
          Try again
        </Button>
      </Stack>
    </Alert>
  );
}

interface StopsEmptyProps {
  /** A search or filter is on, so clearing it may show stops. */
  filtered: boolean;
  canAdd: boolean;
  onClear: () => void;
}

export function StopsEmpty({ filtered, canAdd, onClear }: StopsEmptyProps) {
  return (
    <Card withBorder padding="xl" radius="lg">
      <Stack align="center" gap="sm" ta="center">
        <IconBuildingStore size={36} stroke={1.4} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />
        {filtered ? (
          <>
            <Text fw={600}>No stops match these filters.</Text>
            <Button variant="subtle" onClick={onClear}>
              Clear the filters
            </Button>
          </>
        ) : (
          <>
            <Text fw={600}>No stops yet.</Text>
            <Text size="sm" c="dimmed" maw={420}>
              {canAdd
                ? 'Add the salons, barbershops and grooming shops on the route, with their hours and cadence.'
                : 'Stops assigned to you show here once the office adds them.'}
            </Text>
            {canAdd ? (
              <Button component={Link} to={paths.stops.create.getHref()} leftSection={<IconPlus size={18} />}>
                Add a stop
              </Button>
            ) : null}
          </>
        )}
      </Stack>
    </Card>
  );
}
