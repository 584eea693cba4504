import { Anchor, Badge, Group, Table, Text, UnstyledButton } from '@mantine/core';
import { IconArrowsSort, IconSortAscending, IconSortDescending } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { cadenceWording, formatAddress, kindLabel } from '../format';
import type { StopListParams, StopSort, StopSummary } from '../types';
import { NextDue } from './due-badge';

interface StopsTableProps {
  stops: StopSummary[];
  params: StopListParams;
  onSort: (sort: StopSort) => void;
}

function SortableHeader({
  column,
  params,
  onSort,
  children,
}: {
  column: StopSort;
  params: StopListParams;
  onSort: (sort: StopSort) => void;
  children: ReactNode;
}) {
  const sorted = params.sort === column;
  const Icon = !sorted ? IconArrowsSort : params.order === 'asc' ? IconSortAscending : IconSortDescending;
  return (
    <Table.Th aria-sort={sorted ? (params.order === 'asc' ? 'ascending' : 'descending') : 'none'}>
      <UnstyledButton onClick={() => onSort(column)} py={6}>
        <Group gap={6} wrap="nowrap">
          <Text fw={700} size="sm">
            {children}
          </Text>
          <Icon size={16} aria-hidden="true" color={sorted ? 'var(--mantine-color-keenTeal-6)' : undefined} />
        </Group>
      </UnstyledButton>
    </Table.Th>
  );
}

export function InactiveBadge() {
  return (
    <Badge color="gray" variant="light" radius="sm" ml={8} tt="none">
      inactive
    </Badge>
  );
}

export function StopsTable({ stops, params, onSort }: StopsTableProps) {
  return (
    <Table.ScrollContainer minWidth={900}>
      <Table verticalSpacing="sm" highlightOnHover striped="even" stripedColor="gray.0">
        <Table.Thead>
          <Table.Tr>
            <SortableHeader column="name" params={params} onSort={onSort}>
              Name
            </SortableHeader>
            <SortableHeader column="kind" params={params} onSort={onSort}>
              Kind
            </SortableHeader>
            <SortableHeader column="city" params={params} onSort={onSort}>
              Address
            </SortableHeader>
            <SortableHeader column="nextDueOn" params={params} onSort={onSort}>
              Next due
            </SortableHeader>
            <Table.Th>Cadence</Table.Th>
            <Table.Th>Sharpener</Table.Th>
            <Table.Th ta="right">Customers</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {stops.map((stop) => (
            <Table.Tr key={stop.id}>
              <Table.Td miw={160}>
                <Anchor component={Link} to={paths.stops.detail.getHref(stop.id)} fw={600}>
                  {stop.name}
                </Anchor>
                {stop.active ? null : <InactiveBadge />}
              </Table.Td>
              <Table.Td>{kindLabel(stop.kind)}</Table.Td>
              <Table.Td miw={170}>
                {/* Street first; the town under it, where a glance down the column tells the areas apart. */}
                <Text size="sm">{stop.street}</Text>
                <Text size="xs" c="dimmed">
                  {formatAddress({ ...stop, street: '' })}
                </Text>
              </Table.Td>
              <Table.Td miw={140}>
                <NextDue nextDueOn={stop.nextDueOn} daysOverdue={stop.daysOverdue} />
              </Table.Td>
              <Table.Td style={{ whiteSpace: 'nowrap' }}>{cadenceWording(stop.cadenceWeeks)}</Table.Td>
              <Table.Td>{stop.assignedSharpener?.name ?? <Text c="dimmed">Not assigned</Text>}</Table.Td>
              <Table.Td ta="right">{stop.customerCount}</Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
