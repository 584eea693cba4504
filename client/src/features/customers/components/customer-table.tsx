import { Anchor, Table, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { CustomerSearch } from '../hooks/use-customer-search';
import type { CustomerSort, CustomerSummary } from '../types';
import { CustomerBadges } from './customer-badges';
import { SortableHeader } from './sortable-header';
import { StopLink } from './stop-link';

interface CustomerListProps {
  customers: CustomerSummary[];
  params: CustomerSearch;
  onSort: (sort: CustomerSort) => void;
}

export function CustomerTable({ customers, params, onSort }: CustomerListProps) {
  const header = { sort: params.sort, order: params.order, onSort };
  return (
    <Table.ScrollContainer minWidth={820}>
      <Table verticalSpacing="sm" highlightOnHover striped="even" stripedColor="gray.0">
        <Table.Thead>
          <Table.Tr>
            <SortableHeader column="name" {...header}>
              Name
            </SortableHeader>
            <SortableHeader column="email" {...header}>
              E-mail
            </SortableHeader>
            <Table.Th>Phone</Table.Th>
            <SortableHeader column="stop" {...header}>
              Stop
            </SortableHeader>
            <Table.Th ta="right">Shears</Table.Th>
            <Table.Th>Details</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {customers.map((customer) => (
            <Table.Tr key={customer.id}>
              <Table.Td miw={180}>
                <Anchor component={Link} to={paths.customers.detail.getHref(customer.id)} fw={600}>
                  {customer.name}
                </Anchor>
              </Table.Td>
              <Table.Td>
                {customer.email ?? (
                  <Text span c="dimmed">
                    —
                  </Text>
                )}
              </Table.Td>
              <Table.Td style={{ whiteSpace: 'nowrap' }}>
                {customer.phone ?? (
                  <Text span c="dimmed">
                    —
                  </Text>
                )}
              </Table.Td>
              <Table.Td>
                <StopLink stop={customer.stop} />
              </Table.Td>
              <Table.Td ta="right">{customer.shearCount}</Table.Td>
              <Table.Td>
                <CustomerBadges customer={customer} />
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}

/** The phone's view: one card per customer, the whole card a link. */
export function CustomerCards({ customers }: { customers: CustomerSummary[] }) {
  return (
    <ul style={{ listStyle: 'none', padding: 0, margin: 0, display: 'grid', gap: 'var(--mantine-spacing-sm)' }}>
      {customers.map((customer) => (
        <li key={customer.id}>
          <Anchor
            component={Link}
            to={paths.customers.detail.getHref(customer.id)}
            underline="never"
            c="inherit"
            display="block"
            p="md"
            style={{ border: '1px solid var(--mantine-color-gray-3)', borderRadius: 'var(--mantine-radius-md)' }}
          >
            <Text fw={600}>{customer.name}</Text>
            <Text size="sm" c="dimmed" style={{ overflowWrap: 'anywhere' }}>
              {[customer.stop?.name ?? 'No stop', customer.email, customer.phone].filter(Boolean).join(' · ')}
            </Text>
            <Text size="sm" mt={4}>
              {customer.shearCount === 1 ? '1 shear' : `${customer.shearCount} shears`}
            </Text>
            <CustomerBadges customer={customer} />
          </Anchor>
        </li>
      ))}
    </ul>
  );
}
