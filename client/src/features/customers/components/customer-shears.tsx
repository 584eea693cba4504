import { Button, Group, Stack, Title } from '@mantine/core';
import { useDisclosure, useMediaQuery } from '@mantine/hooks';
import { IconPlus, IconScissors } from '@tabler/icons-react';
import { useShears } from '@/features/shears/api/get-shears';
import { ShearFormModal } from '@/features/shears/components/shear-form-modal';
import { ShearCards, ShearTable } from '@/features/shears/components/shear-table';
import type { CustomerDetail } from '../types';
import { ListEmpty, ListLoadFailed, ListLoading } from '@/components/list-states';

/** The customer's shears; an owner or office manager registers new ones from here. */
export function CustomerShears({ customer, canManage }: { customer: CustomerDetail; canManage: boolean }) {
  const shears = useShears({ customerId: customer.id, pageSize: 100, sort: 'tagCode', order: 'asc' });
  const showCards = useMediaQuery('(max-width: 62em)', false, { getInitialValueInEffect: false });
  const [addOpened, addModal] = useDisclosure(false);
  const items = shears.data?.items ?? [];

  return (
    <Stack gap="sm" component="section" aria-labelledby="customer-shears-title">
      <Group justify="space-between" gap="sm">
        <Title order={2} fz="h3" id="customer-shears-title">
          Shears{shears.data ? ` (${shears.data.total})` : ''}
        </Title>
        {canManage ? (
          <Button leftSection={<IconPlus size={18} />} variant="light" onClick={addModal.open}>
            Add shear
          </Button>
        ) : null}
      </Group>
      {shears.isPending ? (
        <ListLoading label="Loading the shears" />
      ) : shears.isError ? (
        <ListLoadFailed
          title="The shears could not be loaded"
          message={shears.error.message}
          onRetry={() => void shears.refetch()}
        />
      ) : items.length === 0 ? (
        <ListEmpty
          icon={<IconScissors size={32} stroke={1.4} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />}
          title={`${customer.name} has no shears registered yet.`}
        >
          {canManage ? (
            <Button variant="subtle" onClick={addModal.open}>
              Register the first shear
            </Button>
          ) : null}
        </ListEmpty>
      ) : showCards ? (
        <ShearCards shears={items} showOwner={false} />
      ) : (
        <ShearTable shears={items} showOwner={false} />
      )}
      {canManage ? <ShearFormModal opened={addOpened} onClose={addModal.close} customerId={customer.id} /> : null}
    </Stack>
  );
}
