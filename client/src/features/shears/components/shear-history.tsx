import { Badge, Card, Text, Timeline, Title } from '@mantine/core';
import { formatDay } from '@/lib/format';
import { HISTORY_KIND_LABELS } from '../labels';
import type { ShearHistoryEntry } from '../types';

/** What happened to the shear, newest first: registered, serviced, moved, status changes, notes. */
export function ShearHistory({ history }: { history: ShearHistoryEntry[] }) {
  const entries = [...history].sort((a, b) => b.happenedOn.localeCompare(a.happenedOn));
  return (
    <Card withBorder radius="lg" padding="lg" component="section" aria-labelledby="shear-history-title">
      <Title order={2} fz="h4" mb="sm" id="shear-history-title">
        Service history
      </Title>
      {entries.length === 0 ? (
        <Text size="sm" c="dimmed">
          Nothing recorded yet.
        </Text>
      ) : (
        <Timeline active={entries.length} bulletSize={14} lineWidth={2} color="keenTeal">
          {entries.map((entry) => (
            <Timeline.Item
              key={entry.id}
              title={
                <Text size="sm" fw={600} span>
                  {formatDay(entry.happenedOn)}{' '}
                  <Badge size="xs" variant="light" color={entry.kind === 'serviced' ? 'keenTeal' : 'gray'} radius="sm">
                    {HISTORY_KIND_LABELS[entry.kind] ?? entry.kind}
                  </Badge>
                </Text>
              }
            >
              <Text size="sm">{entry.summary}</Text>
            </Timeline.Item>
          ))}
        </Timeline>
      )}
    </Card>
  );
}
