import { Badge, Card, Group, Loader, Stack, Text, Title } from '@mantine/core';
import { IconHistory } from '@tabler/icons-react';
import { formatDateTime } from '@/lib/format';
import { useRateHistory } from '../api/get-rate-history';

/** Every saved version, newest first; a change never rewrites the price on an existing ticket. */
export function RateHistory() {
  const history = useRateHistory();
  const items = history.data?.items ?? [];
  return (
    <Card withBorder radius="lg" padding="lg" component="section" aria-labelledby="rate-history-title">
      <Group gap="xs" mb="sm">
        <IconHistory size={20} aria-hidden="true" />
        <Title order={2} fz="h4" id="rate-history-title">
          Saved versions
        </Title>
      </Group>
      {history.isPending ? (
        <Loader size="sm" aria-label="Loading the saved versions" />
      ) : history.isError ? (
        <Text size="sm" c="red">
          The saved versions could not be loaded: {history.error.message}
        </Text>
      ) : items.length === 0 ? (
        <Text size="sm" c="dimmed">
          No version saved yet.
        </Text>
      ) : (
        <Stack component="ol" gap={6} p={0} m={0} style={{ listStyle: 'none' }}>
          {items.map((item, index) => (
            <Group key={item.version} component="li" gap="sm" justify="space-between" wrap="nowrap">
              <Text size="sm" fw={600}>
                Version {item.version}
                {index === 0 ? (
                  <Badge ml="xs" size="sm" radius="sm" variant="light">
                    In force
                  </Badge>
                ) : null}
              </Text>
              <Text size="sm" c="dimmed">
                {formatDateTime(item.savedAt)}
              </Text>
            </Group>
          ))}
        </Stack>
      )}
      {history.data && history.data.total > items.length ? (
        <Text size="xs" c="dimmed" mt="xs">
          The newest {items.length} of {history.data.total}.
        </Text>
      ) : null}
    </Card>
  );
}
