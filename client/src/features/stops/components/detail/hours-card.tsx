import { Badge, Group, Stack, Table, Text } from '@mantine/core';
import { WEEKDAY_LABELS, WEEKDAYS } from '@keenroute/shared';
import { formatDay, shortWeekday, todayIso } from '../../format';
import type { StopDetail } from '../../types';
import { DetailCard } from './detail-card';

export function HoursCard({ stop }: { stop: StopDetail }) {
  const today = todayIso();
  const upcoming = [...stop.closedDates].sort().filter((day) => day >= today);
  return (
    <DetailCard title="Opening hours">
      <Table verticalSpacing={6} withRowBorders={false}>
        <Table.Tbody>
          {WEEKDAYS.map((day) => {
            const windows = stop.openingHours[day] ?? [];
            return (
              <Table.Tr key={day}>
                <Table.Th scope="row" w="40%" fw={600}>
                  {WEEKDAY_LABELS[day]}
                </Table.Th>
                <Table.Td c={windows.length ? undefined : 'dimmed'}>
                  {windows.length ? windows.map((w) => `${w.opens}–${w.closes}`).join(', ') : 'Closed'}
                </Table.Td>
              </Table.Tr>
            );
          })}
        </Table.Tbody>
      </Table>
      <Stack gap={6} mt="sm">
        <Group gap={6}>
          <Text size="sm" fw={600}>
            Preferred days
          </Text>
          {stop.preferredWeekdays.length ? (
            stop.preferredWeekdays.map((day) => (
              <Badge key={day} variant="light" radius="sm" tt="none">
                {shortWeekday(day)}
              </Badge>
            ))
          ) : (
            <Text size="sm" c="dimmed">
              any
            </Text>
          )}
        </Group>
        <Text size="sm">
          <Text span fw={600}>
            Closed on{' '}
          </Text>
          {upcoming.length ? upcoming.map(formatDay).join(', ') : 'no upcoming dates'}
        </Text>
      </Stack>
    </DetailCard>
  );
}
