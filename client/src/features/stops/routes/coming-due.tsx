import { Card, Group, Pagination, Stack, Text } from '@mantine/core';
import { IconCalendarCheck } from '@tabler/icons-react';
import { addDays } from '@keenroute/shared';
import { PageHeader } from '@/components/page-header';
import { useSignedInUser } from '@/lib/session';
import { canManageStops } from '../access';
import { useComingDue } from '../api/get-coming-due';
import { ComingDueList } from '../components/coming-due-list';
import { SharpenerSelect } from '../components/sharpener-select';
import { ListLoadFailed, ListLoading } from '../components/stop-list-states';
import { WeekPicker } from '../components/week-picker';
import { formatDay } from '../format';
import { useComingDueSearch } from '../hooks/use-coming-due-search';

export function ComingDueRoute() {
  const actor = useSignedInUser();
  const canFilter = canManageStops(actor.role);
  const { params, update, thisWeek } = useComingDueSearch();
  const list = useComingDue(params);
  const stops = list.data?.items ?? [];
  const total = list.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / params.pageSize));

  return (
    <Stack gap="md" maw={960}>
      <PageHeader
        title="Coming due"
        description="Stops due by the end of the week, most overdue first. This list feeds the week planner."
      />

      <Group gap="md" align="flex-end" justify="space-between">
        <WeekPicker week={params.week} thisWeek={thisWeek} onChange={(week) => update({ week, page: 1 })} />
        {canFilter ? (
          <SharpenerSelect
            aria-label="Sharpener"
            placeholder="Every sharpener"
            value={params.sharpener || null}
            onChange={(sharpener) => update({ sharpener: sharpener ?? '', page: 1 })}
            style={{ flex: '0 1 18rem' }}
            miw={220}
          />
        ) : null}
      </Group>

      {list.isPending ? (
        <ListLoading label="Loading the stops coming due" />
      ) : list.isError ? (
        <ListLoadFailed
          title="Coming due could not be loaded"
          message={list.error.message}
          onRetry={() => void list.refetch()}
        />
      ) : stops.length === 0 ? (
        <Card withBorder padding="xl" radius="lg">
          <Stack align="center" gap="sm" ta="center">
            <IconCalendarCheck size={36} stroke={1.4} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />
            <Text fw={600}>Nothing is due by {formatDay(addDays(params.week, 6))}.</Text>
            <Text size="sm" c="dimmed">
              Every stop is within its cadence. Look at a later week to plan ahead.
            </Text>
          </Stack>
        </Card>
      ) : (
        <ComingDueList stops={stops} />
      )}

      {total > 0 ? (
        <Group justify="space-between" gap="sm">
          <Text size="sm" c="dimmed" aria-live="polite">
            {total} {total === 1 ? 'stop' : 'stops'} due by {formatDay(addDays(params.week, 6))}
            {list.isPlaceholderData ? ' · loading…' : ''}
          </Text>
          {pages > 1 ? (
            <Pagination
              total={pages}
              value={Math.min(params.page, pages)}
              onChange={(page) => update({ page })}
              size="md"
              getControlProps={(control) => ({ 'aria-label': `${control} page` })}
            />
          ) : null}
        </Group>
      ) : null}
    </Stack>
  );
}
