import { Group, Table, Text, UnstyledButton } from '@mantine/core';
import { IconArrowsSort, IconSortAscending, IconSortDescending } from '@tabler/icons-react';
import type { ReactNode } from 'react';

interface SortableHeaderProps<S extends string> {
  column: S;
  sort: S;
  order: 'asc' | 'desc';
  onSort: (sort: S) => void;
  children: ReactNode;
}

export function SortableHeader<S extends string>({ column, sort, order, onSort, children }: SortableHeaderProps<S>) {
  const sorted = sort === column;
  const Icon = !sorted ? IconArrowsSort : order === 'asc' ? IconSortAscending : IconSortDescending;
  return (
    <Table.Th aria-sort={sorted ? (order === 'asc' ? 'ascending' : 'descending') : 'none'}>
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
