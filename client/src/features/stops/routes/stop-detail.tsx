import { Group, SimpleGrid, Stack } from '@mantine/core';
import { useParams } from 'react-router-dom';
import { PageLoader } from '@/components/page-loader';
import { StatementButton } from '@/features/invoices/components/statement-button';
import { useSignedInUser } from '@/lib/session';
import { canEditAccessNotes, canManageStops } from '../access';
import { useStop } from '../api/get-stop';
import { AccessNotesCard } from '../components/detail/access-notes-card';
import { CustomersCard } from '../components/detail/customers-card';
import { HoursCard } from '../components/detail/hours-card';
import { StopHeader } from '../components/detail/stop-header';
import { VisitsCard } from '../components/detail/visits-card';
import { StopLoadFailed } from '../components/stop-not-found';

export function StopDetailRoute() {
  const { stopId = '' } = useParams();
  const actor = useSignedInUser();
  const stop = useStop(stopId);

  if (stop.isPending) return <PageLoader label="Loading the stop" />;
  if (stop.isError) return <StopLoadFailed error={stop.error} onRetry={() => void stop.refetch()} />;

  const canManage = canManageStops(actor.role);
  return (
    <Stack gap="md" maw={1200}>
      <StopHeader stop={stop.data} canEdit={canManage} />
      {canManage ? (
        <Group>
          <StatementButton subject={{ kind: 'stop', id: stop.data.id, name: stop.data.name }} />
        </Group>
      ) : null}
      <SimpleGrid cols={{ base: 1, md: 2 }} spacing="md">
        <HoursCard stop={stop.data} />
        <AccessNotesCard stop={stop.data} canEdit={canEditAccessNotes(actor.role)} />
        <VisitsCard stop={stop.data} canRecord={canManage} />
      </SimpleGrid>
      <CustomersCard stop={stop.data} canManage={canManage} />
    </Stack>
  );
}
