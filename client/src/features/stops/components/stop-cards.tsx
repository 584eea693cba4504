import { Card, Group, Stack, Text, UnstyledButton } from '@mantine/core';
import { IconChevronRight } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { cadenceWording, formatAddress, kindLabel } from '../format';
import type { StopSummary } from '../types';
import { NextDue } from './due-badge';
import { InactiveBadge } from './stops-table';

/** The phone's view of the stops: one card per stop, the whole card a link to it. */
export function StopCards({ stops }: { stops: StopSummary[] }) {
  return (
    <Stack gap="sm" component="ul" p={0} m={0} style={{ listStyle: 'none' }}>
      {stops.map((stop) => (
        <Card key={stop.id} component="li" withBorder padding={0} radius="md">
          <UnstyledButton component={Link} to={paths.stops.detail.getHref(stop.id)} p="md" display="block">
            <Group justify="space-between" align="flex-start" wrap="nowrap" gap="xs">
              <Stack gap={4} style={{ minWidth: 0 }}>
                <Text fw={600}>
                  {stop.name}
                  {stop.active ? null : <InactiveBadge />}
                </Text>
                <Text size="sm" c="dimmed" style={{ overflowWrap: 'anywhere' }}>
                  {kindLabel(stop.kind)} · {formatAddress(stop)}
                </Text>
                <NextDue nextDueOn={stop.nextDueOn} daysOverdue={stop.daysOverdue} />
                <Text size="xs" c="dimmed">
                  {cadenceWording(stop.cadenceWeeks)} · {stop.assignedSharpener?.name ?? 'no sharpener'} ·{' '}
                  {stop.customerCount} {stop.customerCount === 1 ? 'customer' : 'customers'}
                </Text>
              </Stack>
              <IconChevronRight size={20} aria-hidden="true" style={{ flexShrink: 0, marginTop: 4 }} />
            </Group>
          </UnstyledButton>
        </Card>
      ))}
    </Stack>
  );
}
