import { Button, Group, SegmentedControl, Select, Stack, TextInput } from '@mantine/core';
import { useDisclosure, useMediaQuery } from '@mantine/hooks';
import { IconSearch, IconUserPlus, IconUsers } from '@tabler/icons-react';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { useSignedInUser } from '@/lib/session';
import { canManageCustomers } from '../access';
import { useCustomers } from '../api/get-customers';
import { CustomerFormModal } from '../components/customer-form-modal';
import { CustomerCards, CustomerTable } from '../components/customer-table';
import { ListFooter } from '../components/list-footer';
import { ListEmpty, ListLoadFailed, ListLoading } from '@/components/list-states';
import { StopSelect } from '../components/stop-select';
import { toCustomerQuery, useCustomerSearch } from '../hooks/use-customer-search';
import { useSearchBox } from '@/hooks/use-search-box';
import type { CustomerSort, SortOrder } from '../types';

const SORT_CHOICES = [
  { value: 'name:asc', label: 'Name, A to Z' },
  { value: 'name:desc', label: 'Name, Z to A' },
  { value: 'stop:asc', label: 'Stop' },
  { value: 'email:asc', label: 'E-mail' },
  { value: 'createdAt:desc', label: 'Newest first' },
];

export function CustomersRoute() {
  const { role } = useSignedInUser();
  const navigate = useNavigate();
  const { params, update, sortBy } = useCustomerSearch();
  const list = useCustomers(toCustomerQuery(params));
  // Cards up to tablet width, as on the Team page.
  const showCards = useMediaQuery('(max-width: 62em)', false, { getInitialValueInEffect: false });
  const [addOpened, addModal] = useDisclosure(false);
  const search = useSearchBox(params.q, (q) => update({ q, page: 1 }));
  const customers = list.data?.items ?? [];
  const filtered = Boolean(params.q || params.stopId || params.active !== 'true');

  return (
    <Stack gap="md" maw={1200}>
      <PageHeader
        title="Customers"
        description="The stylists, groomers and students whose shears Keenroute looks after, and their stops."
        actions={
          canManageCustomers(role) ? (
            <Button leftSection={<IconUserPlus size={18} />} onClick={addModal.open}>
              Add customer
            </Button>
          ) : null
        }
      />

      <Group gap="sm" align="flex-end" wrap="wrap">
        <TextInput
          label="Search customers"
          placeholder="Name or e-mail"
          leftSection={<IconSearch size={18} aria-hidden="true" />}
          value={search.text}
          onChange={(event) => search.change(event.currentTarget.value)}
          onKeyDown={(event) => event.key === 'Enter' && search.flush()}
          type="search"
          style={{ flex: '1 1 16rem' }}
        />
        <StopSelect
          label="Stop"
          placeholder="Any stop"
          value={params.stopId || null}
          onChange={(stopId) => update({ stopId: stopId ?? '', page: 1 })}
          clearable
          style={{ flex: '1 1 14rem' }}
        />
        <SegmentedControl
          aria-label="Which customers"
          value={params.active}
          onChange={(active) => update({ active: active, page: 1 })}
          data={[
            { value: 'true', label: 'Active' },
            { value: 'false', label: 'Inactive' },
            { value: 'all', label: 'All' },
          ]}
        />
        {showCards ? (
          <Select
            aria-label="Sort customers"
            data={SORT_CHOICES}
            value={`${params.sort}:${params.order}`}
            onChange={(value) => {
              if (!value) return;
              const [sort, order] = value.split(':') as [CustomerSort, SortOrder];
              update({ sort, order, page: 1 });
            }}
            allowDeselect={false}
            w="100%"
          />
        ) : null}
      </Group>

      {list.isPending ? (
        <ListLoading label="Loading customers" />
      ) : list.isError ? (
        <ListLoadFailed
          title="The customers could not be loaded"
          message={list.error.message}
          onRetry={() => void list.refetch()}
        />
      ) : customers.length === 0 ? (
        <ListEmpty
          icon={<IconUsers size={36} stroke={1.4} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />}
          title={
            params.q
              ? `No customer matches “${params.q}”.`
              : filtered
                ? 'No customer matches these filters.'
                : 'No customers yet.'
          }
        >
          {filtered ? (
            <Button
              variant="subtle"
              onClick={() => {
                search.clear();
                update({ q: '', stopId: '', active: 'true', page: 1 });
              }}
            >
              Clear the search and filters
            </Button>
          ) : canManageCustomers(role) ? (
            <Button variant="light" onClick={addModal.open}>
              Add the first customer
            </Button>
          ) : null}
        </ListEmpty>
      ) : showCards ? (
        <CustomerCards customers={customers} />
      ) : (
        <CustomerTable customers={customers} params={params} onSort={sortBy} />
      )}

      <ListFooter
        page={params.page}
        pageSize={params.pageSize}
        total={list.data?.total ?? 0}
        loadingNext={list.isPlaceholderData}
        onPage={(page) => update({ page })}
      />

      <CustomerFormModal
        opened={addOpened}
        onClose={addModal.close}
        stopId={params.stopId || undefined}
        onSaved={(customer) => void navigate(paths.customers.detail.getHref(customer.id))}
      />
    </Stack>
  );
}
