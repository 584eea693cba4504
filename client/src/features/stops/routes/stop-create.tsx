import { Stack } from '@mantine/core';
import { PageHeader } from '@/components/page-header';
import { StopForm } from '../components/stop-form';

export function StopCreateRoute() {
  return (
    <Stack gap={0}>
      <PageHeader
        title="New stop"
        description="A salon, barbershop, grooming shop, school or clinic on the route. Saving looks up its pin."
      />
      <StopForm />
    </Stack>
  );
}
