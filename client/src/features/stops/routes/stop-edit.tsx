import { Stack } from '@mantine/core';
import { useLocation, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { PageLoader } from '@/components/page-loader';
import { useStop } from '../api/get-stop';
import { StopLoadFailed } from '../components/stop-not-found';
import { StopForm } from '../components/stop-form';
import type { StopEditState } from '../hooks/use-stop-form';

function isEditState(value: unknown): value is StopEditState {
  return typeof value === 'object' && value !== null && 'geocoding' in value;
}

export function StopEditRoute() {
  const { stopId = '' } = useParams();
  const location = useLocation();
  const stop = useStop(stopId);
  const state: unknown = location.state;
  const geocoding = isEditState(state) ? state.geocoding : undefined;

  return (
    <Stack gap={0}>
      <PageHeader title={stop.data ? `Edit ${stop.data.name}` : 'Edit stop'} />
      {stop.isPending ? (
        <PageLoader label="Loading the stop" />
      ) : stop.isError ? (
        <StopLoadFailed error={stop.error} onRetry={() => void stop.refetch()} />
      ) : (
        // A new key per stop: the form takes its starting values once.
        <StopForm key={stop.data.id} stop={stop.data} initialGeocoding={geocoding} />
      )}
    </Stack>
  );
}
