import { Card, Text, Timeline, Title } from '@mantine/core';
import { IconMapPin } from '@tabler/icons-react';
import { formatDay } from '@/lib/format';
import type { CustomerDetail } from '../types';
import { StopLink } from './stop-link';

function shownDay(value: string): string {
  // The history may carry timestamps or days; either way the day is what matters.
  return formatDay(value.slice(0, 10));
}

/** The customer's stop now, and the stops they were at before (newest first). */
export function StopHistory({ customer }: { customer: CustomerDetail }) {
  const spells = [...customer.stopHistory].sort((a, b) => b.startedAt.localeCompare(a.startedAt));
  return (
    <Card withBorder radius="lg" padding="lg">
      <Title order={2} fz="h4" mb="sm">
        Stop
      </Title>
      <Text size="sm" mb="md">
        Now at <StopLink stop={customer.stop} />
      </Text>
      {spells.length > 0 ? (
        <Timeline active={0} bulletSize={22} lineWidth={2} color="keenTeal" aria-label="Stop history">
          {spells.map((spell) => (
            <Timeline.Item
              key={`${spell.stop.id}-${spell.startedAt}`}
              bullet={<IconMapPin size={12} aria-hidden="true" />}
              title={<StopLink stop={spell.stop} />}
            >
              <Text size="xs" c="dimmed">
                {spell.endedAt
                  ? `${shownDay(spell.startedAt)} to ${shownDay(spell.endedAt)}`
                  : `Since ${shownDay(spell.startedAt)}`}
              </Text>
            </Timeline.Item>
          ))}
        </Timeline>
      ) : (
        <Text size="sm" c="dimmed">
          No moves recorded.
        </Text>
      )}
    </Card>
  );
}
