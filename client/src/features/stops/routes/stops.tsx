import { Button, Group, Pagination, Stack, Text } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import { IconPlus } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { useSignedInUser } from '@/lib/session';
import { canManageStops } from '../access';
import { useStops } from '../api/get-stops';
import { StopCards } from '../components/stop-cards';
import { StopFilters } from '../components/stop-filters';
import { ListLoadFailed, ListLoading, StopsEmpty } from '../components/stop-list-states';
import { StopsTable } from '../components/stops-table';
import { STOP_LIST_DEFAULTS, useStopSearch } from '../hooks/use-stop-search';

export function StopsRoute() {
  const actor = useSignedInUser();
  const canManage = canManageStops(actor.role);
  const { params, update, sortBy, filtered } = useStopSearch();
  const list = useStops(params);
  // Cards up to tablet width: beside the navbar, seven columns only fit from the md breakpoint.
  const showCards = useMediaQuery('(max-width: 62em)', false, { getInitialValueInEffect: false });

  const total = list.data?.total ?? 0;
  const stops = list.data?.items ?? [];
  const pages = Math.max(1, Math.ceil(total / params.pageSize));
  const first = total === 0 ? 0 : (params.page - 1) * params.pageSize + 1;
  const last = Math.min(total, params.page * params.pageSize);

  return (
    <Stack gap="md" maw={1280}>
      <PageHeader
        title="Stops"
        description={
          canManage
            ? 'The places on the route: address, opening hours, cadence and who works them.'
            : 'The stops on your route days.'
        }
        actions={
          canManage ? (
            <Button component={Link} to={paths.stops.create.getHref()} leftSection={<IconPlus size={18} />}>
              Add a stop
            </Button>
          ) : null
        }
      />

      <StopFilters params={params} update={update} showSharpener={canManage} showSort={showCards} />

      {list.isPending ? (
        <ListLoading label="Loading the stops" />
      ) : list.isError ? (
        <ListLoadFailed
          title="The stops could not be loaded"
          message={list.error.message}
          onRetry={() => void list.refetch()}
        />
      ) : stops.length === 0 ? (
        <StopsEmpty
          filtered={filtered || params.page > 1}
          canAdd={canManage}
          onClear={() => update({ ...STOP_LIST_DEFAULTS })}
        />
      ) : showCards ? (
        <StopCards stops={stops} />
      ) : (
        <StopsTable stops={stops} params={params} onSort={sortBy} />
      )}

      {total > 0 ? (
        <Group justify="space-between" gap="sm">
          <Text size="sm" c="dimmed" aria-live="polite">
            {first}–{last} of {total}
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
