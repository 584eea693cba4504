import { Anchor, Button, Group, Stack, Text } from '@mantine/core';
import { IconMail, IconPencil, IconPhone } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { cadenceWording, formatAddress, formatDay, kindLabel } from '../../format';
import type { StopDetail } from '../../types';
import { NextDue } from '../due-badge';
import { InactiveBadge } from '../stops-table';

export function StopHeader({ stop, canEdit }: { stop: StopDetail; canEdit: boolean }) {
  return (
    <Stack gap="sm" mb="md">
      <PageHeader
        title={stop.name}
        description={`${kindLabel(stop.kind)} · ${formatAddress(stop)}`}
        actions={
          canEdit ? (
            <Button
              component={Link}
              to={paths.stops.edit.getHref(stop.id)}
              variant="light"
              leftSection={<IconPencil size={18} />}
            >
              Edit
            </Button>
          ) : null
        }
      />
      <Group gap="md" mt={-8}>
        {stop.active ? null : <InactiveBadge />}
        <Group gap={6}>
          <Text size="sm" fw={600}>
            Next due
          </Text>
          <NextDue nextDueOn={stop.nextDueOn} daysOverdue={stop.daysOverdue} />
        </Group>
        <Text size="sm" c="dimmed">
          {stop.lastVisitOn ? `Last visit ${formatDay(stop.lastVisitOn)}` : 'Not visited yet'} ·{' '}
          {cadenceWording(stop.cadenceWeeks)}
        </Text>
      </Group>
      {stop.phone || stop.email ? (
        <Group gap="xs">
          {stop.phone ? (
            <Button component="a" href={`tel:${stop.phone}`} variant="subtle" leftSection={<IconPhone size={18} />}>
              {stop.phone}
            </Button>
          ) : null}
          {stop.email ? (
            <Anchor href={`mailto:${stop.email}`} size="sm" style={{ overflowWrap: 'anywhere' }}>
              <Group gap={6} wrap="nowrap" component="span" py="sm">
                <IconMail size={18} aria-hidden="true" />
                {stop.email}
              </Group>
            </Anchor>
          ) : null}
        </Group>
      ) : null}
    </Stack>
  );
}
