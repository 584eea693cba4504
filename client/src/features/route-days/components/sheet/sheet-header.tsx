import { Card, Group, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { dayTitle, distance, duration, stopsWording, timeOfDay } from '../../format';
import type { DaySheet } from '../../types';

/** Date, sharpener, when the day leaves and ends, and its totals. */
export function SheetHeader({ sheet }: { sheet: DaySheet }) {
  const { routeDay, totals } = sheet;
  return (
    <Card withBorder radius="lg" padding="md" bg="keenTeal.0">
      <Stack gap="xs">
        <Title order={1} fz={{ base: 'h2', sm: 'h1' }}>
          {dayTitle(routeDay)}
        </Title>
        <Text size="lg">{routeDay.sharpener.name}</Text>
        <Text size="xl" fw={700} c="keenTeal.7" aria-label="Departure and finish">
          {totals.departure === null ? 'No stops' : `${timeOfDay(totals.departure)} → ${timeOfDay(totals.finish)}`}
        </Text>
        <Text size="sm" c="dimmed">
          From and back to {routeDay.start.label}
          {routeDay.lunch ? ` · lunch ${timeOfDay(routeDay.lunch.start)} (${duration(routeDay.lunch.minutes)})` : ''}
        </Text>
        <SimpleGrid cols={{ base: 2, xs: 4 }} spacing="xs">
          <Total label="Stops" value={stopsWording(totals.stops)} />
          <Total label="Distance" value={distance(totals.distanceKm)} />
          <Total label="Driving" value={duration(totals.driveMinutes)} />
          <Total label="At the bench" value={duration(totals.benchMinutes)} />
        </SimpleGrid>
      </Stack>
    </Card>
  );
}

function Total({ label, value }: { label: string; value: string }) {
  return (
    <Group gap={0} style={{ flexDirection: 'column', alignItems: 'flex-start' }}>
      <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
        {label}
      </Text>
      <Text fw={700}>{value}</Text>
    </Group>
  );
}
