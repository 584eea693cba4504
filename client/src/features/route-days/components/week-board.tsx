import { Box, Paper, ScrollArea, Stack, Text, Title } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import { dayTitle } from '../format';
import type { RouteDay, Week } from '../types';
import { RouteDayCard } from './route-day-card';

/** Days (columns) by sharpener (rows) on a desk; a list by day on a phone. Lives inside WeekDnd. */
export function WeekBoard({ week }: { week: Week }) {
  const phone = useMediaQuery('(max-width: 48em)', false, { getInitialValueInEffect: false });
  const dates = [...new Set(week.days.map((day) => day.day))].sort();
  const cell = (sharpenerId: string, date: string): RouteDay | undefined =>
    week.days.find((day) => day.day === date && day.sharpener.id === sharpenerId);
  const rows = week.sharpeners.filter((sharpener) => week.days.some((day) => day.sharpener.id === sharpener.id));

  return phone ? (
    <Stack gap="lg">
      {dates.map((date) => {
        const days = week.days.filter((day) => day.day === date);
        return (
          <Stack key={date} gap="sm" component="section" aria-label={dayTitle(days[0] as RouteDay)}>
            <Title order={2} fz="h4">
              {dayTitle(days[0] as RouteDay)}
              {date === week.today ? ' · today' : ''}
            </Title>
            {days.map((day) => (
              <RouteDayCard key={day.id} day={day} showSharpener isToday={date === week.today} />
            ))}
          </Stack>
        );
      })}
    </Stack>
  ) : (
    <ScrollArea type="auto" offsetScrollbars>
      <Box
        style={{
          display: 'grid',
          gridTemplateColumns: `${rows.length > 1 ? '7rem ' : ''}repeat(${dates.length}, minmax(13rem, 1fr))`,
          gap: 'var(--mantine-spacing-xs)',
          alignItems: 'start',
        }}
      >
        {rows.length > 1 ? <div /> : null}
        {dates.map((date) => {
          const first = week.days.find((day) => day.day === date) as RouteDay;
          return (
            <Text key={date} fw={700} c={date === week.today ? 'brass.7' : undefined}>
              {dayTitle(first)}
              {date === week.today ? ' · today' : ''}
            </Text>
          );
        })}
        {rows.map((sharpener) => [
          rows.length > 1 ? (
            <Text key={`${sharpener.id}-name`} fw={700} pt="sm">
              {sharpener.name}
            </Text>
          ) : null,
          ...dates.map((date) => {
            const day = cell(sharpener.id, date);
            return day ? (
              <RouteDayCard key={day.id} day={day} showSharpener={false} isToday={date === week.today} />
            ) : (
              <Paper key={`${sharpener.id}-${date}`} withBorder radius="md" p="sm" bg="gray.0">
                <Text size="sm" c="dimmed">
                  No route day
                </Text>
              </Paper>
            );
          }),
        ])}
      </Box>
    </ScrollArea>
  );
}
