import { Button, Group, SimpleGrid, Stack } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconPencil, IconPrinter } from '@tabler/icons-react';
import { useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { PageLoader } from '@/components/page-loader';
import { paths } from '@/config/paths';
import { canGetCustomerStatement } from '@/features/invoices/access';
import { StatementButton } from '@/features/invoices/components/statement-button';
import { usePrintLabels } from '@/features/shears/api/print-labels';
import { useSignedInUser } from '@/lib/session';
import { canManageCustomers, canOpenStops } from '../access';
import { useCustomer } from '../api/get-customer';
import { CustomerBadges } from '../components/customer-badges';
import { CustomerFacts } from '../components/customer-facts';
import { CustomerFormModal } from '../components/customer-form-modal';
import { CustomerShears } from '../components/customer-shears';
import { RecordLoadFailed } from '../components/record-states';
import { StopHistory } from '../components/stop-history';

export function CustomerDetailRoute() {
  const { customerId = '' } = useParams();
  const { role } = useSignedInUser();
  const customer = useCustomer(customerId);
  const [editOpened, editModal] = useDisclosure(false);
  const print = usePrintLabels();
  const canManage = canManageCustomers(role);

  if (customer.isPending) return <PageLoader label="Loading the customer" />;
  if (customer.isError) {
    return (
      <RecordLoadFailed
        what="customer"
        error={customer.error}
        onRetry={() => void customer.refetch()}
        back={canOpenStops(role) ? { to: paths.customers.list.getHref(), label: 'Back to the customers' } : undefined}
      />
    );
  }

  const record = customer.data;
  const statement = canGetCustomerStatement(role) ? (
    <StatementButton subject={{ kind: 'customer', id: record.id, name: record.name }} />
  ) : null;
  return (
    <Stack gap="lg" maw={1200}>
      <PageHeader
        title={record.name}
        description={record.stop ? `At ${record.stop.name}` : 'Not at a stop'}
        actions={
          canManage ? (
            <Group gap="sm">
              <Button variant="default" leftSection={<IconPencil size={18} />} onClick={editModal.open}>
                Edit
              </Button>
              <Button
                variant="default"
                leftSection={<IconPrinter size={18} />}
                loading={print.isPending}
                disabled={record.shearCount === 0}
                onClick={() =>
                  print.mutate({
                    selection: { customerId: record.id },
                    fileName: `tag-labels-${record.name.replace(/\W+/g, '-').toLowerCase()}.pdf`,
                  })
                }
              >
                Print tag labels
              </Button>
              {statement}
            </Group>
          ) : (
            statement
          )
        }
      />
      <CustomerBadges customer={record} />
      <SimpleGrid cols={{ base: 1, md: 2 }} spacing="lg">
        <CustomerFacts customer={record} />
        <StopHistory customer={record} />
      </SimpleGrid>
      <CustomerShears customer={record} canManage={canManage} />
      {canManage ? <CustomerFormModal opened={editOpened} onClose={editModal.close} customer={record} /> : null}
    </Stack>
  );
}
