import { Anchor, Badge, Card, Group, List, SimpleGrid, Stack, Text, ThemeIcon } from '@mantine/core';
import { IconBulb } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { count, hoursMinutes, money } from '../format';
import { suggestionWords } from '../suggestions';
import type { DriveCostRow } from '../types';

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div>
      <Text size="xs" c="dimmed">
        {label}
      </Text>
      <Text fw={600} style={{ fontVariantNumeric: 'tabular-nums' }}>
        {value}
      </Text>
    </div>
  );
}

/** One stop that pays little for the drive: its figures, and what would help, each change in a sentence. */
export function DriveCostCard({ row, median }: { row: DriveCostRow; median: number | null }) {
  return (
    <Card withBorder radius="lg" padding="md" component="article" aria-label={row.stopName}>
      <Stack gap="sm">
        <Group justify="space-between" align="flex-start" gap="sm">
          <div>
            <Anchor component={Link} to={paths.stops.detail.getHref(row.stopId)} fw={700} size="lg">
              {row.stopName}
            </Anchor>
            <Text size="sm" c="dimmed">
              {row.city} · every {row.cadenceWeeks} {row.cadenceWeeks === 1 ? 'week' : 'weeks'}
            </Text>
          </div>
          <Badge
            size="lg"
            variant="light"
            tt="none"
            color={median !== null && row.perRouteHourCents < median ? 'brass' : 'keenTeal'}
          >
            {money(row.perRouteHourCents)} per route hour
          </Badge>
        </Group>
        <SimpleGrid cols={{ base: 2, sm: 4 }} spacing="sm">
          <Figure label="Visits" value={count(row.visits)} />
          <Figure label="Revenue" value={money(row.revenueCents)} />
          <Figure label="Route time" value={hoursMinutes(row.routeMinutes)} />
          <Figure label="Of it, driving" value={hoursMinutes(row.driveMinutes)} />
        </SimpleGrid>
        {row.suggestions.length > 0 ? (
          <List
            spacing="xs"
            size="sm"
            aria-label={`What would help ${row.stopName}`}
            icon={
              <ThemeIcon size={22} radius="xl" variant="light" color="brass">
                <IconBulb size={14} aria-hidden="true" />
              </ThemeIcon>
            }
          >
            {row.suggestions.map((suggestion) => (
              <List.Item key={suggestion.kind}>{suggestionWords(suggestion)}</List.Item>
            ))}
          </List>
        ) : (
          <Text size="sm" c="dimmed">
            No change worked out here would raise its revenue per route hour.
          </Text>
        )}
      </Stack>
    </Card>
  );
}
