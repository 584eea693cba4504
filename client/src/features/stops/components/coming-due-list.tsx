import { Anchor, Card, Group, Stack, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { cadenceWording, formatDay, kindLabel } from '../format';
import type { StopSummary } from '../types';
import { DueBadge } from './due-badge';

/** Stops by next due date, most overdue first; one card each so it reads the same on a phone and a desk. */
export function ComingDueList({ stops }: { stops: StopSummary[] }) {
  return (
    <Stack gap="sm" component="ol" p={0} m={0} style={{ listStyle: 'none' }} aria-label="Stops coming due">
      {stops.map((stop) => (
        <Card key={stop.id} component="li" withBorder radius="md" padding="md">
          <Group justify="space-between" align="flex-start" gap="xs">
            <Stack gap={2} style={{ minWidth: 0, flex: '1 1 14rem' }}>
              <Anchor component={Link} to={paths.stops.detail.getHref(stop.id)} fw={600} size="lg" py={4}>
                {stop.name}
              </Anchor>
              <Text size="sm" c="dimmed">
                {kindLabel(stop.kind)} · {stop.city}
                {stop.assignedSharpener ? ` · ${stop.assignedSharpener.name}` : ' · no sharpener'}
              </Text>
            </Stack>
            <DueBadge daysOverdue={stop.daysOverdue} />
          </Group>
          <Group gap="lg" mt="xs">
            <Text size="sm">
              <Text span c="dimmed">
                Due{' '}
              </Text>
              {formatDay(stop.nextDueOn)}
            </Text>
            <Text size="sm">
              <Text span c="dimmed">
                Last visit{' '}
              </Text>
              {stop.lastVisitOn ? formatDay(stop.lastVisitOn) : 'never'}
            </Text>
            <Text size="sm" c="dimmed">
              {cadenceWording(stop.cadenceWeeks)}
            </Text>
          </Group>
        </Card>
      ))}
    </Stack>
  );
}
