import { Stack, Text } from '@mantine/core';
import { distance, duration, stopsWording, timeOfDay } from '../format';
import type { RouteDay } from '../types';

/** The day in one glance: stops, km and drive; when it leaves and ends, bench time; lunch. */
export function DayTotals({ day }: { day: RouteDay }) {
  const lines = [
    `${stopsWording(day.stops.length)} · ${distance(day.distanceKm)} · ${duration(day.driveMinutes)} drive`,
    `${day.departure === null ? 'No stops' : `${timeOfDay(day.departure)} → ${timeOfDay(day.finish)}`} · ${duration(day.benchMinutes)} bench`,
    ...(day.lunch ? [`Lunch ${timeOfDay(day.lunch.start)}, ${duration(day.lunch.minutes)}`] : []),
  ];
  return (
    <Stack gap={0} role="group" aria-label="Day totals">
      {lines.map((line) => (
        <Text key={line} size="sm" c="dimmed">
          {line}
        </Text>
      ))}
    </Stack>
  );
}
