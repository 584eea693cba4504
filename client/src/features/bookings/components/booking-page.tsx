import { Alert, Button, Card, Group, Stack, Text } from '@mantine/core';
import { IconBuildingStore, IconMapPinOff } from '@tabler/icons-react';
import { useSearchParams } from 'react-router-dom';
import { PageLoader } from '@/components/page-loader';
import { ListLoadFailed } from '@/components/list-states';
import { ApiError } from '@/lib/api-error';
import { usePublicStop } from '../api/get-public-stop';
import type { PublicStop } from '../types';
import { BookingForm } from './booking-form';
import { StopFinder } from './stop-finder';

interface BookingPageProps {
  prefill?: { name: string; email: string };
  withSession?: boolean;
}

function ChosenStop({ stop, onChange }: { stop: PublicStop; onChange: () => void }) {
  return (
    <Card withBorder radius="md" padding="md" bg="keenTeal.0">
      <Group justify="space-between" wrap="wrap" gap="sm">
        <Group gap="sm" wrap="nowrap">
          <IconBuildingStore size={28} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />
          <div>
            <Text fw={700}>{stop.name}</Text>
            <Text size="sm" c="dimmed">
              {[stop.street, stop.city].filter(Boolean).join(', ')}
            </Text>
          </div>
        </Group>
        <Button variant="subtle" onClick={onChange} mih={44}>
          Change stop
        </Button>
      </Group>
    </Card>
  );
}

/** Find the stop, then book: the stop and the linked day live in the URL, as visit notices link to them. */
export function BookingPage({ prefill, withSession = false }: BookingPageProps) {
  const [params, setParams] = useSearchParams();
  const stopId = params.get('stop')?.trim() ?? '';
  const linkedDay = params.get('day');
  const stop = usePublicStop(stopId);

  const chooseStop = (id: string | null) =>
    setParams(
      () => {
        const next = new URLSearchParams();
        if (id) next.set('stop', id);
        return next;
      },
      { replace: true },
    );

  if (stopId === '') return <StopFinder onChoose={(found) => chooseStop(found.id)} />;
  if (stop.isPending) return <PageLoader label="Loading the stop" />;
  if (stop.isError) {
    return stop.error instanceof ApiError && stop.error.status === 404 ? (
      <Stack gap="md">
        <Alert color="brass" icon={<IconMapPinOff size={20} />} title="That stop cannot be booked online">
          The stop in this link is not on the route any more. Find your stop by its name or town.
        </Alert>
        <StopFinder onChoose={(found) => chooseStop(found.id)} />
      </Stack>
    ) : (
      <ListLoadFailed
        title="The stop could not be loaded"
        message={stop.error.message}
        onRetry={() => void stop.refetch()}
      />
    );
  }
  return (
    <Stack gap="lg">
      <ChosenStop stop={stop.data} onChange={() => chooseStop(null)} />
      <BookingForm
        key={stop.data.id}
        stop={stop.data}
        linkedDay={linkedDay}
        prefill={prefill}
        withSession={withSession}
      />
    </Stack>
  );
}
