import { Anchor, Card, Group, SimpleGrid, Stack, Text } from '@mantine/core';
import { describeShear } from '@keenroute/shared';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { StopLink } from '@/features/customers/components/stop-link';
import { formatDay } from '@/lib/format';
import { upperFirst } from '@/lib/format';
import { makeAndModel } from '../labels';
import type { ShearDetail } from '../types';
import { LeftHandedBadge, ShearStatusBadge } from './status-badge';
import { StatusControl } from './status-control';

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <Stack gap={2}>
      <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
        {label}
      </Text>
      <Text size="sm" component="div" style={{ overflowWrap: 'anywhere' }}>
        {children}
      </Text>
    </Stack>
  );
}

/** Who owns the shear, where it lives, what it is and where it stands. */
export function ShearSummaryCard({ shear, canManage }: { shear: ShearDetail; canManage: boolean }) {
  return (
    <Card withBorder radius="lg" padding="lg">
      <Stack gap="md">
        <Group gap="xs">
          <Text fw={600}>{upperFirst(describeShear(shear))}</Text>
          {shear.handedness === 'left' ? <LeftHandedBadge /> : null}
        </Group>
        <SimpleGrid cols={{ base: 1, xs: 2 }} spacing="md">
          <Fact label="Make and model">{makeAndModel(shear)}</Fact>
          <Fact label="Customer">
            <Anchor component={Link} to={paths.customers.detail.getHref(shear.customer.id)} size="sm">
              {shear.customer.name}
            </Anchor>
          </Fact>
          <Fact label="Stop">
            <StopLink stop={shear.stop} />
          </Fact>
          <Fact label="Last serviced">{shear.lastServicedOn ? formatDay(shear.lastServicedOn) : 'Not yet'}</Fact>
        </SimpleGrid>
        {canManage ? (
          <StatusControl shear={shear} />
        ) : (
          <Fact label="Status">
            <ShearStatusBadge status={shear.status} />
          </Fact>
        )}
        {shear.notes ? (
          <Fact label="Notes">
            <span style={{ whiteSpace: 'pre-line' }}>{shear.notes}</span>
          </Fact>
        ) : null}
      </Stack>
    </Card>
  );
}
