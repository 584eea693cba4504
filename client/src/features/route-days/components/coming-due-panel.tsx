import { Anchor, Badge, Card, Group, Skeleton, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useComingDue } from '@/features/stops/api/get-coming-due';
import { DueBadge } from '@/features/stops/components/due-badge';
import { shortWeekday } from '@/features/stops/format';
import type { Week } from '../types';
import { whereIs } from '../week-cache';

const PAGE_SIZE = 50;

/** The stops falling due by the week's end, and for each the day it is planned on, if any. */
export function ComingDuePanel({ week, monday }: { week: Week | undefined; monday: string }) {
  const due = useComingDue({ week: monday, sharpener: '', page: 1, pageSize: PAGE_SIZE });
  const stops = due.data?.items ?? [];
  return (
    <Card withBorder radius="md" padding="md" component="section" aria-labelledby="coming-due-title">
      <Group justify="space-between" mb="xs">
        <Title order={2} fz="h4" id="coming-due-title">
          Coming due {due.data ? `(${due.data.total})` : ''}
        </Title>
        <Anchor component={Link} to={`${paths.comingDue.getHref()}?week=${monday}`} size="sm">
          See all
        </Anchor>
      </Group>
      {due.isPending ? (
        <Stack gap={6} role="status" aria-label="Loading the stops coming due">
          <Skeleton height={36} />
          <Skeleton height={36} />
        </Stack>
      ) : due.isError ? (
        <Text size="sm" c="red">
          {due.error.message}
        </Text>
      ) : stops.length === 0 ? (
        <Text size="sm" c="dimmed">
          Nothing falls due this week.
        </Text>
      ) : (
        <Stack component="ul" gap={6} p={0} m={0} style={{ listStyle: 'none' }} aria-label="Stops coming due">
          {stops.map((stop) => {
            const planned = week ? whereIs(week, stop.id) : null;
            return (
              <Group component="li" key={stop.id} justify="space-between" gap={6} wrap="nowrap">
                <Stack gap={0} style={{ minWidth: 0 }}>
                  <Text size="sm" fw={600} truncate="end">
                    {stop.name}
                  </Text>
                  <Text size="xs" c="dimmed">
                    {stop.city}
                  </Text>
                </Stack>
                <Group gap={4} wrap="nowrap">
                  <DueBadge daysOverdue={stop.daysOverdue} />
                  {planned ? (
                    <Badge variant="outline" radius="sm" tt="none">
                      {shortWeekday(planned.day.weekday)}
                    </Badge>
                  ) : null}
                </Group>
              </Group>
            );
          })}
        </Stack>
      )}
    </Card>
  );
}
