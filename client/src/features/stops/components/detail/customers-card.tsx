import { Anchor, Badge, Button, Card, Group, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconPlus, IconPrinter, IconUserPlus } from '@tabler/icons-react';
import { EDGE_TYPE_LABELS } from '@keenroute/shared';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useCustomers } from '@/features/customers/api/get-customers';
import { CustomerFormModal } from '@/features/customers/components/customer-form-modal';
import { useShears } from '@/features/shears/api/get-shears';
import { usePrintLabels } from '@/features/shears/api/print-labels';
import { ShearFormModal } from '@/features/shears/components/shear-form-modal';
import { TagCode } from '@/features/shears/components/tag-code';
import { makeAndModel } from '@/features/shears/labels';
import { groupShearsByCustomer, type CustomerGroup } from '../../customer-groups';
import type { StopDetail } from '../../types';
import { ListLoadFailed, ListLoading } from '../stop-list-states';
import { DetailCard } from './detail-card';

const LIST_LIMIT = 100;

function CustomerShearsRow({
  group,
  canManage,
  onAddShear,
}: {
  group: CustomerGroup;
  canManage: boolean;
  onAddShear: (customerId: string) => void;
}) {
  const { customer, summary, shears } = group;
  return (
    <Card withBorder radius="md" padding="sm" component="li">
      <Group justify="space-between" gap="xs" wrap="nowrap" align="center">
        <Group gap={8} style={{ minWidth: 0 }}>
          <Anchor component={Link} to={paths.customers.detail.getHref(customer.id)} fw={600}>
            {customer.name}
          </Anchor>
          {summary && !summary.active ? (
            <Badge color="gray" variant="light" radius="sm" tt="none">
              inactive
            </Badge>
          ) : null}
        </Group>
        {canManage ? (
          <Button
            variant="subtle"
            size="sm"
            leftSection={<IconPlus size={16} />}
            onClick={() => onAddShear(customer.id)}
            aria-label={`Add shear for ${customer.name}`}
            style={{ flexShrink: 0 }}
          >
            Add shear
          </Button>
        ) : null}
      </Group>
      {shears.length === 0 ? (
        <Text size="sm" c="dimmed" mt={4}>
          No shears registered.
        </Text>
      ) : (
        <Stack gap={0} component="ul" p={0} m={0} mt={4} style={{ listStyle: 'none' }}>
          {shears.map((shear) => (
            <Group key={shear.id} component="li" gap="sm" mih={44} wrap="nowrap">
              <Anchor component={Link} to={paths.shears.detail.getHref(shear.id)} py={8}>
                <TagCode code={shear.tagCode} />
              </Anchor>
              <Text size="sm" c="dimmed" truncate>
                {makeAndModel(shear)} · {shear.lengthIn}″ · {EDGE_TYPE_LABELS[shear.edgeType]}
              </Text>
            </Group>
          ))}
        </Stack>
      )}
    </Card>
  );
}

/** Everyone at the stop with their shears, so the visit's tags can be checked and printed. */
export function CustomersCard({ stop, canManage }: { stop: StopDetail; canManage: boolean }) {
  const customers = useCustomers({ stopId: stop.id, pageSize: LIST_LIMIT, sort: 'name', order: 'asc' });
  const shears = useShears({ stopId: stop.id, pageSize: LIST_LIMIT, sort: 'tagCode', order: 'asc' });
  const print = usePrintLabels();
  const [customerOpened, customerModal] = useDisclosure(false);
  const [shearFor, setShearFor] = useState<string | null>(null);

  const groups = groupShearsByCustomer(customers.data?.items ?? [], shears.data?.items ?? []);
  const shearTotal = shears.data?.total ?? 0;
  const cut = (customers.data?.total ?? 0) > LIST_LIMIT || shearTotal > LIST_LIMIT;
  const failed = customers.isError ? customers : shears.isError ? shears : null;

  return (
    <DetailCard
      title="Customers and shears"
      actions={
        canManage ? (
          <>
            <Button variant="light" leftSection={<IconUserPlus size={18} />} onClick={customerModal.open}>
              Add customer
            </Button>
            <Button
              variant="default"
              leftSection={<IconPrinter size={18} />}
              loading={print.isPending}
              disabled={shearTotal === 0}
              onClick={() => print.mutate({ selection: { stopId: stop.id }, fileName: `tag-labels-${stop.id}.pdf` })}
            >
              Print tag labels
            </Button>
          </>
        ) : null
      }
    >
      {customers.isPending || shears.isPending ? (
        <ListLoading label="Loading the customers" />
      ) : failed ? (
        <ListLoadFailed
          title="The customers could not be loaded"
          message={failed.error?.message ?? ''}
          onRetry={() => void Promise.all([customers.refetch(), shears.refetch()])}
        />
      ) : groups.length === 0 ? (
        <Text size="sm" c="dimmed">
          No customers at this stop yet.
        </Text>
      ) : (
        <Stack gap="sm" component="ul" p={0} m={0} style={{ listStyle: 'none' }}>
          {groups.map((group) => (
            <CustomerShearsRow key={group.customer.id} group={group} canManage={canManage} onAddShear={setShearFor} />
          ))}
        </Stack>
      )}
      {cut ? (
        <Text size="sm" c="dimmed" mt="sm">
          Showing the first {LIST_LIMIT}. The{' '}
          <Anchor component={Link} to={paths.customers.list.getHref()}>
            Customers page
          </Anchor>{' '}
          has them all.
        </Text>
      ) : null}
      {canManage ? (
        <>
          <CustomerFormModal opened={customerOpened} onClose={customerModal.close} stopId={stop.id} />
          <ShearFormModal
            opened={shearFor !== null}
            onClose={() => setShearFor(null)}
            customerId={shearFor ?? undefined}
          />
        </>
      ) : null}
    </DetailCard>
  );
}
